import type { InputHTMLAttributes, ReactNode } from "react";
import { cn } from "./cn";

interface FieldProps extends InputHTMLAttributes<HTMLInputElement> {
  id: string;
  label: ReactNode;
  error?: string;
  hint?: ReactNode;
}

/** A labelled input with its hint and error wired to aria-describedby. */
export function Field({ id, label, error, hint, className = "", ...input }: FieldProps) {
  const describedBy = describedByFor(id, hint, error);
  return (
    <div className={cn("flex flex-col gap-1", className)}>
      <label htmlFor={id} className="text-sm font-medium text-stone-800">
        {label}
      </label>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className="min-h-11 rounded-lg border border-stone-300 bg-white px-3 py-2 text-base text-stone-900 placeholder:text-stone-400 aria-[invalid=true]:border-red-600"
        {...input}
      />
      <FieldNotes id={id} hint={hint} error={error} />
    </div>
  );
}

/** The aria-describedby value for an input with the hint and error of FieldNotes, if any. */
export function describedByFor(id: string, hint?: ReactNode, error?: string): string | undefined {
  return [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(" ") || undefined;
}

/** A field's error, announced to screen readers; its id is what aria-describedby points at. */
export function ErrorText({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} role="alert" className="text-sm font-medium text-red-700">
      {message}
    </p>
  );
}

/** The hint and error under an input, with the ids `${id}-hint` and `${id}-error`. */
export function FieldNotes({ id, hint, error }: { id: string; hint?: ReactNode; error?: string }) {
  return (
    <>
      {hint ? (
        <p id={`${id}-hint`} className="text-sm text-stone-600">
          {hint}
        </p>
      ) : null}
      <ErrorText id={`${id}-error`} message={error} />
    </>
  );
}
