import type { SizingWarning } from "@/lib/sizing";

const SEVERITY: Record<SizingWarning["severity"], { label: string; className: string }> = {
  critical: { label: "Critical", className: "border-red-300 bg-red-50 text-red-900" },
  caution: { label: "Caution", className: "border-amber-300 bg-amber-50 text-amber-900" },
  info: { label: "Note", className: "border-sky-200 bg-sky-50 text-sky-900" },
};

/** The engine's warnings, each with its severity in words (colour is never the only signal). */
export function WarningsList({ warnings }: { warnings: SizingWarning[] }) {
  if (warnings.length === 0) return <p className="text-sm text-stone-700">No warnings from the engine.</p>;
  return (
    <ul className="flex flex-col gap-2" aria-label="Warnings">
      {warnings.map((w, i) => (
        <li key={`${w.code}-${i}`} className={`rounded-lg border px-3 py-2 text-sm ${SEVERITY[w.severity].className}`}>
          <span className="font-semibold">{SEVERITY[w.severity].label}:</span> {w.message}
        </li>
      ))}
    </ul>
  );
}

export function ReasonsList({ reasons }: { reasons: string[] }) {
  return (
    <ol className="list-decimal space-y-1 pl-5 text-sm text-stone-800" aria-label="Reasons">
      {reasons.map((r, i) => (
        <li key={i}>{r}</li>
      ))}
    </ol>
  );
}

/** Shown beside every setup: the work stores energy and a wrong setup can hurt the rider. */
export function SafetyNote() {
  return (
    <p className="rounded-lg border border-stone-300 bg-stone-50 px-3 py-2 text-sm text-stone-800">
      <span className="font-semibold">Safety:</span> springs under preload and gas-charged shocks store energy. Use a
      spring compressor, release gas pressure before opening a shock, and follow the manufacturer&apos;s service manual,
      torque figures and local rules. These figures are a starting point: confirm them by measuring sag on the bike.
    </p>
  );
}
