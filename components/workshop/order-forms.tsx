"use client";

import { Form } from "@/components/ui/form";

// The order page's workshop forms: check-in, a part out to a finisher and back, shipping, refund.
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { formatMoney, isoDay } from "@/lib/format";
import { parseMajorToMinor } from "@/lib/orders/money";
import type { OrderView } from "@/lib/orders/types";
import { useOrderAction } from "./use-order-action";

const box = "flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4";
const value = (form: FormData, name: string) => String(form.get(name) ?? "").trim();

function Outcome({ problem, done }: { problem: string | null; done: string | null }) {
  if (problem)
    return (
      <p role="alert" className="text-sm font-medium text-red-700">
        {problem}
      </p>
    );
  if (done)
    return (
      <p role="status" className="text-sm text-emerald-800">
        {done}
      </p>
    );
  return null;
}

export function CheckInForm({ order }: { order: OrderView }) {
  const { busy, problem, fields, done, send } = useOrderAction();
  const checkIn = order.workshop?.checkIn;
  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const serials = [
      { part: "Fork", serial: value(form, "forkSerial") },
      { part: "Shock", serial: value(form, "shockSerial") },
    ].filter((s) => s.serial);
    await send(
      `/api/orders/${order.id}/check-in`,
      "POST",
      { serials, conditionNotes: value(form, "conditionNotes") },
      "Checked in.",
    );
  }
  const serial = (part: string) => checkIn?.serials.find((s) => s.part === part)?.serial ?? "";
  return (
    <section id="check-in" className={box} aria-labelledby="check-in-heading">
      <h2 id="check-in-heading" className="text-lg font-semibold">
        Check-in
      </h2>
      {checkIn ? (
        <p className="text-sm text-stone-700">
          Checked in by {checkIn.checkedInBy}. Serials:{" "}
          {checkIn.serials.map((s) => `${s.part} ${s.serial}`).join(", ") || "none"}.
        </p>
      ) : null}
      <Form onSubmit={submit} className="flex flex-col gap-3" noValidate>
        <Field
          id="forkSerial"
          name="forkSerial"
          label="Fork serial number"
          defaultValue={serial("Fork")}
          error={fields["serials.0.serial"]}
        />
        <Field
          id="shockSerial"
          name="shockSerial"
          label="Shock serial number"
          defaultValue={serial("Shock")}
          error={fields["serials.1.serial"]}
        />
        <label htmlFor="conditionNotes" className="text-sm font-medium">
          Condition as received
        </label>
        <textarea
          id="conditionNotes"
          name="conditionNotes"
          rows={3}
          defaultValue={checkIn?.conditionNotes ?? ""}
          className="rounded-lg border border-stone-300 p-2"
        />
        <Outcome problem={problem} done={done} />
        <Button type="submit" disabled={busy}>
          Record check-in
        </Button>
      </Form>
      <CheckInPhotos order={order} />
    </section>
  );
}

function CheckInPhotos({ order }: { order: OrderView }) {
  const { busy, problem, fields, done, send } = useOrderAction();
  const photos = order.workshop?.photos ?? [];
  async function upload(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    if (await send(`/api/orders/${order.id}/photos`, "POST", form, "Photos added.")) event.currentTarget?.reset();
  }
  return (
    <div className="flex flex-col gap-2">
      {photos.length ? (
        <ul className="grid grid-cols-3 gap-2">
          {photos.map((p, i) => (
            <li key={p.id}>
              <a
                href={`/api/orders/${order.id}/photos?photo=${p.id}`}
                className="block rounded border border-stone-200 p-1"
              >
                {/* Served by our own guarded route; next/image would cache it outside the guard. */}
                {/* eslint-disable-next-line @next/next/no-img-element */}
                <img
                  src={`/api/orders/${order.id}/photos?photo=${p.id}`}
                  alt={`Check-in photo ${i + 1}: ${p.name}`}
                  className="aspect-square w-full rounded object-cover"
                />
              </a>
            </li>
          ))}
        </ul>
      ) : null}
      <Form onSubmit={upload} className="flex flex-col gap-2" noValidate aria-label="Check-in photos">
        <label htmlFor="checkin-photos" className="text-sm font-medium">
          Photos of the parts as received (JPEG, PNG or WebP, up to 10 MB each)
        </label>
        <input id="checkin-photos" name="photos" type="file" accept="image/jpeg,image/png,image/webp" multiple />
        <Outcome problem={fields.photos ?? problem} done={done} />
        <Button type="submit" variant="secondary" disabled={busy}>
          Add photos
        </Button>
      </Form>
    </div>
  );
}

