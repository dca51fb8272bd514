// The adjust editor's pure parts: typed values → engine overrides (rate units converted with exact
// factors), the figure-by-figure audit diff, and which workflow step may start from which status.
import { describe, expect, it } from "vitest";
import { editorSchema, flatErrors, overridesFrom, valuesFrom } from "@/components/review/editor-state";
import { compactOverrides, diffOverrides } from "@/lib/review/overrides-diff";
import { canStart, conflictMessage } from "@/lib/review/transitions";
import { demoSizingInput } from "@/lib/pdf/demo-data";
import { sagTargetFractionsSchema } from "@/lib/sizing";

describe("editorSchema (the form's resolver schema)", () => {
  const empty = valuesFrom({}, null, null);
  const issues = (values: typeof empty, air = false) => {
    const parsed = editorSchema(air).safeParse(values);
    return parsed.success ? {} : Object.fromEntries(parsed.error.issues.map((i) => [i.path.join("."), i.message]));
  };

  it("accepts an untouched form (every figure left to the engine)", () => {
    expect(issues(empty)).toEqual({});
  });

  it("names a value that is not a number, under the engine's path", () => {
    expect(Object.keys(issues({ ...empty, rearPreload: "ten" }))).toEqual(["rear.preloadMm"]);
  });

  it("refuses a figure the save endpoint's schema refuses (shock rate 1 to 400 N/mm)", () => {
    expect(Object.keys(issues({ ...empty, rearRate: "0.5" }))).toEqual(["rear.rateNmm"]);
    // 3000 lbf/in is about 525 N/mm (1 lbf/in = 4.4482216152605 N / 25.4 mm, NIST SP 811).
    expect(Object.keys(issues({ ...empty, rearRate: "3000", rearRateUnit: "lbf/in" }))).toEqual(["rear.rateNmm"]);
    expect(issues({ ...empty, rearRate: "300", rearRateUnit: "lbf/in" })).toEqual({});
  });

  it("flattens react-hook-form's nested errors back to paths", () => {
    const nested = {
      rear: { rateNmm: { type: "custom", message: "Too soft" } },
      clickers: { forkRebound: { type: "custom", message: "0 to 100" } },
    };
    expect(flatErrors(nested)).toEqual({ "rear.rateNmm": "Too soft", "clickers.forkRebound": "0 to 100" });
  });
});

describe("the bike's own ranges and the shop's words (no zod default reaches a person)", () => {
  const empty = valuesFrom({}, null, null);
  // The 450 four-stroke class: oil level 80–150 mm, clickers 0–22 (fork) and 0–3 turns (shock
  // high-speed), typical values of lib/sizing/bike-classes.ts.
  const input = demoSizingInput();
  const issues = (values: typeof empty) => {
    const parsed = editorSchema(false, input).safeParse(values);
    return parsed.success ? {} : Object.fromEntries(parsed.error.issues.map((i) => [i.path.join("."), i.message]));
  };
  const fork = input.bike.fork;

  it("refuses an oil level outside the fork's range, naming the range, at 200 mm and at 20 mm", () => {
    expect(fork.oilLevelMinMm).toBeLessThan(fork.oilLevelMaxMm);
    for (const oil of [200, 20])
      expect(issues({ ...empty, frontOilLevel: String(oil) })["front.oilLevelMm"]).toBe(
        `This fork takes an oil level of ${fork.oilLevelMinMm}–${fork.oilLevelMaxMm} mm (from the top, its catalog range; stock ${fork.stockOilLevelMm} mm). ${oil} mm is outside it: check the fork's service manual.`,
      );
    expect(issues({ ...empty, frontOilLevel: String(fork.oilLevelMinMm) })).toEqual({});
  });

  it("refuses clicker 30 of 22 instead of quietly making it 22, and half clicks", () => {
    const max = input.bike.clickers.forkCompression.max;
    expect(issues({ ...empty, clickers: { forkCompression: String(max + 8) } })["clickers.forkCompression"]).toBe(
      `Fork compression goes from 0 to ${max} clicks on this bike; ${max + 8} is outside it.`,
    );
    expect(issues({ ...empty, clickers: { forkCompression: "10.5" } })["clickers.forkCompression"]).toMatch(
      /whole clicks/,
    );
    expect(issues({ ...empty, clickers: { forkCompression: String(max) } })).toEqual({});
  });

  it("says every schema limit in words: no 'Too small', 'Too big' or 'expected'", () => {
    const all = Object.values({
      ...issues({ ...empty, rearRate: "0.5" }),
      ...issues({ ...empty, rearPreload: "-50" }),
      ...issues({ ...empty, frontRaceSag: "900" }),
      ...issues({ ...empty, clickers: { shockRebound: "-1" } }),
    });
    expect(all).toContain("At least 1 N/mm");
    expect(all).toContain("At most 400 mm");
    for (const message of all) expect(message).not.toMatch(/Too small|Too big|expected|Invalid input/);
  });

  it("says the setup targets' limits in percent of travel, as they are entered", () => {
    const base = {
      rearRace: 0.33,
      rearStaticMin: 0.08,
      rearStaticMax: 0.12,
      forkRace: 0.3,
      forkStaticMin: 0.06,
      forkStaticMax: 0.1,
    };
    const parsed = sagTargetFractionsSchema.safeParse({ ...base, rearRace: 0.7, forkStaticMin: 0.12 });
    expect(parsed.success).toBe(false);
    expect(Object.fromEntries(parsed.error!.issues.map((i) => [i.path.join("."), i.message]))).toEqual({
      rearRace: "At most 60 % of travel",
      forkStaticMax: "Must be at least the lowest static sag",
    });
  });
});

