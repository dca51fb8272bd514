// Thumb-sized form pieces: choice groups as large labelled options, unit toggles, a number with
// its unit, and a text area. Every input has a label; errors are tied with aria-describedby.
import type { InputHTMLAttributes, ReactNode, TextareaHTMLAttributes } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";
import { ErrorText, FieldNotes, describedByFor } from "@/components/ui/field";

export { ErrorText };

interface ChoiceGroupProps {
  name: string;
  legend: ReactNode;
  type: "radio" | "checkbox";
  options: Record<string, string>;
  register: UseFormRegisterReturn;
  error?: string;
  hint?: ReactNode;
  columns?: 1 | 2 | 3;
}

export function ChoiceGroup({ name, legend, type, options, register, error, hint, columns = 2 }: ChoiceGroupProps) {
  const errorId = `${name}-error`;
  const grid =
    columns === 1
      ? "grid-cols-1"
      : columns === 3
        ? "grid-cols-2 sm:grid-cols-3"
        : "grid-cols-1 min-[360px]:grid-cols-2";
  return (
    <fieldset className="flex min-w-0 flex-col gap-2" aria-describedby={error ? errorId : undefined}>
      <legend className="mb-1 text-sm font-medium text-stone-800">{legend}</legend>
      {hint ? <p className="text-sm text-stone-600">{hint}</p> : null}
      <div className={`grid gap-2 ${grid}`}>
        {Object.entries(options).map(([value, text]) => (
          <label
            key={value}
            className="flex min-h-12 cursor-pointer items-center gap-3 rounded-lg border border-stone-300 bg-white px-3 py-2 has-[:checked]:border-pine-700 has-[:checked]:bg-pine-50 has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-pine-600"
          >
            <input type={type} value={value} className="h-5 w-5 shrink-0 accent-pine-700" {...register} />
            <span>{text}</span>
          </label>
        ))}
      </div>
      <ErrorText id={errorId} message={error} />
    </fieldset>
  );
}

/** A segmented toggle between units (kg/lb, mm/in): the number is stored with the unit chosen. */
export function UnitToggle({
  name,
  legend,
  units,
  register,
}: {
  name: string;
  legend: string;
  units: readonly string[];
  register: UseFormRegisterReturn;
}) {
  return (
    <fieldset className="flex shrink-0 flex-col">
      <legend className="sr-only">{legend}</legend>
      <div className="flex overflow-hidden rounded-lg border border-stone-300 bg-white">
        {units.map((unit) => (
          <label
            key={unit}
            className="flex min-h-11 min-w-12 cursor-pointer items-center justify-center px-3 text-base font-semibold text-stone-700 has-[:checked]:bg-pine-700 has-[:checked]:text-white has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-pine-600"
          >
            <input type="radio" value={unit} className="sr-only" {...register} id={`${name}-${unit}`} />
            {unit}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

interface MeasureFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "name"> {
  id: string;
  label: ReactNode;
  register: UseFormRegisterReturn;
  error?: string;
  hint?: ReactNode;
  /** The unit toggle (or a fixed unit) shown beside the number. */
  unit: ReactNode;
}

export function MeasureField({ id, label, register, error, hint, unit, ...input }: MeasureFieldProps) {
  const describedBy = describedByFor(id, hint, error);
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium text-stone-800">
        {label}
      </label>
      <div className="flex items-stretch gap-2">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          className="min-h-11 w-full min-w-0 rounded-lg border border-stone-300 bg-white px-3 py-2 text-base aria-[invalid=true]:border-red-600"
          {...input}
          {...register}
        />
        {unit}
      </div>
      <FieldNotes id={id} hint={hint} error={error} />
    </div>
  );
}

interface TextAreaFieldProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, "name"> {
  id: string;
  label: ReactNode;
  register: UseFormRegisterReturn;
  error?: string;
  hint?: ReactNode;
}

export function TextAreaField({ id, label, register, error, hint, ...rest }: TextAreaFieldProps) {
  const describedBy = describedByFor(id, hint, error);
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium text-stone-800">
        {label}
      </label>
      <textarea
        id={id}
        rows={4}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className="w-full rounded-lg border border-stone-300 bg-white px-3 py-2 text-base aria-[invalid=true]:border-red-600"
        {...rest}
        {...register}
      />
      <FieldNotes id={id} hint={hint} error={error} />
    </div>
  );
}

/** Nested error messages by dotted path: the one reader shared with the shop's forms. */
export { errorAt } from "@/components/forms/apply-server-errors";
