// Spring stock, setup targets with clicker rules and preview, and shop settings: valid saves, invalid
// input refused with the field named and nothing changed, tuners refused on admin-only actions.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST as addSpring } from "@/app/api/shop/stock/route";
import { DELETE as deleteSpring, PUT as putSpring } from "@/app/api/shop/stock/[id]/route";
import { PUT as putTarget } from "@/app/api/shop/targets/route";
import { POST as resetTarget } from "@/app/api/shop/targets/reset/route";
import { DELETE as resetRules, PUT as putRules } from "@/app/api/shop/targets/rules/route";
import { POST as preview } from "@/app/api/shop/targets/preview/route";
import { PUT as putSettings } from "@/app/api/shop/settings/route";
import { getShopSettings } from "@/db/queries/settings";
import { listSpringStock } from "@/db/queries/stock";
import { getSetupTarget, listClickerRules } from "@/db/queries/targets";
import { seedDemo, stableUuid } from "@/db/seed-demo";
import { defaultTargetValues } from "@/lib/shop/targets";
import { sizingDefaults } from "@/lib/sizing";
import { closeTestDatabase, createTestDatabase } from "../helpers/db";
import { idContext, jsonRequest, staffCookie, noCtx } from "./admin-helpers";

let owner: string;
let tuner: string;

beforeAll(async () => {
  await createTestDatabase();
  await seedDemo();
  owner = await staffCookie("owner@sagwise.test");
  tuner = await staffCookie("tuner@sagwise.test");
});
afterAll(closeTestDatabase);

const fields = async (r: Response) => Object.keys(((await r.json()) as { fields: object }).fields).sort();

describe("spring stock", () => {
  it("stores a rate entered in lbf/in in N/mm", async () => {
    const response = await noCtx(addSpring)(
      jsonRequest("/api/shop/stock", "POST", tuner, {
        end: "shock",
        rate: 300,
        rateUnit: "lbf/in",
        quantity: 2,
        freeLengthMm: 260,
        innerDiameterMm: 61,
      }),
    );
    expect(response.status).toBe(201);
    const row = (await response.json()) as { id: string; rateNmm: number };
    // NIST SP 811 B.8: 1 lbf = 4.4482216152605 N, 1 in = 25.4 mm → 300 lbf/in = 52.5380 N/mm.
    expect(row.rateNmm).toBeCloseTo(52.538, 3);
  });

  it("stores a rate entered in kgf/mm in N/mm and edits it", async () => {
    const id = stableUuid("fork-spring:0");
    const response = await putSpring(
      jsonRequest(`/api/shop/stock/${id}`, "PUT", tuner, { end: "fork", rate: 0.46, rateUnit: "kgf/mm", quantity: 4 }),
      idContext(id),
    );
    expect(response.status).toBe(200);
    // 1 kgf = 9.80665 N exactly (CGPM 1901; NIST SP 811 B.8): 0.46 kgf/mm = 4.511059 N/mm.
    expect(((await response.json()) as { rateNmm: number }).rateNmm).toBeCloseTo(4.511059, 6);
  });

  it.each([
    ["a negative quantity", { end: "fork", rate: 0.5, rateUnit: "kgf/mm", quantity: -1 }, ["quantity"]],
    ["an unknown unit and end", { end: "hub", rate: 5, rateUnit: "lb", quantity: 1 }, ["end", "rateUnit"]],
    ["a fork spring of 60 N/mm", { end: "fork", rate: 60, rateUnit: "N/mm", quantity: 1 }, ["rate"]],
    [
      "a zero inner diameter",
      { end: "shock", rate: 50, rateUnit: "N/mm", quantity: 1, innerDiameterMm: 0 },
      ["innerDiameterMm"],
    ],
  ])("refuses %s, naming the field, nothing changed", async (_w, payload, names) => {
    const before = JSON.stringify(await listSpringStock());
    const response = await noCtx(addSpring)(jsonRequest("/api/shop/stock", "POST", tuner, payload));
    expect(response.status).toBe(400);
    expect(await fields(response)).toEqual(names);
    expect(JSON.stringify(await listSpringStock())).toBe(before);
  });

  it("deletes a line", async () => {
    const id = stableUuid("shock-spring:0");
    expect((await deleteSpring(jsonRequest(`/api/shop/stock/${id}`, "DELETE", tuner), idContext(id))).status).toBe(204);
    expect((await listSpringStock()).map((s) => s.id)).not.toContain(id);
  });
});

