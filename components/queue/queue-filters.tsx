"use client";

import { Form } from "@/components/ui/form";

import { DISCIPLINE_LABELS } from "@/lib/labels";
import { useEffect, useState } from "react";
import { DayInput } from "@/components/forms/day-input";
import { Button } from "@/components/ui/button";
import { STATUS_LABELS } from "@/lib/requests/status";
import { DISCIPLINES } from "@/lib/sizing/vocab";
import type { QueueFilters } from "./queue-data";

export interface FilterOptions {
  bikeClasses: { value: string; label: string }[];
  tuners: { id: string; name: string }[];
}

const selectClass = "min-h-11 rounded-lg border border-stone-300 bg-white px-3 py-2 text-base text-stone-900";
const labelClass = "flex flex-col gap-1 text-sm font-medium text-stone-800";

export function QueueFiltersForm({
  filters,
  options,
  onChange,
}: {
  filters: QueueFilters;
  options: FilterOptions;
  onChange: (patch: Partial<QueueFilters>) => void;
}) {
  // Search waits for a pause in typing so each keystroke does not hit the server.
  const [q, setQ] = useState(filters.q);
  const [sentQ, setSentQ] = useState(filters.q);
  useEffect(() => {
    if (q === filters.q) return;
    const t = setTimeout(() => {
      setSentQ(q);
      onChange({ q });
    }, 300);
    return () => clearTimeout(t);
  }, [q, filters.q, onChange]);
  // When the URL's search changes from outside (clear filters, back button), show it; our own
  // update arriving late must not overwrite what the tuner has typed since.
  const [urlQ, setUrlQ] = useState(filters.q);
  if (urlQ !== filters.q) {
    setUrlQ(filters.q);
    if (filters.q !== sentQ) setQ(filters.q);
  }

  const pick = (key: keyof QueueFilters) => (e: { target: { value: string } }) => onChange({ [key]: e.target.value });
  const active = ["status", "q", "discipline", "bikeClass", "tuner", "from", "to"].some(
    (k) => filters[k as keyof QueueFilters],
  );

  return (
    <Form
      role="search"
      aria-label="Filter requests"
      className="grid grid-cols-2 gap-3 lg:grid-cols-4"
      onSubmit={(e) => e.preventDefault()}
    >
      <label className={`${labelClass} col-span-2`}>
        Search rider, e-mail, bike or number
        <input type="search" value={q} onChange={(e) => setQ(e.target.value)} className={selectClass} maxLength={100} />
      </label>
      <label className={labelClass}>
        Status
        <select value={filters.status} onChange={pick("status")} className={selectClass}>
          <option value="">Any status</option>
          {Object.entries(STATUS_LABELS).map(([v, l]) => (
            <option key={v} value={v}>
              {l}
            </option>
          ))}
        </select>
      </label>
      <label className={labelClass}>
        Discipline
        <select value={filters.discipline} onChange={pick("discipline")} className={selectClass}>
          <option value="">Any discipline</option>
          {DISCIPLINES.map((d) => (
            <option key={d} value={d}>
              {DISCIPLINE_LABELS[d]}
            </option>
          ))}
        </select>
      </label>
      <label className={labelClass}>
        Bike class
        <select value={filters.bikeClass} onChange={pick("bikeClass")} className={selectClass}>
          <option value="">Any bike class</option>
          {options.bikeClasses.map((b) => (
            <option key={b.value} value={b.value}>
              {b.label}
            </option>
          ))}
        </select>
      </label>
      <label className={labelClass}>
        Assigned tuner
        <select value={filters.tuner} onChange={pick("tuner")} className={selectClass}>
          <option value="">Anyone</option>
          <option value="me">Assigned to me</option>
          <option value="unassigned">Not assigned</option>
          {options.tuners.map((t) => (
            <option key={t.id} value={t.id}>
              {t.name}
            </option>
          ))}
        </select>
      </label>
      <DayInput
        label="Received from"
        value={filters.from}
        onChange={(from) => onChange({ from })}
        className={selectClass}
      />
      <DayInput label="Received to" value={filters.to} onChange={(to) => onChange({ to })} className={selectClass} />
      {active ? (
        <div className="flex items-end">
          <Button
            variant="secondary"
            onClick={() => onChange({ status: "", q: "", discipline: "", bikeClass: "", tuner: "", from: "", to: "" })}
          >
            Clear filters
          </Button>
        </div>
      ) : null}
    </Form>
  );
}
