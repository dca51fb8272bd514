// The rider's setup request, one schema per form step. The same schemas validate the form in the
// browser and the request on the server; the answers are stored exactly as given (values with
// their units) and converted to SI only for the engine (lib/requests/sizing-input.ts).
import { z } from "zod";
import { text } from "./text";
import {
  complaintSchema,
  disciplineSchema,
  jumpSizeSchema,
  rateUnitSchema,
  ridingStyleSchema,
  skillLevelSchema,
  terrainSchema,
} from "@/lib/sizing/vocab";
import { emailSchema } from "./auth";
import { typedNumber } from "./number";

export const massUnitSchema = z.enum(["kg", "lb"]);
export const lengthUnitSchema = z.enum(["mm", "in"]);
export const heightUnitSchema = z.enum(["cm", "in"]);

const positive = (field: string, max: number) =>
  typedNumber(
    z
      .number({ message: `Enter the ${field} as a number` })
      .positive(`The ${field} must be more than 0`)
      .max(max, `The ${field} looks too large`),
  );

export const riderStepSchema = z.object({
  name: text().trim().min(2, "Enter your name").max(100, "Keep the name under 100 characters"),
  email: emailSchema,
  phone: text().trim().max(30, "Keep the phone number under 30 characters").optional(),
  weight: z.object({ value: positive("weight", 600), unit: massUnitSchema }),
  gearIncluded: z.boolean(),
  height: z.object({ value: positive("height", 250), unit: heightUnitSchema }).optional(),
  skill: skillLevelSchema,
  style: ridingStyleSchema,
});

export const ridingStepSchema = z.object({
  discipline: disciplineSchema,
  terrain: z.array(terrainSchema).max(6).default([]),
  jumpSize: jumpSizeSchema,
  hoursPerMonth: typedNumber(
    z
      .number({ message: "Enter the hours per month as a number" })
      .min(0, "Hours per month cannot be negative")
      .max(400, "Hours per month looks too large")
      .optional(),
  ),
});

const springRateSchema = z.object({ value: positive("spring rate", 400), unit: rateUnitSchema });

export const bikeStepSchema = z
  .object({
    modelId: text().uuid("Pick a bike from the list, or choose “not listed”").nullable(),
    notListed: z
      .object({
        description: text().trim().min(2, "Describe the bike (make, size, type)").max(120),
        rearWheelTravel: z.object({ value: positive("rear wheel travel", 500), unit: lengthUnitSchema }),
        forkTravel: z.object({ value: positive("fork travel", 400), unit: lengthUnitSchema }),
        mass: z.object({ value: positive("bike weight", 300), unit: massUnitSchema }).optional(),
      })
      .optional(),
    year: typedNumber(
      z
        .number({ message: "Enter the year as a number, such as 2024" })
        .int("Enter the year as a whole number, such as 2024")
        .min(1970, "Year looks too early")
        .max(2100, "Year looks too late")
        .optional(),
    ),
    currentForkSpring: springRateSchema.optional(),
    currentShockSpring: springRateSchema.optional(),
    modifications: text().trim().max(1000).optional(),
  })
  .superRefine((bike, ctx) => {
    if (!bike.modelId && !bike.notListed) {
      ctx.addIssue({ code: "custom", path: ["modelId"], message: "Pick your bike, or choose “not listed”" });
    }
    // The engine's bike model needs 30–250 kg: outside that the figure is almost surely a typo.
    const mass = bike.notListed?.mass;
    if (mass) {
      const kg = mass.unit === "kg" ? mass.value : mass.value * 0.45359237;
      if (kg < 30 || kg > 250)
        ctx.addIssue({
          code: "custom",
          path: ["notListed", "mass", "value"],
          message: "Bike weight should be between 30 and 250 kg (66–550 lb)",
        });
    }
  });

const sagValue = typedNumber(
  z
    .number({ message: "Enter the sag as a number" })
    .min(0, "Sag cannot be negative")
    .max(400, "Sag looks too large")
    .optional(),
);

export const feelStepSchema = z.object({
  complaints: z.array(complaintSchema).max(8).default([]),
  notes: text().trim().max(2000, "Keep the notes under 2000 characters").optional(),
  currentSag: z
    .object({
      unit: lengthUnitSchema,
      rearStatic: sagValue,
      rearRace: sagValue,
      forkStatic: sagValue,
      forkRace: sagValue,
    })
    .optional(),
});

export const reviewStepSchema = z.object({
  consent: z.literal(true, { message: "Agree to be contacted about this request" }),
});

export const requestAnswersSchema = z.object({
  rider: riderStepSchema,
  riding: ridingStepSchema,
  bike: bikeStepSchema,
  feel: feelStepSchema,
  review: reviewStepSchema,
});

export type RequestAnswers = z.output<typeof requestAnswersSchema>;
export type RequestAnswersInput = z.input<typeof requestAnswersSchema>;
