import { describe, expect, it } from "vitest";
import { ENGINE_VERSION, recommendationSchema } from "@/lib/sizing";
import { renderSetupSheet } from "@/lib/pdf";
import { demoSheetData } from "@/lib/pdf/demo-data";
import { rateParts } from "@/lib/pdf/format";
import { pdfText } from "../helpers/pdf";
import stored from "../fixtures/recommendation-engine-1.json";

// A recommendation as engine 1.0.0 stored it (made by that engine for the 450 class, medium rider):
// approved sheets keep the version that made them, so it must still parse and render.
describe("recommendations stored by an earlier engine", () => {
  it("parse with today's schema and keep their version", () => {
    const rec = recommendationSchema.parse(stored);
    expect(rec.engineVersion).toBe("sagwise-sizing/1.0.0");
    expect(rec.engineVersion).not.toBe(ENGINE_VERSION);
    expect(rec.rear.rateBasis).toBeUndefined();
  });

  it("render a setup sheet with their own figures", async () => {
    const rec = recommendationSchema.parse(stored);
    const text = pdfText(await renderSetupSheet({ ...demoSheetData(), recommendation: rec }));
    expect(text).toContain(rateParts(rec.rear.chosenRate.nMm, "shock").nMm);
    expect(text).toContain(rateParts(rec.front.chosenRate!.nMm, "fork").kgfMm);
    expect(text).not.toContain("Rate chosen to");
  });
});
