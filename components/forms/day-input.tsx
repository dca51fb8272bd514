"use client";

// A date typed as people type it ("25.11.2026", "11/25/2026", "25 Nov 2026", "25112026"). It is
// read on each change and passed on as an ISO day only once it is a real date; what it was read as
// shows under the field, and text that is no date is named there instead of being sent.
import { useId, useState } from "react";
import { formatDay } from "@/lib/format";
import { parseTypedDay } from "@/lib/validations/typed-day";
import { dayField, receiveDay, typeDay } from "./day-field";

export function DayInput({
  label,
  value,
  onChange,
  className,
}: {
  label: string;
  /** The ISO day in use, or "". */
  value: string;
  onChange: (isoDay: string) => void;
  className?: string;
}) {
  const id = useId();
  const [field, setField] = useState(() => dayField(value));
  // The value changed, from outside (clear filters, back button) or as the echo of our own send.
  if (value !== field.shown) setField(receiveDay(field, value));
  const text = field.text;
  const parsed = parseTypedDay(text);
  const wrong = text.trim() !== "" && parsed === null;
  return (
    <div className="flex flex-col gap-1 text-sm font-medium text-stone-800">
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        type="text"
        inputMode="text"
        autoComplete="off"
        placeholder="e.g. 25 Nov 2026"
        value={text}
        aria-invalid={wrong}
        aria-describedby={`${id}-note`}
        className={className}
        onChange={(e) => {
          const typed = typeDay(field, e.target.value);
          setField(typed.field);
          if (typed.send !== null) onChange(typed.send);
        }}
      />
      <span id={`${id}-note`} className={wrong ? "text-red-700" : "font-normal text-stone-600"}>
        {wrong
          ? "Not a date: type it like 25.11.2026, 2026-11-25 or 25 Nov 2026"
          : parsed
            ? `Read as ${formatDay(parsed)}`
            : "Any usual way of writing a date"}
      </span>
    </div>
  );
}
