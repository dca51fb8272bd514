// A rider's new setup request: the shop's active catalog for the bike picker, and the one
// transaction that stores the request, its photos, recommendation version 1 and its status link.
import { and, asc, eq, ilike, isNull, or, sql } from "drizzle-orm";
import { getDb, type Tx } from "@/db/client";
import { containsPattern } from "./like";
import { auditEvents, bikeModels, recommendationVersions, setupRequests, uploads } from "@/db/schema";
import { createStatusLink } from "./status-links";
import { specCalibrationFor } from "./calibrations";
import { shopDataCache, type ShopDataCache } from "./shop-data-cache";
import { bikeSpecSchema, type BikeSpecInput, type Recommendation, type SizingInput } from "@/lib/sizing";

/** The active catalog (retired models hidden), optionally filtered by a name or class fragment. */
export async function listActiveBikes(q?: string) {
  const db = await getDb();
  const conditions = [isNull(bikeModels.retiredAt)];
  if (q) {
    const pattern = containsPattern(q);
    conditions.push(or(ilike(bikeModels.name, pattern), ilike(bikeModels.bikeClass, pattern))!);
  }
  const rows = await db
    .select({
      id: bikeModels.id,
      name: bikeModels.name,
      bikeClass: bikeModels.bikeClass,
      isTypical: bikeModels.isTypical,
      rearWheelTravelMm: bikeModels.rearWheelTravelMm,
      spec: bikeModels.spec,
    })
    .from(bikeModels)
    .where(and(...conditions))
    .orderBy(asc(sql`lower(${bikeModels.name})`))
    .limit(50);
  return rows.map(({ spec, ...row }) => ({
    ...row,
    forkTravelMm: spec.fork.travelMm,
  }));
}

export interface CatalogBike {
  id: string;
  name: string;
  bikeClass: string;
  spec: BikeSpecInput;
}

/**
 * A model the rider picked, only if it is still in the active catalog, with the calibration the
 * admin applied to it (if any) in place of whatever the stored spec says. Served from the shop's
 * cached data (db/queries/shop-data-cache.ts) while the catalog is unchanged.
 */
export async function findActiveBike(id: string, cache?: ShopDataCache): Promise<CatalogBike | null> {
  return (cache ?? (await shopDataCache())).get(`active-bike:${id}`, () => readActiveBike(id));
}

async function readActiveBike(id: string): Promise<CatalogBike | null> {
  const db = await getDb();
  const [row] = await db
    .select({ id: bikeModels.id, name: bikeModels.name, bikeClass: bikeModels.bikeClass, spec: bikeModels.spec })
    .from(bikeModels)
    .where(and(eq(bikeModels.id, id), isNull(bikeModels.retiredAt)));
  if (!row) return null;
  return { ...row, spec: { ...bikeSpecSchema.parse(row.spec), calibration: await specCalibrationFor(row.id) } };
}

/**
 * For a bike the catalog does not list: the generic class (typical values) whose rear wheel travel
 * is nearest the rider's figure; any active model when the shop has retired every generic class.
 */
export async function findNearestGenericBike(rearWheelTravelMm: number): Promise<CatalogBike | null> {
  const db = await getDb();
  const distance = sql`abs(${bikeModels.rearWheelTravelMm} - ${rearWheelTravelMm})`;
  const [row] = await db
    .select({ id: bikeModels.id, name: bikeModels.name, bikeClass: bikeModels.bikeClass, spec: bikeModels.spec })
    .from(bikeModels)
    .where(isNull(bikeModels.retiredAt))
    .orderBy(sql`case when ${bikeModels.isTypical} then 0 else 1 end`, asc(distance), asc(bikeModels.slug))
    .limit(1);
  // Not this model's bike: its calibration (fitted to that model's own reports) does not apply.
  return row ? { ...row, spec: { ...bikeSpecSchema.parse(row.spec), calibration: undefined } } : null;
}

export interface NewSetupRequest {
  request: Omit<typeof setupRequests.$inferInsert, "id" | "number" | "status">;
  uploads: Omit<typeof uploads.$inferInsert, "id" | "requestId">[];
  input: SizingInput;
  output: Recommendation;
  statusToken: string;
}

/**
 * Stores everything in one transaction; nothing is written when any part fails. `also` runs in the
 * same transaction after the inserts (the service queues the rider's confirmation e-mail there).
 */
export async function insertSetupRequest(
  data: NewSetupRequest,
  also?: (tx: Tx, row: { id: string; number: number }) => Promise<unknown>,
): Promise<{ id: string; number: number }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(setupRequests)
      .values({ ...data.request, status: "submitted" })
      .returning({ id: setupRequests.id, number: setupRequests.number });
    if (!row) throw new Error("insert returned no row");
    if (data.uploads.length) {
      await tx.insert(uploads).values(data.uploads.map((u) => ({ ...u, requestId: row.id })));
    }
    await tx.insert(recommendationVersions).values({
      requestId: row.id,
      version: 1,
      state: "draft",
      engineVersion: data.output.engineVersion,
      input: data.input,
      output: data.output,
    });
    await createStatusLink(row.id, tx, data.statusToken);
    await tx.insert(auditEvents).values({
      requestId: row.id,
      actorLabel: "rider",
      action: "request.submitted",
      detail: {
        photos: data.uploads.length,
        engineVersion: data.output.engineVersion,
        bikeLabel: data.request.bikeLabel,
      },
    });
    if (also) await also(tx, row);
    return row;
  });
}
