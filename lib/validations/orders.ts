// What staff and riders send about orders: the service type, quote lines, stage moves with their
// details, check-in, finisher jobs, refunds, and the admin's order settings. Every message is in the
// shop's words; `orderErrors` covers whatever a schema does not name itself.
import { z } from "zod";
import { ORDER_STAGES, PRICE_KINDS, SERVICE_TYPES } from "@/lib/orders/stages";
import { statusTokenSchema } from "./status";
import { text } from "./text";

export const orderErrors: z.core.$ZodErrorMap = (issue) => {
  const missing = issue.input === undefined || issue.input === null || issue.input === "";
  if (missing) return "This is required";
  if (issue.code === "invalid_type" && issue.expected === "number") return "Enter a number";
  if (issue.code === "invalid_type" && issue.expected === "array") return "Send a list";
  if (issue.code === "invalid_type" && issue.expected === "object") return "Send the details as a form";
  if (issue.code === "invalid_value") return "Choose one of the options";
  return "Check this value";
};

const isoDate = (what: string) =>
  text()
    .regex(/^\d{4}-\d{2}-\d{2}$/, `Enter the ${what} as a date (YYYY-MM-DD)`)
    .refine((v) => !Number.isNaN(Date.parse(`${v}T00:00:00Z`)), `Enter a real ${what}`);

const shortText = (what: string, max = 200) =>
  text().trim().min(1, `Enter the ${what}`).max(max, `Keep the ${what} under ${max} characters`);

export const createOrderSchema = z.object({
  token: statusTokenSchema,
  serviceType: z.enum(SERVICE_TYPES, { error: "Choose send-in rebuild, kit built to order or springs only" }),
});

const minor = (what: string, max = 10_000_000) =>
  z
    .number({ error: `Enter the ${what} in the currency's smallest unit (e.g. cents)` })
    .int(`Enter the ${what} in whole cents`)
    .min(0, `The ${what} cannot be negative`)
    .max(max, `The ${what} looks too large`);

export const orderLineSchema = z.object({
  priceItemId: z.uuid({ error: "Choose an item of the price list" }).optional(),
  description: text().trim().max(200, "Keep the description under 200 characters").optional(),
  quantity: z
    .number({ error: "Enter the quantity as a whole number" })
    .int("Enter the quantity as a whole number")
    .min(1, "The quantity must be at least 1")
    .max(99, "The quantity must be at most 99"),
  unitPriceMinor: minor("unit price").optional(),
});

export const replaceLinesSchema = z.object({
  lines: z.array(orderLineSchema, { error: "Send the quote lines as a list" }).max(40, "At most 40 lines per quote"),
});
export type ReplaceLinesBody = z.infer<typeof replaceLinesSchema>;

export const tokenOnlySchema = z.object({ token: statusTokenSchema });

export const patchOrderSchema = z.object({
  stage: z.enum(ORDER_STAGES, { error: "Choose a stage of the board" }).optional(),
  carrier: shortText("carrier", 80).optional(),
  trackingNumber: shortText("tracking number", 80).optional(),
  inboundTracking: text().trim().max(80, "Keep the tracking number under 80 characters").optional(),
  dueOn: isoDate("due date").nullable().optional(),
  assignedTunerId: text().min(1).max(100).nullable().optional(),
  builtBy: text().trim().max(80, "Keep the name under 80 characters").optional(),
  testedBy: text().trim().max(80, "Keep the name under 80 characters").optional(),
});
export type PatchOrderBody = z.infer<typeof patchOrderSchema>;

export const checkInSchema = z.object({
  serials: z
    .array(z.object({ part: shortText("part", 80), serial: shortText("serial number", 80) }), {
      error: "Send the serial numbers as a list",
    })
    .max(10, "At most 10 serial numbers"),
  conditionNotes: text().trim().max(4000, "Keep the condition notes under 4000 characters"),
});
export type CheckInBody = z.infer<typeof checkInSchema>;

export const finisherOutSchema = z.object({
  finisherId: z.uuid({ error: "Choose a finisher" }),
  part: shortText("part", 120),
  sentOn: isoDate("date sent"),
  dueOn: isoDate("due date").optional(),
});
export type FinisherOutBody = z.infer<typeof finisherOutSchema>;

export const finisherBackSchema = z.object({ backOn: isoDate("date back").optional() });

export const refundSchema = z.object({
  amountMinor: minor("refund amount").min(1, "The refund must be more than 0").optional(),
  reason: shortText("reason for the refund", 500),
});
export type RefundBody = z.infer<typeof refundSchema>;

const currencyCode = text()
  .trim()
  .toUpperCase()
  .regex(/^[A-Z]{3}$/, "Enter a three-letter currency code (ISO 4217, e.g. EUR)")
  .refine((code) => {
    try {
      new Intl.NumberFormat("en", { style: "currency", currency: code });
      return Intl.supportedValuesOf("currency").includes(code);
    } catch {
      return false;
    }
  }, "This is not a currency code we know (ISO 4217, e.g. EUR)");

export const orderSettingsSchema = z.object({
  currency: currencyCode,
  taxRateBp: z
    .number({ error: "Enter the tax rate" })
    .int("Enter the tax rate in hundredths of a percent")
    .min(0, "The tax rate cannot be negative")
    .max(10_000, "The tax rate must be at most 100 %"),
  paymentMode: z.enum(["full", "deposit"], { error: "Choose full payment or a deposit" }),
  depositPercent: z
    .number({ error: "Enter the deposit as a percentage" })
    .int("Enter the deposit as a whole percentage")
    .min(1, "The deposit must be at least 1 %")
    .max(100, "The deposit must be at most 100 %"),
  notifyStages: z.array(z.enum(ORDER_STAGES, { error: "Choose stages of the board" })).max(ORDER_STAGES.length),
  packingInstructions: text().trim().max(4000, "Keep the packing instructions under 4000 characters").nullable(),
});
export type OrderSettingsBody = z.infer<typeof orderSettingsSchema>;

export const priceItemSchema = z.object({
  code: text()
    .trim()
    .regex(/^[a-z0-9-]{2,40}$/, "Use 2–40 lower-case letters, digits and dashes for the code"),
  label: shortText("name", 120),
  kind: z.enum(PRICE_KINDS, { error: "Choose service, spring, part or shipping" }),
  unitPriceMinor: minor("price"),
  active: z.boolean({ error: "Say whether the item is offered" }).default(true),
  sortOrder: z.number({ error: "Enter a number" }).int().min(0).max(1000).default(0),
});

export const finisherSchema = z.object({
  name: shortText("finisher's name", 120),
  work: shortText("work they do", 200),
  turnaroundDays: z
    .number({ error: "Enter the usual turnaround in days" })
    .int("Enter the turnaround in whole days")
    .min(1, "The turnaround must be at least 1 day")
    .max(120, "The turnaround must be at most 120 days"),
  active: z.boolean({ error: "Say whether the finisher is in use" }).default(true),
});
