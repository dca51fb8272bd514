// Numbers a rider types: a decimal comma reads as a decimal point, through the one shared preprocess
// of lib/validations/number.ts, in every rider schema (request form steps and the sag report).
// Source: ISO 80000-1:2009 §7.3.2 — the decimal sign is either a comma or a point on the line.
import { describe, expect, it } from "vitest";
import { friendlyError } from "@/lib/validations/messages";
import { readTypedNumber } from "@/lib/validations/number";
import { bikeStepSchema, feelStepSchema, riderStepSchema, ridingStepSchema } from "@/lib/validations/request";
import { sagReportSchema } from "@/lib/validations/status";

const rider = (weight: unknown) => ({
  name: "Test Rider",
  email: "rider@example.test",
  weight: { value: weight, unit: "kg" },
  gearIncluded: true,
  skill: "novice",
  style: "smooth",
});

describe("readTypedNumber", () => {
  it("reads a decimal comma or point, and trims", () => {
    expect(readTypedNumber("86,5")).toBe(86.5);
    expect(readTypedNumber(" 86.5 ")).toBe(86.5);
    expect(readTypedNumber(",5")).toBe(0.5);
    expect(readTypedNumber("86,")).toBe(86);
    expect(readTypedNumber("-1,25")).toBe(-1.25);
    expect(readTypedNumber(12)).toBe(12);
  });
  it("reads an empty text as not given, never 0", () => {
    expect(readTypedNumber("")).toBeUndefined();
    expect(readTypedNumber("   ")).toBeUndefined();
  });
  it("passes on text that is no number (or is ambiguous) for the field's own message", () => {
    expect(readTypedNumber("abc")).toBe("abc");
    expect(readTypedNumber("1,234.5")).toBe("1,234.5");
    expect(readTypedNumber("1,2,3")).toBe("1,2,3");
  });
});

describe("rider schemas accept a decimal comma", () => {
  it("weight 86,5 kg is 86.5 kg", () => {
    expect(riderStepSchema.parse(rider("86,5")).weight).toEqual({ value: 86.5, unit: "kg" });
  });
  it("height, hours per month, bike figures, current springs and current sag", () => {
    const withHeight = riderStepSchema.parse({ ...rider("80"), height: { value: "178,5", unit: "cm" } });
    expect(withHeight.height?.value).toBe(178.5);
    const riding = ridingStepSchema.parse({ discipline: "enduro", jumpSize: "small", hoursPerMonth: "7,5" });
    expect(riding.hoursPerMonth).toBe(7.5);
    const bike = bikeStepSchema.parse({
      modelId: null,
      notListed: {
        description: "Home-built enduro",
        rearWheelTravel: { value: "12,8", unit: "in" },
        forkTravel: { value: "11,8", unit: "in" },
      },
      currentShockSpring: { value: "5,4", unit: "kgf/mm" },
    });
    expect(bike.notListed?.rearWheelTravel.value).toBe(12.8);
    expect(bike.currentShockSpring?.value).toBe(5.4);
    const feel = feelStepSchema.parse({ currentSag: { unit: "mm", rearRace: "104,5" } });
    expect(feel.currentSag?.rearRace).toBe(104.5);
  });
  it("sag report readings", () => {
    const report = sagReportSchema.parse({
      unit: "mm",
      rear: { free: "", static: "33,5", race: "104,5" },
      front: { free: "", static: "", race: "" },
    });
    expect(report.rear).toEqual({ static: 33.5, race: 104.5 });
    expect(report.front).toEqual({});
  });
});

describe("what is not a number gets the field's own words", () => {
  const messages = (result: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
    Object.fromEntries((result.error?.issues ?? []).map((i) => [i.path.join("."), i.message]));
  it("weight", () => {
    expect(messages(riderStepSchema.safeParse(rider("eighty"), { error: friendlyError }))).toEqual({
      "weight.value": "Enter the weight as a number",
    });
    expect(messages(riderStepSchema.safeParse(rider("1,234.5"), { error: friendlyError }))).toEqual({
      "weight.value": "Enter the weight as a number",
    });
  });
  it("a sag reading, and the year", () => {
    const sag = sagReportSchema.safeParse(
      { unit: "mm", rear: { static: "3x", race: "100" }, front: {} },
      { error: friendlyError },
    );
    expect(messages(sag)).toEqual({ "rear.static": "Enter the rear static sag as a number" });
    const year = bikeStepSchema.safeParse({ modelId: null, year: "2023,5" }, { error: friendlyError });
    expect(messages(year)["year"]).toBe("Enter the year as a whole number, such as 2024");
  });
});
