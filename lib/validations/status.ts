// What a rider sends from the private status page: an answer to the tuner's question, and the sag
// measured after fitting the springs (values as given, in mm or inches).
import { z } from "zod";
import { text } from "./text";
import { lengthUnitSchema } from "./request";
import { typedNumber } from "./number";
import { SAG_TERMS } from "./sag-terms";

/** A status token from the rider's link, or nothing when the rider is signed in by e-mail. */
export const statusTokenSchema = text().min(20).max(200).optional();

export const riderAnswerSchema = z.object({
  token: statusTokenSchema,
  body: z
    .string()
    .trim()
    .min(2, "Write your answer to the shop's question")
    .max(2000, "Keep the answer under 2000 characters"),
});

// Empty inputs arrive as "" from the form: the shared preprocess reads them as "not measured"
// rather than 0, and "31,5" as 31.5.
const optionalReading = (what: string) =>
  typedNumber(
    z
      .number({ message: `Enter the ${what} as a number` })
      .min(0, `The ${what} cannot be negative`)
      .max(400, `The ${what} looks too large`)
      .optional(),
  );

const endSchema = (end: "front" | "rear") =>
  z
    .object({
      free: optionalReading(`${end} free sag`),
      static: optionalReading(`${end} static sag`),
      race: optionalReading(`${end} race sag`),
    })
    .superRefine((v, ctx) => {
      const any = v.free !== undefined || v.static !== undefined || v.race !== undefined;
      if (!any) return;
      if (v.static === undefined)
        ctx.addIssue({ code: "custom", path: ["static"], message: `Enter the ${end} static sag` });
      if (v.race === undefined) ctx.addIssue({ code: "custom", path: ["race"], message: `Enter the ${end} race sag` });
      else if (v.race === 0) ctx.addIssue({ code: "custom", path: ["race"], message: "Race sag must be more than 0" });
      else if (v.static !== undefined && v.race <= v.static)
        ctx.addIssue({
          code: "custom",
          path: ["race"],
          message: `Race sag (${SAG_TERMS.race.meaning}) must be larger than static sag (${SAG_TERMS.static.meaning})`,
        });
    });

export const sagReportSchema = z
  .object({
    token: statusTokenSchema,
    unit: lengthUnitSchema,
    front: endSchema("front"),
    rear: endSchema("rear"),
  })
  .superRefine((v, ctx) => {
    const given = (e: { static?: number; race?: number }) => e.static !== undefined || e.race !== undefined;
    if (!given(v.front) && !given(v.rear))
      ctx.addIssue({ code: "custom", path: ["rear", "race"], message: "Enter the sag for at least one end" });
  });

export type SagReportInput = z.input<typeof sagReportSchema>;
export type SagReport = z.output<typeof sagReportSchema>;
