// The editor's form values (strings, as typed) to the engine's overrides and back. Empty means
// "the engine's choice". Rates may be typed in any rate unit and are converted to N/mm with the
// engine's exact factors (convertRate).
import { z } from "zod";
import { outOfBikeRange } from "@/lib/review/override-bounds";
import { compactOverrides } from "@/lib/review/overrides-diff";
import {
  CLICKER_IDS,
  convertRate,
  type ClickerId,
  type RateBasis,
  type RateUnit,
  type SetupOverrides,
  type SizingInput,
} from "@/lib/sizing";
import { saveRecommendationSchema } from "@/lib/validations/review";

export interface EditorValues {
  /** "" keeps the shop's default basis. */
  rateBasis: RateBasis | "";
  rearRate: string;
  rearRateUnit: RateUnit;
  rearPreload: string;
  rearRaceSag: string;
  rearStaticMin: string;
  rearStaticMax: string;
  frontRate: string;
  frontRateUnit: RateUnit;
  frontPreload: string;
  frontOilLevel: string;
  frontAirKpa: string;
  frontRaceSag: string;
  frontStaticMin: string;
  frontStaticMax: string;
  clickers: Partial<Record<ClickerId, string>>;
  notesForRider: string;
  internalNotes: string;
}

const str = (v: number | undefined) => (v === undefined ? "" : String(Math.round(v * 1000) / 1000));

export function valuesFrom(
  o: SetupOverrides,
  notesForRider: string | null,
  internalNotes: string | null,
): EditorValues {
  return {
    rateBasis: o.rateBasis ?? "",
    rearRate: str(o.rear?.rateNmm),
    rearRateUnit: "N/mm",
    rearPreload: str(o.rear?.preloadMm),
    rearRaceSag: str(o.rear?.raceSagMm),
    rearStaticMin: str(o.rear?.staticSagMinMm),
    rearStaticMax: str(o.rear?.staticSagMaxMm),
    frontRate: str(o.front?.rateNmm),
    frontRateUnit: "N/mm",
    frontPreload: str(o.front?.preloadMm),
    frontOilLevel: str(o.front?.oilLevelMm),
    frontAirKpa: str(o.front?.airPressureKpaGauge),
    frontRaceSag: str(o.front?.raceSagMm),
    frontStaticMin: str(o.front?.staticSagMinMm),
    frontStaticMax: str(o.front?.staticSagMaxMm),
    clickers: Object.fromEntries(CLICKER_IDS.map((id) => [id, str(o.clickers?.[id])])),
    notesForRider: notesForRider ?? "",
    internalNotes: internalNotes ?? "",
  };
}

export type FieldErrors = Record<string, string>;

/** Overrides from the form; a value that is not a number is reported under its field name. */
export function overridesFrom(v: EditorValues, airFork: boolean): { overrides: SetupOverrides; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const num = (field: string, text: string): number | undefined => {
    const t = text.trim().replace(",", ".");
    if (t === "") return undefined;
    const n = Number(t);
    if (!Number.isFinite(n)) {
      errors[field] = "Enter a number, or leave empty for the engine's choice";
      return undefined;
    }
    return n;
  };
  const rate = (field: string, text: string, unit: RateUnit) => {
    const n = num(field, text);
    return n === undefined ? undefined : convertRate(n, unit, "N/mm");
  };
  const overrides: SetupOverrides = {
    rateBasis: v.rateBasis || undefined,
    rear: {
      rateNmm: rate("rear.rateNmm", v.rearRate, v.rearRateUnit),
      preloadMm: num("rear.preloadMm", v.rearPreload),
      raceSagMm: num("rear.raceSagMm", v.rearRaceSag),
      staticSagMinMm: num("rear.staticSagMinMm", v.rearStaticMin),
      staticSagMaxMm: num("rear.staticSagMaxMm", v.rearStaticMax),
    },
    front: {
      // Only the spring kind the fork has is sent (the engine ignores the other with a warning).
      rateNmm: airFork ? undefined : rate("front.rateNmm", v.frontRate, v.frontRateUnit),
      preloadMm: airFork ? undefined : num("front.preloadMm", v.frontPreload),
      oilLevelMm: airFork ? undefined : num("front.oilLevelMm", v.frontOilLevel),
      airPressureKpaGauge: airFork ? num("front.airPressureKpaGauge", v.frontAirKpa) : undefined,
      raceSagMm: num("front.raceSagMm", v.frontRaceSag),
      staticSagMinMm: num("front.staticSagMinMm", v.frontStaticMin),
      staticSagMaxMm: num("front.staticSagMaxMm", v.frontStaticMax),
    },
    clickers: Object.fromEntries(
      CLICKER_IDS.map((id) => [id, num(`clickers.${id}`, v.clickers[id] ?? "")]).filter(([, n]) => n !== undefined),
    ),
  };
  return { overrides: compactOverrides(overrides), errors };
}

/**
 * The editor's schema for react-hook-form: the typed strings must read as numbers, and the overrides
 * they make must pass the same schema the save endpoint uses (saveRecommendationSchema). Errors are
 * keyed by the engine's paths ("rear.rateNmm"), as the inputs and the server name them.
 */
export function editorSchema(airFork: boolean, input?: SizingInput) {
  return z
    .custom<EditorValues>((v) => typeof v === "object" && v !== null)
    .superRefine((values, ctx) => {
      const { overrides, errors } = overridesFrom(values, airFork);
      for (const [path, message] of Object.entries(errors)) ctx.addIssue({ code: "custom", path: [path], message });
      const checked = saveRecommendationSchema.shape.overrides.safeParse(overrides);
      if (!checked.success)
        for (const issue of checked.error.issues)
          ctx.addIssue({ code: "custom", path: [issue.path.join(".")], message: issue.message });
      // The bike's own ranges (oil level, preload, clickers): refused, never clamped quietly.
      if (input)
        for (const [path, message] of Object.entries(outOfBikeRange(input, overrides)))
          if (!errors[path]) ctx.addIssue({ code: "custom", path: [path], message });
    });
}

/** react-hook-form's nested errors back to `{ "rear.rateNmm": message }`. */
export function flatErrors(errors: object, prefix = ""): FieldErrors {
  const out: FieldErrors = {};
  for (const [key, value] of Object.entries(errors)) {
    if (!value || typeof value !== "object") continue;
    const path = prefix ? `${prefix}.${key}` : key;
    if (typeof (value as { message?: unknown }).message === "string")
      out[path] = (value as { message: string }).message;
    else Object.assign(out, flatErrors(value, path));
  }
  return out;
}