describe("setup targets", () => {
  const edited = () => {
    const v = defaultTargetValues("motocross", "intermediate");
    return { ...v, sag: { ...v.sag, rearRace: 0.31 }, rateFactor: 1.05 };
  };

  it("a tuner is refused (403) and the row is unchanged", async () => {
    const before = await getSetupTarget("motocross", "intermediate");
    const response = await noCtx(putTarget)(
      jsonRequest("/api/shop/targets", "PUT", tuner, {
        discipline: "motocross",
        skill: "intermediate",
        values: edited(),
      }),
    );
    expect(response.status).toBe(403);
    expect(await getSetupTarget("motocross", "intermediate")).toEqual(before);
    expect((await noCtx(putRules)(jsonRequest("/api/shop/targets/rules", "PUT", tuner, { rules: [] }))).status).toBe(
      403,
    );
  });

  it("an admin saves a row, and reset puts back the engine's defaults", async () => {
    const response = await noCtx(putTarget)(
      jsonRequest("/api/shop/targets", "PUT", owner, {
        discipline: "motocross",
        skill: "intermediate",
        values: edited(),
      }),
    );
    expect(response.status).toBe(200);
    expect(await getSetupTarget("motocross", "intermediate")).toEqual(edited());
    const reset = await noCtx(resetTarget)(
      jsonRequest("/api/shop/targets/reset", "POST", owner, { discipline: "motocross", skill: "intermediate" }),
    );
    expect(reset.status).toBe(200);
    // Engine defaults (lib/sizing/defaults.ts): motocross rear race sag 0.335, intermediate offset 0.
    expect((await getSetupTarget("motocross", "intermediate"))?.sag.rearRace).toBe(0.335);
  });

  it.each([
    [
      "race sag inside the static window",
      (v: ReturnType<typeof edited>) => ({ ...v, sag: { ...v.sag, rearRace: 0.12 } }),
      ["values.sag.rearRace"],
    ],
    ["a rate factor of 2", (v: ReturnType<typeof edited>) => ({ ...v, rateFactor: 2 }), ["values.rateFactor"]],
    [
      "a rear share of 1.2",
      (v: ReturnType<typeof edited>) => ({ ...v, riderRearShare: 1.2 }),
      ["values.riderRearShare"],
    ],
  ])("refuses %s, naming the field, nothing changed", async (_w, change, names) => {
    const before = await getSetupTarget("enduro", "pro");
    const response = await noCtx(putTarget)(
      jsonRequest("/api/shop/targets", "PUT", owner, { discipline: "enduro", skill: "pro", values: change(edited()) }),
    );
    expect(response.status).toBe(400);
    expect(await fields(response)).toEqual(names);
    expect(await getSetupTarget("enduro", "pro")).toEqual(before);
  });

  it("preview: on the sag-window basis, less rear race sag asks for a stiffer rear spring for the same rider", async () => {
    const row = { ...defaultTargetValues("motocross", "intermediate"), rateBasis: "sag-window" as const };
    const previewWith = async (rearRace: number) => {
      const response = await noCtx(preview)(
        jsonRequest("/api/shop/targets/preview", "POST", owner, {
          discipline: "motocross",
          skill: "intermediate",
          values: { ...row, sag: { ...row.sag, rearRace } },
          bikeModelId: stableUuid("bike:mx-450-4t"),
          riderMassKg: 80,
        }),
      );
      expect(response.status).toBe(200);
      return ((await response.json()) as { after: { rearRateNmm: number; rearRaceSagMm: number } }).after;
    };
    const deeper = await previewWith(row.sag.rearRace);
    const shallower = await previewWith(0.3);
    // Hooke's law (F = k·x): the same load over less sag needs a higher rate (common practice).
    expect(shallower.rearRateNmm).toBeGreaterThan(deeper.rearRateNmm);
    expect(shallower.rearRaceSagMm).toBeLessThan(deeper.rearRaceSagMm);
  });
});

describe("clicker rules", () => {
  it("replaces the table, refuses a bad rule naming it, and resets to the engine's defaults", async () => {
    const rule = {
      trigger: { kind: "terrain", terrain: "mud" },
      clicker: "forkRebound",
      change: 1,
      reason: "Mud: quicken fork rebound 1 click",
    };
    expect(
      (await noCtx(putRules)(jsonRequest("/api/shop/targets/rules", "PUT", owner, { rules: [rule] }))).status,
    ).toBe(200);
    expect(await listClickerRules()).toEqual([rule]);
    const bad = await noCtx(putRules)(
      jsonRequest("/api/shop/targets/rules", "PUT", owner, {
        rules: [rule, { ...rule, clicker: "rearHub", change: 40 }],
      }),
    );
    expect(bad.status).toBe(400);
    expect(await fields(bad)).toEqual(["rules.1.change", "rules.1.clicker"]);
    expect(await listClickerRules()).toEqual([rule]);
    expect((await noCtx(resetRules)(jsonRequest("/api/shop/targets/rules", "DELETE", owner))).status).toBe(200);
    expect(await listClickerRules()).toEqual(sizingDefaults.DEFAULT_CLICKER_RULES);
  });
});

describe("shop settings", () => {
  const valid = {
    name: "Ridge Line Suspension",
    email: "Desk@RidgeLine.test",
    phone: "+1 555 0100",
    address: "1 Test Lane",
    website: "",
    units: "imperial",
    paperSize: "LETTER",
    sheetFooter: "Ride safe.",
    gearMassKg: 9,
    frequencyRatioMin: 0.85,
    frequencyRatioMax: 1.6,
  };

  it("a tuner is refused (403)", async () => {
    expect((await noCtx(putSettings)(jsonRequest("/api/shop/settings", "PUT", tuner, valid))).status).toBe(403);
  });

  it("an admin saves; e-mail is stored lower-case and an empty website as none", async () => {
    const response = await noCtx(putSettings)(jsonRequest("/api/shop/settings", "PUT", owner, valid));
    expect(response.status).toBe(200);
    expect(await getShopSettings()).toMatchObject({
      name: "Ridge Line Suspension",
      email: "desk@ridgeline.test",
      website: null,
      paperSize: "LETTER",
      units: "imperial",
      gearMassKg: 9,
    });
  });

  it("refuses a bad paper size, e-mail and frequency window, naming each, nothing changed", async () => {
    const before = await getShopSettings();
    const response = await noCtx(putSettings)(
      jsonRequest("/api/shop/settings", "PUT", owner, { ...valid, email: "desk", paperSize: "A5", gearMassKg: -1 }),
    );
    expect(response.status).toBe(400);
    expect(await fields(response)).toEqual(["email", "gearMassKg", "paperSize"]);
    const window = await noCtx(putSettings)(
      jsonRequest("/api/shop/settings", "PUT", owner, { ...valid, frequencyRatioMax: 0.5 }),
    );
    expect(await fields(window)).toEqual(["frequencyRatioMax"]);
    expect(await getShopSettings()).toEqual(before);
  });
});
