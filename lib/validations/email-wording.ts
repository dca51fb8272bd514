// The owner's wording of a rider e-mail: which template, its heading and opening paragraph. Empty
// fields mean the template's own words. Only the three known placeholders may appear in braces.
import { z } from "zod";
import { text } from "./text";

export const RIDER_EMAIL_TEMPLATES = ["request-received", "tuner-question", "request-declined", "sheet-ready"] as const;
export const riderEmailTemplateSchema = z.enum(RIDER_EMAIL_TEMPLATES, { message: "Choose one of the rider e-mails" });

const PLACEHOLDER = /\{([^{}]*)\}/g;
const KNOWN = new Set(["rider", "request", "shop"]);

const wordingText = (what: string, max: number) =>
  text()
    .trim()
    .max(max, `Keep the ${what} under ${max} characters`)
    .refine((v) => [...v.matchAll(PLACEHOLDER)].every((m) => KNOWN.has(m[1]!)), {
      message: "Only {rider}, {request} and {shop} can be filled in: check the words in braces",
    })
    .nullish()
    .transform((v) => (v ? v : null));

export const emailWordingSchema = z.object({
  template: riderEmailTemplateSchema,
  heading: wordingText("heading", 120),
  intro: wordingText("opening paragraph", 1000),
});

export type EmailWordingInput = z.input<typeof emailWordingSchema>;
