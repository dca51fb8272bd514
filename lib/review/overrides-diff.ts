// Figure-by-figure difference between two sets of tuner overrides, for the audit trail and the
// "changed against the engine" marks in the editor.
import type { SetupOverrides } from "@/lib/sizing";

export interface FigureChange {
  /** Dotted path in the overrides ("rear.rateNmm", "clickers.forkRebound"). */
  field: string;
  /** Figures are numbers; the rate basis is a word. */
  from: number | string | null;
  to: number | string | null;
}

function flatten(overrides: SetupOverrides | null | undefined): Map<string, number | string> {
  const out = new Map<string, number | string>();
  const walk = (value: unknown, path: string) => {
    if (typeof value === "number" || typeof value === "string") out.set(path, value);
    else if (value && typeof value === "object")
      for (const [k, v] of Object.entries(value)) walk(v, path ? `${path}.${k}` : k);
  };
  walk(overrides ?? {}, "");
  return out;
}

export function diffOverrides(
  before: SetupOverrides | null | undefined,
  after: SetupOverrides | null | undefined,
): FigureChange[] {
  const a = flatten(before);
  const b = flatten(after);
  const fields = [...new Set([...a.keys(), ...b.keys()])].sort();
  return fields
    .filter((f) => a.get(f) !== b.get(f))
    .map((field) => ({ field, from: a.get(field) ?? null, to: b.get(field) ?? null }));
}

/** Drops empty objects so `{ rear: {} }` and `{}` are the same stored value. */
export function compactOverrides(overrides: SetupOverrides): SetupOverrides {
  const out: SetupOverrides = overrides.rateBasis ? { rateBasis: overrides.rateBasis } : {};
  for (const key of ["rear", "front", "clickers"] as const) {
    const part = overrides[key];
    if (!part) continue;
    const kept = Object.fromEntries(Object.entries(part).filter(([, v]) => typeof v === "number"));
    if (Object.keys(kept).length) (out as Record<string, unknown>)[key] = kept;
  }
  return out;
}
