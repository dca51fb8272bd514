// What the rider sends to log riding hours, and what the admin sets for service intervals. Numbers
// typed on a phone may carry a decimal comma ("12,5"): read as 12.5.
import { z } from "zod";
import { DISCIPLINES } from "@/lib/sizing";
import { isCivilDate, isTimeZone } from "@/lib/service/civil-date";
import { SERVICE_ITEMS } from "@/lib/service/items";
import { statusTokenSchema } from "./status";
import { hasNul, NUL_MESSAGE } from "./text";

/** "12,5" → 12.5, "" → undefined (missing), anything else as typed (a number, or NaN for text). */
export function decimalComma(value: unknown): unknown {
  if (typeof value !== "string") return value;
  const t = value.trim().replace(",", ".");
  return t === "" ? undefined : Number(t);
}

const number = (message: string) => z.preprocess(decimalComma, z.number({ message }));

const day = (message: string) =>
  z
    .string({ message })
    .refine((v) => !hasNul(v), { message: NUL_MESSAGE, abort: true })
    .refine(isCivilDate, { message });

export const hourLogSchema = z.object({
  token: statusTokenSchema,
  hours: number("Enter the hours ridden as a number, like 2 or 1,5").pipe(
    z
      .number()
      .positive("Enter more than 0 hours")
      .max(200, "More than 200 hours at once looks like a typo: log each month or each ride"),
  ),
  date: day("Pick the day you rode"),
});
export type HourLogInput = z.input<typeof hourLogSchema>;
export type HourLog = z.output<typeof hourLogSchema>;

export const intervalRowSchema = z.object({
  item: z.enum(SERVICE_ITEMS, { message: "Choose a service" }),
  discipline: z.enum(["any", ...DISCIPLINES] as const, { message: "Choose a discipline, or any" }),
  hours: number("Enter the hours as a number").pipe(
    z.number().positive("Hours must be more than 0").max(2000, "More than 2000 hours looks like a typo"),
  ),
  months: z.preprocess(
    (v) => (v === null ? undefined : decimalComma(v)),
    z
      .number({ message: "Enter the months as a whole number, or leave it empty" })
      .int("Enter the months as a whole number")
      .min(1, "Months must be at least 1, or leave it empty")
      .max(120, "More than 120 months looks like a typo")
      .optional(),
  ),
});

export const serviceSettingsSchema = z
  .object({
    noticeDays: number("Enter the notice period in days").pipe(
      z
        .number()
        .int("Enter the notice period in whole days")
        .min(0, "The notice period cannot be negative")
        .max(90, "More than 90 days' notice is too early to be useful"),
    ),
    timeZone: z
      .string({ message: "Enter the shop's time zone, like Europe/Berlin" })
      .trim()
      .refine(isTimeZone, { message: "Enter a time zone name the calendar knows, like Europe/Berlin or UTC" }),
    intervals: z.array(intervalRowSchema, { message: "Send the list of intervals" }).max(200),
  })
  .superRefine((v, ctx) => {
    const seen = new Set<string>();
    v.intervals.forEach((row, i) => {
      const key = `${row.item}:${row.discipline}`;
      if (seen.has(key))
        ctx.addIssue({
          code: "custom",
          path: ["intervals", i, "discipline"],
          message: "This service already has a row for this discipline",
        });
      seen.add(key);
    });
    for (const item of SERVICE_ITEMS)
      if (!v.intervals.some((r) => r.item === item && r.discipline === "any"))
        ctx.addIssue({
          code: "custom",
          path: ["intervals"],
          message: "Every service needs a row for any discipline (the fallback)",
        });
  });
export type ServiceSettingsInput = z.input<typeof serviceSettingsSchema>;
export type ServiceSettingsValues = z.output<typeof serviceSettingsSchema>;
