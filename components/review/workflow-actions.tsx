"use client";

import { Form } from "@/components/ui/form";

// Ask the rider, decline, assign. Each posts to its endpoint and refreshes the page's server data.
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import type { RequestStatus } from "@/db/schema";
import { callApi, errorWithFields } from "@/lib/api-client";

const area = "min-h-20 rounded-lg border border-stone-300 bg-white px-3 py-2 text-base";
const open = (s: RequestStatus) => s === "submitted" || s === "in_review" || s === "waiting_for_rider";

function useAction(url: string) {
  const router = useRouter();
  const [state, setState] = useState<{ busy: boolean; error?: string; done?: string }>({ busy: false });
  async function run(body: unknown, done: (result: unknown) => string) {
    setState({ busy: true });
    const r = await callApi<unknown>(url, "POST", body, {
      offline: "No connection to the server. Nothing was changed; try again.",
    });
    if (!r.ok) return setState({ busy: false, error: errorWithFields(r) });
    setState({ busy: false, done: done(r.data) });
    router.refresh();
    return true;
  }
  return { ...state, run };
}

// The e-mail is queued with the change and goes out at once; the E-mails list shows how it went.
const emailNote = () => "The rider is being e-mailed (see E-mails).";

function TextAction(props: {
  id: string;
  label: string;
  button: string;
  url: string;
  field: "question" | "reason";
  variant: "secondary" | "danger";
  done: string;
}) {
  const [text, setText] = useState("");
  const action = useAction(props.url);
  async function submit(e: FormEvent) {
    e.preventDefault();
    if (await action.run({ [props.field]: text }, () => `${props.done} ${emailNote()}`)) setText("");
  }
  return (
    <Form onSubmit={submit} className="flex flex-col gap-2" aria-label={props.button}>
      <label htmlFor={props.id} className="text-sm font-medium text-stone-800">
        {props.label}
      </label>
      <textarea
        id={props.id}
        className={area}
        value={text}
        maxLength={2000}
        required
        minLength={5}
        onChange={(e) => setText(e.target.value)}
        aria-describedby={action.error ? `${props.id}-error` : undefined}
      />
      {action.error ? (
        <p id={`${props.id}-error`} role="alert" className="text-sm text-red-700">
          {action.error}
        </p>
      ) : null}
      {action.done ? (
        <p role="status" className="text-sm text-emerald-800">
          {action.done}
        </p>
      ) : null}
      <Button type="submit" variant={props.variant} disabled={action.busy || text.trim().length < 5}>
        {props.button}
      </Button>
    </Form>
  );
}

export function WorkflowActions({ requestId, status }: { requestId: string; status: RequestStatus }) {
  if (!open(status)) return null;
  return (
    <section
      aria-labelledby="workflow-heading"
      className="grid grid-cols-1 gap-4 rounded-xl border border-stone-200 bg-white p-4 md:grid-cols-2"
    >
      <h2 id="workflow-heading" className="text-lg font-semibold md:col-span-2">
        Ask or decline
      </h2>
      <TextAction
        id="ask-question"
        label="Question for the rider (sent by e-mail; the request then waits for the answer)"
        button="Ask the rider"
        url={`/api/requests/${requestId}/ask`}
        field="question"
        variant="secondary"
        done="Question sent."
      />
      <TextAction
        id="decline-reason"
        label="Reason for declining (sent to the rider)"
        button="Decline the request"
        url={`/api/requests/${requestId}/decline`}
        field="reason"
        variant="danger"
        done="Request declined."
      />
    </section>
  );
}

export function AssignForm({
  requestId,
  current,
  staff,
}: {
  requestId: string;
  current: string | null;
  staff: { id: string; name: string }[];
}) {
  const [tunerId, setTunerId] = useState(current ?? "");
  const action = useAction(`/api/requests/${requestId}/assign`);
  return (
    <Form
      aria-label="Assign"
      className="flex flex-wrap items-end gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        void action.run({ tunerId: tunerId || null }, () => "Assignment saved.");
      }}
    >
      <label className="flex flex-col gap-1 text-sm font-medium text-stone-800">
        Assigned tuner
        <select
          value={tunerId}
          onChange={(e) => setTunerId(e.target.value)}
          className="min-h-11 rounded-lg border border-stone-300 bg-white px-3"
        >
          <option value="">Not assigned</option>
          {staff.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </select>
      </label>
      <Button type="submit" variant="secondary" disabled={action.busy || tunerId === (current ?? "")}>
        Assign
      </Button>
      {action.error ? (
        <p role="alert" className="w-full text-sm text-red-700">
          {action.error}
        </p>
      ) : null}
      {action.done ? (
        <p role="status" className="w-full text-sm text-emerald-800">
          {action.done}
        </p>
      ) : null}
    </Form>
  );
}
