"use client";

import { useState } from "react";
import { describedByFor } from "@/components/ui/field";
import { cn } from "@/components/ui/cn";

interface NumInputProps {
  id: string;
  label: string;
  value: number | undefined | null;
  onChange: (value: number | undefined) => void;
  error?: string;
  hint?: string;
  step?: string;
  className?: string;
}

/** A labelled number input that keeps what is typed ("1.") while handing the parent a number. */
export function NumInput({ id, label, value, onChange, error, hint, step = "any", className = "" }: NumInputProps) {
  const [text, setText] = useState(value === undefined || value === null ? "" : String(value));
  const [shown, setShown] = useState(value);
  // Only an outside change (reset, duplicate) rewrites the text; adjusting state during render is
  // React's recommended way to follow a prop (react.dev "you might not need an effect").
  if (!Object.is(shown, value)) {
    setShown(value);
    const parsed = text.trim() === "" ? undefined : Number(text.trim().replace(",", "."));
    if (!Object.is(parsed, value ?? undefined)) setText(value === undefined || value === null ? "" : String(value));
  }
  const describedBy = describedByFor(id, hint, error);
  return (
    <div className={cn("flex flex-col gap-1", className)}>
      <label htmlFor={id} className="text-sm font-medium text-stone-800">
        {label}
      </label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        step={step}
        value={text}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        onChange={(e) => {
          setText(e.target.value);
          const t = e.target.value.trim().replace(",", ".");
          onChange(t === "" ? undefined : Number.isFinite(Number(t)) ? Number(t) : Number.NaN);
        }}
        className="min-h-11 w-full rounded-lg border border-stone-300 bg-white px-3 py-2 text-base tabular-nums aria-[invalid=true]:border-red-600"
      />
      {hint ? (
        <p id={`${id}-hint`} className="text-xs text-stone-600">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} className="text-sm font-medium text-red-700">
          {error}
        </p>
      ) : null}
    </div>
  );
}
