"use client";

import type { RequestStatus } from "@/db/schema";
import { STATUS_LABELS } from "@/lib/requests/status";

const ORDER: RequestStatus[] = ["submitted", "in_review", "waiting_for_rider", "approved", "declined"];

/** Requests per status; each card is a toggle that filters the table to that status. */
export function StatusCounts({
  counts,
  active,
  onPick,
}: {
  counts: Record<RequestStatus, number> | undefined;
  active: string;
  onPick: (status: string) => void;
}) {
  return (
    <ul className="grid grid-cols-2 gap-3 sm:grid-cols-5" aria-label="Requests per status">
      {ORDER.map((status) => (
        <li key={status}>
          <button
            type="button"
            aria-pressed={active === status}
            onClick={() => onPick(active === status ? "" : status)}
            className={`flex w-full flex-col items-start rounded-xl border bg-white p-3 text-left hover:border-pine-600 ${
              active === status ? "border-pine-700 ring-2 ring-pine-600" : "border-stone-200"
            }`}
          >
            <span className="text-sm text-stone-600">{STATUS_LABELS[status]}</span>
            <span className="text-2xl font-bold tabular-nums">{counts ? counts[status] : "–"}</span>
          </button>
        </li>
      ))}
    </ul>
  );
}
