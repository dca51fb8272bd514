"use client";

// The rider's word after the first rides, with the clicker changes the shop's rules propose from the
// fitted setup; one button sends them as a revised sheet (saved, approved and e-mailed).
import { useRouter } from "next/navigation";
import { useState } from "react";
import { COMPLAINT_LABELS } from "@/components/request-form/labels";
import { CLICKER_LABELS } from "@/components/status/clicker-labels";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import type { RideFeedbackRow } from "@/db/queries/ride-feedback";
import { callApi } from "@/lib/api-client";
import { formatDay } from "@/lib/format";

export function RideFeedbackPanel({ requestId, rows }: { requestId: string; rows: RideFeedbackRow[] }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState<string | null>(null);
  if (!rows.length) return null;
  const words = (list: string[]) =>
    list.map((c) => COMPLAINT_LABELS[c as keyof typeof COMPLAINT_LABELS] ?? c).join(", ");
  return (
    <section
      aria-labelledby="ride-feedback-heading"
      className="flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4"
    >
      <h2 id="ride-feedback-heading" className="text-lg font-semibold">
        After the first rides
      </h2>
      <FormAlert message={problem} />
      <ul className="flex flex-col gap-4">
        {rows.map((r) => {
          const moves = r.proposal.changes.filter((c) => c.to !== c.from);
          return (
            <li key={r.id} className="flex flex-col gap-2 border-b border-stone-100 pb-3">
              <p className="text-sm text-stone-600">
                {formatDay(r.createdAt)} · on version {r.version}
              </p>
              {r.front.length ? <p>Front: {words(r.front)}</p> : null}
              {r.rear.length ? <p>Rear: {words(r.rear)}</p> : null}
              {r.notes ? <p className="font-quote whitespace-pre-line italic">“{r.notes}”</p> : null}
              {r.proposal.changes.length ? (
                <ul className="list-disc pl-5 text-sm">
                  {r.proposal.changes.map((c) => (
                    <li key={c.id}>
                      {CLICKER_LABELS[c.id]}: {c.from} → {c.to} {c.unit} out: {c.moves.map((m) => m.reason).join("; ")}
                    </li>
                  ))}
                </ul>
              ) : null}
              {r.proposal.unanswered.length ? (
                <p className="text-sm text-stone-700">
                  No clicker rule for:{" "}
                  {r.proposal.unanswered
                    .map((u) => `${u.end} ${COMPLAINT_LABELS[u.complaint].toLowerCase()}`)
                    .join(", ")}
                  .
                </p>
              ) : null}
              {r.revisedVersion !== null ? (
                <p className="text-sm font-medium text-emerald-800">Answered with version {r.revisedVersion}.</p>
              ) : moves.length ? (
                <Button
                  className="w-fit"
                  disabled={busy !== null}
                  onClick={async () => {
                    setBusy(r.id);
                    const sent = await callApi<{ version: number }>(
                      `/api/requests/${requestId}/ride-revision`,
                      "POST",
                      { feedbackId: r.id },
                      { fallback: "The revised sheet could not be sent." },
                    );
                    setBusy(null);
                    if (!sent.ok) return setProblem(sent.error);
                    setProblem(null);
                    router.refresh();
                  }}
                >
                  {busy === r.id ? "Sending…" : "Send the revised sheet with these changes"}
                </Button>
              ) : null}
            </li>
          );
        })}
      </ul>
    </section>
  );
}
