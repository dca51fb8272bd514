// Everything of the shop's the engine needs besides the rider: targets for the discipline and
// skill, springs on the shelf, clicker rules and settings. Used on submit, on every tuner
// recompute and in the targets preview.
import { and, asc, eq, gt } from "drizzle-orm";
import { getDb } from "@/db/client";
import { bikeModels, clickerRules, setupTargets, shopSettings, springStock } from "@/db/schema";
import { specCalibrationFor } from "./calibrations";
import { shopDataCache, type ShopDataCache } from "./shop-data-cache";
import type { ShopSizingContext } from "@/lib/requests/sizing-input";
import {
  bikeSpecSchema,
  clickerRuleSchema,
  sizingDefaults,
  type BikeSpecInput,
  type ClickerRule,
  type Discipline,
  type SkillLevel,
} from "@/lib/sizing";

export async function loadBikeSpec(
  bikeModelId: string,
): Promise<{ name: string; bikeClass: string; spec: BikeSpecInput } | null> {
  const db = await getDb();
  const [row] = await db
    .select({ name: bikeModels.name, bikeClass: bikeModels.bikeClass, spec: bikeModels.spec })
    .from(bikeModels)
    .where(eq(bikeModels.id, bikeModelId));
  if (!row) return null;
  // The admin's applied calibration, not whatever the stored spec says, sets the loads.
  return {
    name: row.name,
    bikeClass: row.bikeClass,
    spec: { ...bikeSpecSchema.parse(row.spec), calibration: await specCalibrationFor(bikeModelId) },
  };
}

/**
 * The shop's side of a sizing for this bike, discipline and skill. Served from the shop's cached
 * data (db/queries/shop-data-cache.ts) while targets, stock, rules and settings are unchanged.
 */
export async function loadShopSizingContext(
  bike: BikeSpecInput,
  discipline: Discipline,
  skill: SkillLevel,
  cache?: ShopDataCache,
): Promise<ShopSizingContext> {
  const shop = await (cache ?? (await shopDataCache())).get(`sizing:${discipline}:${skill}`, () =>
    readShopSide(discipline, skill),
  );
  return { bike, ...shop };
}

async function readShopSide(discipline: Discipline, skill: SkillLevel): Promise<Omit<ShopSizingContext, "bike">> {
  const db = await getDb();
  const [targetRows, stock, rules, settings] = await Promise.all([
    db
      .select({ values: setupTargets.values })
      .from(setupTargets)
      .where(and(eq(setupTargets.discipline, discipline), eq(setupTargets.skill, skill))),
    db
      .select({ end: springStock.end, rateNmm: springStock.rateNmm })
      .from(springStock)
      .where(gt(springStock.quantity, 0))
      .orderBy(asc(springStock.rateNmm)),
    db.select({ rule: clickerRules.rule }).from(clickerRules).orderBy(asc(clickerRules.sortOrder)),
    db.select().from(shopSettings).where(eq(shopSettings.id, 1)),
  ]);
  const shop = settings[0];
  return {
    targets: targetRows[0]?.values ?? null,
    stock: {
      forkRatesNmm: stock.filter((s) => s.end === "fork").map((s) => s.rateNmm),
      shockRatesNmm: stock.filter((s) => s.end === "shock").map((s) => s.rateNmm),
    },
    // A shop with no rules saved starts from the engine's default rules.
    clickerRules: rules.length ? rules.map((r) => clickerRuleSchema.parse(r.rule) as ClickerRule) : undefined,
    gearMassKg: shop?.gearMassKg ?? sizingDefaults.DEFAULT_GEAR_MASS_KG,
    frequencyRatioWindow: shop
      ? { min: shop.frequencyRatioMin, max: shop.frequencyRatioMax }
      : { ...sizingDefaults.FREQUENCY_RATIO_WINDOW },
  };
}
