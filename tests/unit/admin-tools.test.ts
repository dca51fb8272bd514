// Workshop tools and catalog CSV parsing: pure parts, checked against published formulas and unit
// definitions (sources beside each check).
import { describe, expect, it } from "vitest";
import { coilReport, loadTestRate } from "@/components/tools/spring-math";
import { activeCoils, coilGeometrySchema, loadTestSchema } from "@/lib/validations/tools";
import { springStockSchema } from "@/lib/validations/stock";
import { parseCatalogCsv, catalogToCsv } from "@/lib/validations/bike-csv";
import { sizingDefaults } from "@/lib/sizing";

describe("active coils by end type (Shigley, Mechanical Engineering Design, table 10-1)", () => {
  it.each([
    ["squared-ground", 12, 10],
    ["squared", 12, 10],
    ["plain", 12, 12],
    ["plain-ground", 12, 11],
  ] as const)("%s with 12 total coils has %d active", (end, total, active) => {
    expect(activeCoils(total, end)).toBe(active);
  });
});

describe("spring check from wire and coils", () => {
  it("rate, index, Wahl factor and stress for d = 5 mm, OD = 45 mm, 12 coils squared and ground", () => {
    const r = coilReport({
      wireDiameterMm: 5,
      outerDiameterMm: 45,
      totalCoils: 12,
      endType: "squared-ground",
      shearModulusMpa: 79_300,
      loadN: 300,
    });
    // D = OD − d = 40 mm; C = 8; n_a = 10 (table 10-1).
    expect(r.meanDiameterMm).toBe(40);
    expect(r.springIndex).toBe(8);
    // Shigley eq. 10-9 by hand: k = 79300·5⁴ / (8·40³·10) = 49 562 500 / 5 120 000 = 9.68018 N/mm.
    expect(r.rate.nMm).toBeCloseTo(9.68018, 4);
    // Shigley eq. 10-4 by hand: K_W = 31/28 + 0.615/8 = 1.107143 + 0.076875 = 1.184018.
    expect(r.wahlFactor).toBeCloseTo(1.184018, 5);
    // Shigley eqs. 10-1/10-4 by hand: τ = 1.184018·8·300·40 / (π·125) = 113 665.7 / 392.699 = 289.45 MPa.
    expect(r.shearStressMpa).toBeCloseTo(289.45, 1);
    // Against chrome-silicon wire (the default): S_ut = 1974/5^0.108 = 1659.0 MPa, 50 % allowed (Shigley
    // 10th ed. tables 10-4 and 10-6, from memory): 829.5 MPa, margin 829.5/289.45 − 1 = 1.866.
    expect(r.verdict).toMatchObject({ pass: true, steel: "chrome-silicon" });
    expect(r.verdict!.allowableShearMpa).toBeCloseTo(829.5, 0);
    expect(r.verdict!.margin).toBeCloseTo(829.5 / 289.45 - 1, 2);
  });

  it("fails the same spring at 900 N (τ = 868.4 MPa, over 829.5), and gives no verdict without a load", () => {
    const geometry = { wireDiameterMm: 5, outerDiameterMm: 45, totalCoils: 12, shearModulusMpa: 79_300 } as const;
    const over = coilReport({ ...geometry, endType: "squared-ground", loadN: 900 });
    // τ scales with the load: 289.45 · 3 = 868.4 MPa.
    expect(over.shearStressMpa).toBeCloseTo(868.4, 0);
    expect(over.verdict!.pass).toBe(false);
    expect(over.verdict!.margin).toBeLessThan(0);
    expect(coilReport({ ...geometry, endType: "squared-ground", loadN: 0 }).verdict).toBeNull();
  });

  it("refuses an outer diameter not above twice the wire, and too few coils, naming the field", () => {
    const bad = coilGeometrySchema.safeParse({
      wireDiameterMm: 10,
      outerDiameterMm: 19,
      totalCoils: 2,
      endType: "squared",
      shearModulusMpa: 79_300,
      loadN: 0,
    });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues.map((i) => i.path.join(".")).sort()).toEqual(["outerDiameterMm", "totalCoils"]);
  });
});

describe("two-point load test", () => {
  it("100 kgf at 250 mm and 150 kgf at 240 mm is 5 kgf/mm = 49.03325 N/mm (1 kgf = 9.80665 N, NIST SP 811 B.8)", () => {
    const r = loadTestRate({ length1Mm: 250, force1: 100, length2Mm: 240, force2: 150, forceUnit: "kgf" });
    expect(r.nMm).toBeCloseTo(49.03325, 5);
    expect(r.kgfMm).toBeCloseTo(5, 10);
  });

  it("refuses force falling as the spring shortens, naming force2", () => {
    const bad = loadTestSchema.safeParse({ length1Mm: 250, force1: 150, length2Mm: 240, force2: 100, forceUnit: "N" });
    expect(bad.error!.issues.map((i) => i.path.join("."))).toEqual(["force2"]);
  });
});

describe("spring stock rate units", () => {
  it("5.4 kgf/mm is stored as 52.95591 N/mm (1 kgf = 9.80665 N exactly, NIST SP 811 B.8)", () => {
    const s = springStockSchema.parse({ end: "shock", rate: 5.4, rateUnit: "kgf/mm", quantity: 1 });
    expect(s.rateNmm).toBeCloseTo(52.95591, 5);
  });
});

describe("catalog CSV", () => {
  const models = sizingDefaults.GENERIC_BIKE_CLASSES.map((b) => ({
    slug: b.id,
    name: b.name,
    bikeClass: b.id,
    yearFrom: null,
    yearTo: null,
    notes: 'Notes with a comma, a "quote"\nand a new line',
    retiredAt: b.id === "mx-125-2t" ? new Date() : null,
    spec: b.spec,
  }));

  it("parses its own output back to the same models", () => {
    const { results, fileError } = parseCatalogCsv(catalogToCsv(models));
    expect(fileError).toBeUndefined();
    expect(results.every((r) => r.ok)).toBe(true);
    for (const [i, r] of results.entries()) {
      if (!r.ok) continue;
      expect(r.values.slug).toBe(models[i]!.slug);
      expect(r.values.notes).toBe(models[i]!.notes);
      expect(r.retired).toBe(models[i]!.retiredAt !== null);
      expect(r.values.spec.rear.leverageCurve).toEqual(models[i]!.spec.rear.leverageCurve);
    }
  });

  it("reports a duplicated slug in one file on the later row", () => {
    const csv = catalogToCsv([models[0]!, models[0]!]);
    const { results } = parseCatalogCsv(csv);
    expect(results.map((r) => r.ok)).toEqual([true, false]);
    expect(results[1]).toMatchObject({ row: 3, fields: { slug: "Same slug as row 2" } });
  });
});
