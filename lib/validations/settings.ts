// Shop settings (admin only): the single shop_settings row.
import { z } from "zod";
import { text } from "./text";

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `At most ${max} characters`)
    .transform((v) => (v === "" ? null : v))
    .nullable()
    .optional();

export const shopSettingsSchema = z
  .object({
    name: text().trim().min(2, "Give the shop's name").max(120),
    email: text().trim().toLowerCase().email("Enter a contact e-mail address"),
    phone: optionalText(40),
    address: optionalText(300),
    website: z
      .string()
      .trim()
      .url("Enter a full address starting with https://")
      .or(z.literal("").transform(() => null))
      .nullable()
      .optional(),
    units: z.enum(["metric", "imperial"], { message: "Choose metric or imperial" }),
    paperSize: z.enum(["A4", "LETTER"], { message: "Choose A4 or LETTER" }),
    sheetFooter: optionalText(500),
    // Full off-road kit is about 7–10 kg (lib/sizing/defaults.ts); allow a wide margin either side.
    gearMassKg: z.number().min(0, "Cannot be negative").max(25, "At most 25 kg"),
    frequencyRatioMin: z.number().min(0.3, "At least 0.3").max(3, "At most 3"),
    frequencyRatioMax: z.number().min(0.3, "At least 0.3").max(3, "At most 3"),
  })
  .superRefine((s, ctx) => {
    if (s.frequencyRatioMax <= s.frequencyRatioMin)
      ctx.addIssue({ code: "custom", path: ["frequencyRatioMax"], message: "Must be above the minimum" });
  });

export type ShopSettingsInput = z.input<typeof shopSettingsSchema>;
