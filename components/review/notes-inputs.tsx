"use client";

import type { EditorValues } from "./editor-state";

const area = "min-h-24 rounded-lg border border-stone-300 bg-white px-3 py-2 text-base";

export function NotesInputs({ v, set }: { v: EditorValues; set: (patch: Partial<EditorValues>) => void }) {
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-2 text-lg font-semibold">Notes</legend>
      <label className="flex flex-col gap-1 text-sm font-medium text-stone-800">
        Notes for the rider (printed on the sheet)
        <textarea
          className={area}
          maxLength={4000}
          value={v.notesForRider}
          onChange={(e) => set({ notesForRider: e.target.value })}
        />
      </label>
      <label className="flex flex-col gap-1 text-sm font-medium text-stone-800">
        Internal notes (staff only)
        <textarea
          className={area}
          maxLength={4000}
          value={v.internalNotes}
          onChange={(e) => set({ internalNotes: e.target.value })}
        />
      </label>
    </fieldset>
  );
}
