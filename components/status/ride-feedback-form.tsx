"use client";

import { Form } from "@/components/ui/form";

// After the first rides: how the bike rides now, per end (the request form's complaint list) and in
// the rider's words. The answer shows what the shop's clicker rules suggest from the fitted setup;
// the tuner checks it and sends a revised sheet.
import { useState } from "react";
import { COMPLAINT_LABELS } from "@/components/request-form/labels";
import { CLICKER_LABELS } from "@/components/status/clicker-labels";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { callApi } from "@/lib/api-client";
import type { ClickerProposal, Complaint } from "@/lib/sizing";

const ENDS = [
  ["front", "Front (fork)"],
  ["rear", "Rear (shock)"],
] as const;

export function RideFeedbackForm({ requestId, token }: { requestId: string; token?: string }) {
  const [picked, setPicked] = useState<Record<"front" | "rear", Complaint[]>>({ front: [], rear: [] });
  const [notes, setNotes] = useState("");
  const [problem, setProblem] = useState<string | null>(null);
  const [fieldError, setFieldError] = useState<string | null>(null);
  const [proposal, setProposal] = useState<ClickerProposal | null>(null);
  const [sending, setSending] = useState(false);
  const toggle = (end: "front" | "rear", c: Complaint) =>
    setPicked((p) => ({ ...p, [end]: p[end].includes(c) ? p[end].filter((x) => x !== c) : [...p[end], c] }));

  return (
    <Form
      aria-label="How the bike rides now"
      noValidate
      className="flex flex-col gap-4"
      onSubmit={async (e) => {
        e.preventDefault();
        setSending(true);
        const sent = await callApi<{ proposal: ClickerProposal }>(
          `/api/status/${requestId}/feedback`,
          "POST",
          { token, front: picked.front, rear: picked.rear, notes },
          {
            offline: "No connection. What you ticked is still in the form: send again when you have signal.",
            fallback: "Your feedback could not be sent.",
          },
        );
        setSending(false);
        if (!sent.ok) {
          setFieldError(sent.fields.notes ?? null);
          setProblem(sent.error);
          return;
        }
        setFieldError(null);
        setProblem(null);
        setProposal(sent.data.proposal);
      }}
    >
      {ENDS.map(([end, legend]) => (
        <fieldset key={end} className="flex min-w-0 flex-col gap-2 rounded-xl border border-stone-200 bg-white p-4">
          <legend className="px-1 font-semibold">{legend}</legend>
          <div className="grid grid-cols-1 gap-2 min-[360px]:grid-cols-2">
            {(Object.entries(COMPLAINT_LABELS) as [Complaint, string][]).map(([value, label]) => (
              <label
                key={value}
                className="flex min-h-12 cursor-pointer items-center gap-3 rounded-lg border border-stone-300 bg-white px-3 py-2 has-[:checked]:border-pine-700 has-[:checked]:bg-pine-50"
              >
                <input
                  type="checkbox"
                  className="h-5 w-5 shrink-0 accent-pine-700"
                  checked={picked[end].includes(value)}
                  onChange={() => toggle(end, value)}
                  aria-label={`${end === "front" ? "Front" : "Rear"}: ${label}`}
                />
                <span aria-hidden="true">{label}</span>
              </label>
            ))}
          </div>
        </fieldset>
      ))}
      <div className="flex flex-col gap-1">
        <label htmlFor="ride-notes" className="text-sm font-medium text-stone-800">
          In your words (optional)
        </label>
        <textarea
          id="ride-notes"
          rows={3}
          value={notes}
          onChange={(e) => setNotes(e.target.value)}
          aria-invalid={fieldError ? true : undefined}
          aria-describedby={fieldError ? "ride-notes-error" : undefined}
          className="rounded-lg border border-stone-300 bg-white px-3 py-2 text-base aria-[invalid=true]:border-red-600"
        />
        {fieldError ? (
          <p id="ride-notes-error" className="text-sm font-medium text-red-700">
            {fieldError}
          </p>
        ) : null}
      </div>
      <FormAlert message={problem} />
      <Button type="submit" className="min-h-12" disabled={sending}>
        {sending ? "Sending…" : "Tell the shop"}
      </Button>
      {proposal ? (
        <div role="status" className="flex flex-col gap-2 rounded-lg bg-pine-50 p-3">
          <p className="font-semibold">Sent. What the shop&apos;s rules suggest from your setup:</p>
          {proposal.changes.length ? (
            <ul className="list-disc pl-5">
              {proposal.changes.map((c) => (
                <li key={c.id}>
                  {CLICKER_LABELS[c.id]}: {c.from} → {c.to} {c.unit} out ({c.moves.map((m) => m.reason).join("; ")})
                </li>
              ))}
            </ul>
          ) : (
            <p>No clicker change: your tuner will look at springs and preload.</p>
          )}
          <p>Your tuner checks this and sends you a revised sheet; change nothing until then.</p>
        </div>
      ) : null}
    </Form>
  );
}
