"use client";

import { Form } from "@/components/ui/form";

// The admin's service intervals: per service, engine hours and an optional month limit, for any
// discipline (required: the fallback) and for the disciplines that differ; the reminder notice period
// and the shop's time zone. Checked with the server's schema before sending.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { callApi } from "@/lib/api-client";
import { SERVICE_ITEMS, SERVICE_ITEM_LABELS, type IntervalDiscipline, type ServiceInterval } from "@/lib/service/items";
import { DISCIPLINE_LABELS } from "@/components/request-form/labels";
import { DISCIPLINES } from "@/lib/sizing";
import { serviceSettingsSchema } from "@/lib/validations/service";
import { ScrollBox } from "@/components/ui/scroll-box";

const ROWS: IntervalDiscipline[] = ["any", ...DISCIPLINES];
const rowLabel = (d: IntervalDiscipline) => (d === "any" ? "Any discipline" : DISCIPLINE_LABELS[d]);
type Cell = { hours: string; months: string };
type Cells = Record<string, Cell>;
const key = (d: IntervalDiscipline, item: string) => `${d}:${item}`;

function cellsOf(intervals: readonly ServiceInterval[]): Cells {
  const cells: Cells = {};
  for (const d of ROWS)
    for (const item of SERVICE_ITEMS) {
      const found = intervals.find((i) => i.discipline === d && i.item === item);
      cells[key(d, item)] = {
        hours: found ? String(found.hours) : "",
        months: found?.months ? String(found.months) : "",
      };
    }
  return cells;
}

export function ServiceSettingsForm({
  initial,
}: {
  initial: { noticeDays: number; timeZone: string; intervals: ServiceInterval[] };
}) {
  const router = useRouter();
  const [cells, setCells] = useState(() => cellsOf(initial.intervals));
  const [noticeDays, setNoticeDays] = useState(String(initial.noticeDays));
  const [timeZone, setTimeZone] = useState(initial.timeZone);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);

  const save = async (event: React.FormEvent) => {
    event.preventDefault();
    setMessage(null);
    // Only rows with hours are sent; a discipline without its own row uses the "any" row.
    const order: string[] = [];
    const intervals = ROWS.flatMap((discipline) =>
      SERVICE_ITEMS.flatMap((item) => {
        const cell = cells[key(discipline, item)]!;
        if (discipline !== "any" && cell.hours.trim() === "" && cell.months.trim() === "") return [];
        order.push(key(discipline, item));
        return [{ item, discipline, hours: cell.hours, months: cell.months.trim() === "" ? undefined : cell.months }];
      }),
    );
    const body = { noticeDays, timeZone, intervals };
    const toErrors = (fields: Record<string, string>) => {
      const mapped: Record<string, string> = {};
      for (const [path, text] of Object.entries(fields)) {
        const m = /^intervals\.(\d+)\.(\w+)$/.exec(path);
        const at = m ? order[Number(m[1])] : undefined;
        mapped[at ? `${at}:${m![2] === "months" ? "months" : "hours"}` : path] = text;
      }
      return mapped;
    };
    const checked = serviceSettingsSchema.safeParse(body);
    if (!checked.success) {
      const fields: Record<string, string> = {};
      for (const issue of checked.error.issues) fields[issue.path.join(".") || "_"] ??= issue.message;
      setErrors(toErrors(fields));
      return setMessage({ ok: false, text: "Some fields need attention." });
    }
    const sent = await callApi("/api/shop/settings/service", "PUT", body);
    if (!sent.ok) {
      setErrors(toErrors(sent.fields));
      return setMessage({ ok: false, text: sent.error });
    }
    setErrors({});
    setMessage({ ok: true, text: "Service intervals saved. Due dates and reminders use them from now on." });
    router.refresh();
  };

  const set = (k: string, part: keyof Cell, value: string) =>
    setCells((c) => ({ ...c, [k]: { ...c[k]!, [part]: value } }));

  return (
    <Form onSubmit={save} noValidate className="flex flex-col gap-4 rounded-xl border border-stone-200 bg-white p-4">
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <Field
          id="notice-days"
          label="Notice period (days before a service is due)"
          inputMode="numeric"
          value={noticeDays}
          onChange={(e) => setNoticeDays(e.target.value)}
          error={errors.noticeDays}
        />
        <Field
          id="time-zone"
          label="Shop's time zone"
          hint="An IANA zone name, like Europe/Berlin or America/Denver: due dates are days on this calendar."
          value={timeZone}
          onChange={(e) => setTimeZone(e.target.value)}
          error={errors.timeZone}
        />
      </div>
      <ScrollBox label="Service intervals">
        <table className="w-full min-w-[40rem] text-left text-sm">
          <caption className="mb-2 text-left text-stone-700">
            Engine hours between services, and an optional limit in months (whichever comes first). Leave a
            discipline&apos;s row empty to use the &ldquo;any discipline&rdquo; row.
          </caption>
          <thead>
            <tr>
              <th scope="col" className="py-2 pr-3">
                Discipline
              </th>
              {SERVICE_ITEMS.map((item) => (
                <th key={item} scope="col" className="py-2 pr-3">
                  {SERVICE_ITEM_LABELS[item]}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {ROWS.map((d) => (
              <tr key={d} className="border-t border-stone-100 align-top">
                <th scope="row" className="py-2 pr-3 font-medium">
                  {rowLabel(d)}
                </th>
                {SERVICE_ITEMS.map((item) => {
                  const k = key(d, item);
                  return (
                    <td key={item} className="py-2 pr-3">
                      <div className="grid grid-cols-2 gap-2">
                        <Field
                          id={`${k}:hours`}
                          label={<span className="sr-only sm:not-sr-only">Hours</span>}
                          aria-label={`${rowLabel(d)}, ${SERVICE_ITEM_LABELS[item]}: hours`}
                          inputMode="decimal"
                          value={cells[k]!.hours}
                          onChange={(e) => set(k, "hours", e.target.value)}
                          error={errors[`${k}:hours`]}
                        />
                        <Field
                          id={`${k}:months`}
                          label={<span className="sr-only sm:not-sr-only">Months</span>}
                          aria-label={`${rowLabel(d)}, ${SERVICE_ITEM_LABELS[item]}: months`}
                          inputMode="numeric"
                          value={cells[k]!.months}
                          onChange={(e) => set(k, "months", e.target.value)}
                          error={errors[`${k}:months`]}
                        />
                      </div>
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollBox>
      {errors.intervals ? <p className="text-sm font-medium text-red-700">{errors.intervals}</p> : null}
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit">Save service intervals</Button>
        {message ? (
          <p role={message.ok ? "status" : "alert"} className={message.ok ? "text-emerald-800" : "text-red-700"}>
            {message.text}
          </p>
        ) : null}
      </div>
    </Form>
  );
}
