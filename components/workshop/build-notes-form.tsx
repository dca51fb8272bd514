"use client";

import { Form } from "@/components/ui/form";

// The shop's own build notes for a catalog model, kept with the model and printed on every build sheet.
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { useOrderAction } from "./use-order-action";

export function BuildNotesForm({ bikeModelId, notes }: { bikeModelId: string; notes: string }) {
  const [open, setOpen] = useState(false);
  const { busy, problem, fields, done, send } = useOrderAction();
  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const text = String(new FormData(event.currentTarget).get("buildNotes") ?? "");
    if (await send(`/api/shop/catalog/${bikeModelId}/build-notes`, "PUT", { buildNotes: text }, "Build notes saved."))
      setOpen(false);
  }
  if (!open)
    return (
      <div className="print:hidden">
        {done ? (
          <p role="status" className="text-sm text-emerald-800">
            {done}
          </p>
        ) : null}
        <Button variant="ghost" onClick={() => setOpen(true)}>
          Edit the model&apos;s build notes
        </Button>
      </div>
    );
  return (
    <Form onSubmit={submit} className="flex flex-col gap-2 print:hidden" noValidate>
      <label htmlFor="buildNotes" className="text-sm font-medium">
        Build notes for this model
      </label>
      <textarea
        id="buildNotes"
        name="buildNotes"
        rows={5}
        defaultValue={notes}
        className="rounded-lg border border-stone-300 p-2"
      />
      {fields.buildNotes || problem ? (
        <p role="alert" className="text-sm font-medium text-red-700">
          {fields.buildNotes ?? problem}
        </p>
      ) : null}
      <Button type="submit" disabled={busy}>
        Save build notes
      </Button>
    </Form>
  );
}
