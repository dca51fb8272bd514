// The per-process copy of the shop-wide tables (db/queries/shop-data-cache.ts): it serves repeated
// reads without going back to the tables, and any write to them, from this code or from outside it
// (plain SQL, as another instance or psql would), shows on the next read. The token's behaviour is
// PostgreSQL's own: a FOR EACH STATEMENT trigger runs inside the writer's transaction, so a rolled-
// back write leaves the token as it was (PostgreSQL 16 manual, CREATE TRIGGER and "Overview of
// Trigger Behavior").
import { eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { findActiveBike } from "@/db/queries/intake";
import { shopDataCache } from "@/db/queries/shop-data-cache";
import { loadShopSizingContext } from "@/db/queries/sizing-context";
import { bikeModels, shopDataEpoch, springStock } from "@/db/schema";
import { stableUuid } from "@/db/seed-demo";
import { setupTestApp } from "../helpers/app";

setupTestApp({ seed: true, tempDataDir: true });

const model450 = stableUuid("bike:mx-450-4t");

async function epoch(): Promise<string> {
  const db = await getDb();
  const [row] = await db.select({ epoch: shopDataEpoch.epoch }).from(shopDataEpoch);
  return row!.epoch;
}

describe("shop data cache", () => {
  it("gets a new token from every write to a shop-wide table, and none from a rolled-back one", async () => {
    const db = await getDb();
    const before = await epoch();
    await db.update(bikeModels).set({ name: "Renamed class" }).where(eq(bikeModels.id, model450));
    const afterUpdate = await epoch();
    expect(afterUpdate).not.toBe(before);

    await db
      .transaction(async (tx) => {
        await tx.insert(springStock).values({ end: "shock", rateNmm: 77.7, quantity: 1 });
        throw new Error("roll back");
      })
      .catch(() => undefined);
    expect(await epoch()).toBe(afterUpdate);

    await db.execute(sql`update shop_settings set gear_mass_kg = gear_mass_kg + 1`);
    expect(await epoch()).not.toBe(afterUpdate);
  });

  it("serves a repeated read from its copy until the token changes", async () => {
    const db = await getDb();
    const first = await findActiveBike(model450);
    expect(first).not.toBeNull();
    // A change the token does not see (triggers switched off) stays invisible: the copy is served.
    await db.execute(sql`alter table bike_models disable trigger bike_models_epoch`);
    await db.execute(sql`update bike_models set name = 'Unseen rename' where id = ${model450}`);
    await db.execute(sql`alter table bike_models enable trigger bike_models_epoch`);
    expect((await findActiveBike(model450))!.name).toBe(first!.name);
    // Any write that the token sees (here by plain SQL, as another instance would) shows at once.
    await db.execute(sql`update bike_models set name = 'Seen rename' where id = ${model450}`);
    expect((await findActiveBike(model450))!.name).toBe("Seen rename");
  });

  it("shows a retired bike as gone and new stock in the next sizing context", async () => {
    const db = await getDb();
    const spec = (await findActiveBike(model450))!.spec;
    const before = await loadShopSizingContext(spec, "motocross", "intermediate");
    expect(before.stock.shockRatesNmm).not.toContain(61.5);
    await db.insert(springStock).values({ end: "shock", rateNmm: 61.5, quantity: 2 });
    const after = await loadShopSizingContext(spec, "motocross", "intermediate");
    expect(after.stock.shockRatesNmm).toContain(61.5);

    await db.update(bikeModels).set({ retiredAt: new Date() }).where(eq(bikeModels.id, model450));
    expect(await findActiveBike(model450)).toBeNull();
  });

  it("hands every caller its own copy", async () => {
    const cache = await shopDataCache();
    const a = await cache.get("test:list", async () => ({ rates: [1, 2, 3] }));
    a.rates.push(4);
    const b = await cache.get("test:list", async () => ({ rates: [9] }));
    expect(b.rates).toEqual([1, 2, 3]);
  });

  it("does not keep a failed read", async () => {
    const cache = await shopDataCache();
    await expect(cache.get("test:fails", () => Promise.reject(new Error("read failed")))).rejects.toThrow();
    expect(await cache.get("test:fails", async () => "read again")).toBe("read again");
  });
});
