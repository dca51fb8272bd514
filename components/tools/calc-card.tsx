import type { ReactNode } from "react";

/** One workshop calculator: inputs, results, and the formula with its source. */
export function CalcCard({
  id,
  title,
  children,
  formula,
  source,
}: {
  id: string;
  title: string;
  children: ReactNode;
  formula: ReactNode;
  source: string;
}) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4">
      <h2 id={id} className="text-lg font-semibold">
        {title}
      </h2>
      {children}
      <p className="border-t border-stone-200 pt-2 text-xs text-stone-700">
        <span className="font-semibold">Formula:</span> {formula} <span className="font-semibold">Source:</span>{" "}
        {source}
      </p>
    </section>
  );
}

export function Result({ label, value }: { label: string; value: string }) {
  return (
    <div className="flex justify-between gap-4 border-b border-stone-100 py-1 text-sm">
      <dt>{label}</dt>
      <dd className="font-semibold tabular-nums">{value}</dd>
    </div>
  );
}