export function FinisherForms({
  order,
  finishers,
}: {
  order: OrderView;
  finishers: { id: string; name: string; work: string; turnaroundDays: number }[];
}) {
  const { busy, problem, fields, done, send } = useOrderAction();
  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const dueOn = value(form, "dueOn");
    await send(
      `/api/orders/${order.id}/finishers`,
      "POST",
      {
        finisherId: value(form, "finisherId"),
        part: value(form, "part"),
        sentOn: value(form, "sentOn"),
        ...(dueOn ? { dueOn } : {}),
      },
      "Part marked out at the finisher.",
    );
  }
  const canSend = order.stage === "in_work" || order.stage === "at_finisher";
  return (
    <section id="finisher" className={box} aria-labelledby="finisher-heading">
      <h2 id="finisher-heading" className="text-lg font-semibold">
        Out at a finisher
      </h2>
      {order.finisherJobs.length ? (
        <ul className="flex flex-col gap-2">
          {order.finisherJobs.map((j) => (
            <li key={j.id} className="flex flex-wrap items-center gap-2 text-sm">
              <span>
                {j.part} at {j.finisherName}: sent {j.sentOn}, due {j.dueOn}
                {j.backOn ? `, back ${j.backOn}` : ""}
              </span>
              {!j.backOn ? (
                <Button
                  variant="secondary"
                  className="min-h-9 px-2 text-sm"
                  disabled={busy}
                  onClick={() => send(`/api/orders/${order.id}/finisher-back`, "POST", { jobId: j.id }, "Part back.")}
                >
                  Mark {j.part} back
                </Button>
              ) : null}
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-stone-600">No part has gone out.</p>
      )}
      {canSend ? (
        <Form onSubmit={submit} className="flex flex-col gap-3" noValidate aria-label="Send a part out">
          <Field id="part" name="part" label="Part" placeholder="e.g. fork tubes" error={fields.part} />
          <div className="flex flex-col gap-1">
            <label htmlFor="finisherId" className="text-sm font-medium">
              Finisher
            </label>
            <select id="finisherId" name="finisherId" className="min-h-11 rounded-lg border border-stone-300 px-2">
              {finishers.map((f) => (
                <option key={f.id} value={f.id}>
                  {f.name} ({f.work}, usually {f.turnaroundDays} days)
                </option>
              ))}
            </select>
          </div>
          <Field
            id="sentOn"
            name="sentOn"
            type="date"
            label="Sent on"
            defaultValue={isoDay(new Date())}
            error={fields.sentOn}
          />
          <Field
            id="dueOn"
            name="dueOn"
            type="date"
            label="Due back"
            hint="Leave empty to use the finisher's usual turnaround."
            error={fields.dueOn}
          />
          <Outcome problem={problem} done={done} />
          <Button type="submit" disabled={busy || !finishers.length}>
            Mark part out
          </Button>
        </Form>
      ) : (
        <Outcome problem={problem} done={done} />
      )}
    </section>
  );
}

export function ShippingForm({ order }: { order: OrderView }) {
  const { busy, problem, fields, done, send } = useOrderAction();
  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    await send(
      `/api/orders/${order.id}`,
      "PATCH",
      {
        stage: "shipped",
        carrier: value(form, "carrier") || undefined,
        trackingNumber: value(form, "trackingNumber") || undefined,
      },
      "Marked shipped.",
    );
  }
  return (
    <section id="shipping" className={box} aria-labelledby="shipping-heading">
      <h2 id="shipping-heading" className="text-lg font-semibold">
        Shipping
      </h2>
      {order.shipping.trackingNumber ? (
        <p>
          Shipped with {order.shipping.carrier}, tracking {order.shipping.trackingNumber}.
        </p>
      ) : order.stage === "assembled" ? (
        <Form onSubmit={submit} className="flex flex-col gap-3" noValidate>
          <Field id="carrier" name="carrier" label="Carrier" error={fields.carrier} />
          <Field id="trackingNumber" name="trackingNumber" label="Tracking number" error={fields.trackingNumber} />
          <Outcome problem={problem} done={done} />
          <Button type="submit" disabled={busy}>
            Mark shipped
          </Button>
        </Form>
      ) : (
        <p className="text-sm text-stone-600">Ships once it is built and tested.</p>
      )}
    </section>
  );
}

export function RefundForm({ order }: { order: OrderView }) {
  const { busy, problem, fields, done, send } = useOrderAction();
  const [amountError, setAmountError] = useState<string | undefined>();
  const refundable = order.paidMinor - order.refundedMinor;
  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const typed = value(form, "amount");
    const amountMinor = typed ? parseMajorToMinor(typed, order.currency) : undefined;
    setAmountError(amountMinor === null ? "Enter the amount as a number, e.g. 12.50" : undefined);
    if (amountMinor === null) return;
    await send(
      `/api/orders/${order.id}/refund`,
      "POST",
      { ...(amountMinor === undefined ? {} : { amountMinor }), reason: value(form, "reason") },
      "Refunded.",
    );
  }
  if (refundable <= 0) return null;
  return (
    <section className={box} aria-labelledby="refund-heading">
      <h2 id="refund-heading" className="text-lg font-semibold">
        Refund
      </h2>
      <Form onSubmit={submit} className="flex flex-col gap-3" noValidate>
        <Field
          id="amount"
          name="amount"
          inputMode="decimal"
          label={`Amount (up to ${formatMoney(refundable, order.currency)})`}
          hint="Leave empty to refund everything paid."
          error={amountError ?? fields.amountMinor}
        />
        <Field id="reason" name="reason" label="Reason" error={fields.reason} />
        <Outcome problem={problem} done={done} />
        <Button type="submit" variant="danger" disabled={busy}>
          Refund
        </Button>
      </Form>
    </section>
  );
}
