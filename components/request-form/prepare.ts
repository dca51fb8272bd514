// From what the form holds (strings, empty fields, the bike choice) to the answers the shared
// schemas validate. Empty fields mean "not given", never 0.
import type { Resolver } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { friendlyError } from "@/lib/validations/messages";

type Json = unknown;

/** "" → undefined; `{ value: undefined, unit }` and unit-only objects → undefined. */
export function clean(value: Json): Json {
  if (value === "" || value === null) return undefined;
  if (Array.isArray(value)) return value.map(clean);
  if (typeof value !== "object") return value;
  const out: Record<string, Json> = {};
  for (const [k, v] of Object.entries(value as Record<string, Json>)) {
    const c = clean(v);
    if (c !== undefined) out[k] = c;
  }
  const keys = Object.keys(out);
  if ("value" in (value as object) && out.value === undefined) return undefined;
  if (keys.length === 0 || (keys.length === 1 && keys[0] === "unit")) return undefined;
  return out;
}

/** The bike step holds the picker's choice (a model id, or "not-listed") and the bike's name. */
export const NOT_LISTED = "not-listed";

export function prepareBike(raw: Json): Json {
  const v = (raw ?? {}) as Record<string, Json>;
  const { bikeName: _name, notListed, modelId, ...rest } = v;
  void _name;
  const cleaned = (clean(rest) ?? {}) as Record<string, Json>;
  if (modelId === NOT_LISTED) return { ...cleaned, modelId: null, notListed: clean(notListed) ?? {} };
  return { ...cleaned, modelId: modelId || null };
}

export function prepareStep(step: string, raw: Json): Json {
  if (step === "bike") return prepareBike(raw);
  return clean(raw) ?? {};
}

/** zodResolver over the prepared values, with plain-word messages. */
export function stepResolver<T extends z.ZodType>(step: string, schema: T): Resolver<Record<string, unknown>> {
  const inner = zodResolver(schema as never, { error: friendlyError }) as unknown as Resolver<Record<string, unknown>>;
  return (values, context, options) => inner(prepareStep(step, values) as Record<string, unknown>, context, options);
}
