// The tuner's choice of rate basis for this request; empty keeps the shop's default from setup targets.
import { RATE_BASIS_LABELS } from "@/components/request-form/labels";
import { RATE_BASES, type RateBasis } from "@/lib/sizing";

export function RateBasisInput({
  value,
  onChange,
  used,
}: {
  value: RateBasis | "";
  onChange: (v: RateBasis | "") => void;
  used: RateBasis | undefined;
}) {
  return (
    <label className="flex flex-col gap-1 text-sm font-medium">
      How the spring rates are found
      <select
        id="rate-basis"
        className="min-h-11 rounded-lg border border-stone-300 bg-white px-2"
        value={value}
        onChange={(e) => onChange(e.target.value as RateBasis | "")}
      >
        <option value="">Shop default{used && !value ? ` (${RATE_BASIS_LABELS[used].split(" — ")[0]})` : ""}</option>
        <RateBasisOptions />
      </select>
    </label>
  );
}

/** One option per basis, in the shop's words; shared with the setup-targets editor. */
export function RateBasisOptions() {
  return RATE_BASES.map((b) => (
    <option key={b} value={b}>
      {RATE_BASIS_LABELS[b]}
    </option>
  ));
}
