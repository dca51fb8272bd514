"use client";

import { Form } from "@/components/ui/form";

// The rider's next fork and shock service dates, and a form to log hours ridden (a number and a
// day; "12,5" reads as 12.5). The dates come back from the server with every log.
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, type FieldValues } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { ErrorText, Field } from "@/components/ui/field";
import { cn } from "@/components/ui/cn";
import { callApi } from "@/lib/api-client";
import { formatDay, formatNumber } from "@/lib/format";
import type { DueService, ServiceOverview } from "@/lib/service/types";
import { hourLogSchema } from "@/lib/validations/service";

const STATE_TEXT: Record<DueService["state"], string> = {
  overdue: "Overdue",
  "due-soon": "Due soon",
  later: "Later",
  unknown: "No date yet",
};
const STATE_CLASS: Record<DueService["state"], string> = {
  overdue: "bg-red-100 text-red-900 ring-red-300",
  "due-soon": "bg-amber-100 text-amber-900 ring-amber-300",
  later: "bg-emerald-100 text-emerald-900 ring-emerald-300",
  unknown: "bg-stone-100 text-stone-800 ring-stone-300",
};

export const civilDay = (day: string) => formatDay(`${day}T00:00:00Z`);

export function DueList({ due }: { due: DueService[] }) {
  return (
    <ul className="flex flex-col gap-2">
      {due.map((d) => (
        <li key={d.item} className="flex flex-wrap items-center justify-between gap-2 rounded-lg bg-stone-50 p-3">
          <span className="flex flex-col">
            <span className="font-semibold">{d.label}</span>
            <span className="text-sm text-stone-700">
              {d.dueOn ? `Due ${civilDay(d.dueOn)}` : "Log your hours to get a date"} · every {d.intervalHours} h
              {d.by === "months" ? " (or the time limit, which comes first)" : ""}
            </span>
          </span>
          <span className={cn("rounded-full px-2 py-0.5 text-sm font-medium ring-1", STATE_CLASS[d.state])}>
            {STATE_TEXT[d.state]}
          </span>
        </li>
      ))}
    </ul>
  );
}

interface Answer {
  hoursLogged: number;
  due: DueService[];
}

export function ServiceDuePanel({
  requestId,
  token,
  overview,
}: {
  requestId: string;
  token?: string;
  overview: ServiceOverview;
}) {
  const [due, setDue] = useState(overview.due);
  const [hoursLogged, setHoursLogged] = useState(overview.hoursLogged);
  const [problem, setProblem] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const form = useForm<FieldValues>({
    resolver: zodResolver(hourLogSchema as never) as never,
    defaultValues: { hours: "", date: overview.today },
  });
  const { register, formState, setError } = form;
  const shown = due.filter((d) => d.item === "fork-oil" || d.item === "shock-service");
  const rest = due.filter((d) => !shown.includes(d));

  const onSubmit = form.handleSubmit(async () => {
    setProblem(null);
    setSaved(null);
    const values = form.getValues();
    const sent = await callApi<Answer>(
      `/api/status/${requestId}/hours`,
      "POST",
      { ...values, token },
      {
        offline: "No connection. Your hours are still in the form: send again when you have signal.",
        fallback: "The hours could not be saved.",
      },
    );
    if (sent.ok) {
      setDue(sent.data.due);
      setHoursLogged(sent.data.hoursLogged);
      setSaved(
        `Saved. ${formatNumber(sent.data.hoursLogged, 1)} h logged since your setup; the dates below moved with them.`,
      );
      form.reset({ hours: "", date: values.date });
      return;
    }
    for (const [field, message] of Object.entries(sent.fields)) setError(field, { message });
    if (!Object.keys(sent.fields).length) setProblem(sent.error);
  });

  return (
    <section
      className="flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4"
      aria-labelledby="service-heading"
    >
      <h2 id="service-heading" className="text-lg font-semibold">
        Next service
      </h2>
      <p className="text-stone-700">
        From your setup on {civilDay(overview.startedOn)}, the hours you log and{" "}
        {overview.hoursPerMonth ? `about ${overview.hoursPerMonth} h a month` : "the hours you log"}:{" "}
        {formatNumber(hoursLogged, 1)} h logged so far.
      </p>
      <DueList due={shown} />
      {rest.length ? <DueList due={rest} /> : null}
      <p className="text-sm text-stone-600">
        Intervals are the shop&apos;s, from common practice; your bike maker&apos;s service manual comes first. Forks
        and gas-charged shocks hold pressure and spring force: have a qualified technician open them.
      </p>
      <Form onSubmit={onSubmit} noValidate className="flex flex-col gap-3" aria-label="Log riding hours">
        <h3 className="font-semibold">Log hours ridden</h3>
        <div className="grid grid-cols-2 gap-3">
          <Field
            id="service-hours"
            label="Hours"
            inputMode="decimal"
            autoComplete="off"
            error={formState.errors.hours?.message as string | undefined}
            {...register("hours")}
          />
          <Field
            id="service-date"
            label="Day ridden"
            type="date"
            max={overview.today}
            error={formState.errors.date?.message as string | undefined}
            {...register("date")}
          />
        </div>
        <ErrorText id="service-problem" message={problem ?? undefined} />
        <Button type="submit" className="min-h-12" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Saving…" : "Log hours"}
        </Button>
        {saved ? (
          <p role="status" className="rounded-lg bg-emerald-50 p-3 text-emerald-900">
            {saved}
          </p>
        ) : null}
      </Form>
    </section>
  );
}