describe("overridesFrom", () => {
  const empty = valuesFrom({}, null, null);

  it("leaves every figure to the engine when nothing is typed", () => {
    expect(overridesFrom(empty, false)).toEqual({ overrides: {}, errors: {} });
  });

  it("converts typed rates to N/mm (1 kgf = 9.80665 N; 1 lbf = 4.4482216152605 N; 1 in = 25.4 mm — NIST SP 811)", () => {
    const { overrides } = overridesFrom(
      { ...empty, rearRate: "5.4", rearRateUnit: "kgf/mm", frontRate: "25", frontRateUnit: "lbf/in" },
      false,
    );
    expect(overrides.rear?.rateNmm).toBeCloseTo(5.4 * 9.80665, 10);
    expect(overrides.front?.rateNmm).toBeCloseTo((25 * 4.4482216152605) / 25.4, 10);
  });

  it("accepts a decimal comma, sends only the fork's own spring kind, and names a bad field", () => {
    const coil = overridesFrom({ ...empty, frontOilLevel: "120,5", frontAirKpa: "700" }, false);
    expect(coil.overrides).toEqual({ front: { oilLevelMm: 120.5 } });
    const air = overridesFrom({ ...empty, frontOilLevel: "120", frontAirKpa: "700" }, true);
    expect(air.overrides).toEqual({ front: { airPressureKpaGauge: 700 } });
    const bad = overridesFrom({ ...empty, rearPreload: "ten", clickers: { forkRebound: "x" } }, false);
    expect(Object.keys(bad.errors).sort()).toEqual(["clickers.forkRebound", "rear.preloadMm"]);
  });

  it("round-trips stored overrides into the form", () => {
    const stored = { rear: { rateNmm: 52, preloadMm: 8 }, clickers: { shockRebound: 11 } };
    expect(overridesFrom(valuesFrom(stored, "n", null), false).overrides).toEqual(stored);
  });
});

describe("diffOverrides", () => {
  it("lists each changed figure with old and new value, unchanged ones not at all", () => {
    const a = { rear: { rateNmm: 50, preloadMm: 8 }, clickers: { forkRebound: 10 } };
    const b = { rear: { rateNmm: 54, preloadMm: 8 }, front: { oilLevelMm: 130 } };
    expect(diffOverrides(a, b)).toEqual([
      { field: "clickers.forkRebound", from: 10, to: null },
      { field: "front.oilLevelMm", from: null, to: 130 },
      { field: "rear.rateNmm", from: 50, to: 54 },
    ]);
    expect(diffOverrides(b, b)).toEqual([]);
    expect(compactOverrides({ rear: {}, front: { oilLevelMm: undefined } })).toEqual({});
  });
});

describe("transitions", () => {
  it("allows approving an approved request only through a revision, never a declined one", () => {
    expect(canStart("approve", "in_review")).toBe(true);
    expect(canStart("approve", "declined")).toBe(false);
    expect(canStart("ask", "approved")).toBe(false);
    expect(canStart("decline", "declined")).toBe(false);
    expect(conflictMessage("decline", "declined")).toBe("This request is already declined.");
    expect(conflictMessage("ask", "approved")).toContain("Save a revision first");
  });
});
