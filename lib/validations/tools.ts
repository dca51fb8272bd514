// Workshop tools: inputs of the spring calculators. Pure schemas; the tools compute in the browser.
import { z } from "zod";
import { SPRING_STEEL_IDS, rateUnitSchema, type SpringSteel } from "@/lib/sizing";

/** Shigley, Mechanical Engineering Design, 10th ed., table 10-1: active coils per end type. */
export const END_TYPES = {
  "squared-ground": { label: "Squared and ground", inactive: 2 },
  squared: { label: "Squared (closed), not ground", inactive: 2 },
  plain: { label: "Plain", inactive: 0 },
  "plain-ground": { label: "Plain and ground", inactive: 1 },
} as const;
export type EndType = keyof typeof END_TYPES;
export const endTypeSchema = z.enum(Object.keys(END_TYPES) as [EndType, ...EndType[]]);

export function activeCoils(totalCoils: number, endType: EndType): number {
  return totalCoils - END_TYPES[endType].inactive;
}

const pos = (label: string, max: number) =>
  z
    .number({ message: `Enter the ${label}` })
    .positive(`${label} must be above 0`)
    .max(max, `${label} looks too large`);

/** Steel spring wire G ≈ 79.3 GPa (Shigley table 10-5, music wire / chrome-silicon ≈ 77–81 GPa). */
export const DEFAULT_SHEAR_MODULUS_MPA = 79_300;

export const coilGeometrySchema = z
  .object({
    wireDiameterMm: pos("Wire diameter", 30),
    outerDiameterMm: pos("Outer diameter", 200),
    totalCoils: pos("Total coils", 60),
    endType: endTypeSchema,
    shearModulusMpa: pos("Shear modulus", 200_000),
    loadN: z
      .number({ message: "Enter the load in N (0 for no stress check)" })
      .min(0, "Load cannot be negative")
      .max(100_000, "Load looks too large (at most 100 000 N)"),
    /** The wire's steel, for the allowable stress (lib/sizing/spring-steel.ts). */
    steel: z
      .enum(SPRING_STEEL_IDS as [SpringSteel, ...SpringSteel[]], { message: "Choose the wire's steel" })
      .default("chrome-silicon"),
  })
  .superRefine((g, ctx) => {
    if (g.outerDiameterMm - g.wireDiameterMm <= g.wireDiameterMm)
      ctx.addIssue({
        code: "custom",
        path: ["outerDiameterMm"],
        message: "Outer diameter must exceed twice the wire diameter",
      });
    if (activeCoils(g.totalCoils, g.endType) <= 0)
      ctx.addIssue({
        code: "custom",
        path: ["totalCoils"],
        message: "Too few coils for this end type: no active coil left",
      });
  });

export const loadTestSchema = z
  .object({
    length1Mm: pos("First length", 1000),
    force1: z.number().min(0, "Force cannot be negative"),
    length2Mm: pos("Second length", 1000),
    force2: z.number().min(0, "Force cannot be negative"),
    forceUnit: z.enum(["N", "kgf", "lbf"]),
  })
  .superRefine((t, ctx) => {
    if (t.length1Mm === t.length2Mm)
      ctx.addIssue({ code: "custom", path: ["length2Mm"], message: "The two lengths must differ" });
    else if ((t.force2 - t.force1) / (t.length1Mm - t.length2Mm) <= 0)
      ctx.addIssue({ code: "custom", path: ["force2"], message: "Force must rise as the spring gets shorter" });
  });

export const rateConvertSchema = z.object({
  value: z.number({ message: "Enter a rate" }).positive("Rate must be above 0"),
  from: rateUnitSchema,
});
