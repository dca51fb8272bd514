// The bike catalog. The spec column is always written through bikeModelSchema (engine bikeSpecSchema);
// bikeClass/forkKind/rearWheelTravelMm/name/slug are copied from it so lists and filters agree.
import { and, asc, eq, ilike, isNotNull, isNull, ne, or, type SQL } from "drizzle-orm";
import { getDb } from "@/db/client";
import { containsPattern } from "./like";
import { bikeModels } from "@/db/schema";
import type { BikeModelValues } from "@/lib/validations/bike";

export type BikeModelRow = typeof bikeModels.$inferSelect;

function columnsOf(v: BikeModelValues) {
  return {
    slug: v.slug,
    name: v.name,
    bikeClass: v.bikeClass,
    yearFrom: v.yearFrom ?? null,
    yearTo: v.yearTo ?? null,
    notes: v.notes ?? null,
    forkOilType: v.forkOilType || null,
    forkOilVolumeMl: v.forkOilVolumeMl ?? null,
    forkKind: v.spec.fork.kind,
    rearWheelTravelMm: v.spec.rear.wheelTravelMm,
    spec: v.spec,
  };
}

export async function listBikeModels(query: { q?: string; retired?: "hide" | "show" | "only" } = {}) {
  const db = await getDb();
  const where: SQL[] = [];
  if (query.retired === "hide" || query.retired === undefined) where.push(isNull(bikeModels.retiredAt));
  if (query.retired === "only") where.push(isNotNull(bikeModels.retiredAt));
  if (query.q) {
    const like = containsPattern(query.q);
    where.push(or(ilike(bikeModels.name, like), ilike(bikeModels.bikeClass, like), ilike(bikeModels.slug, like))!);
  }
  return db
    .select()
    .from(bikeModels)
    .where(where.length ? and(...where) : undefined)
    .orderBy(asc(bikeModels.name));
}

/** Every model, retired ones too, for the CSV export. */
export async function listAllBikeModels() {
  const db = await getDb();
  return db.select().from(bikeModels).orderBy(asc(bikeModels.slug));
}

export async function getBikeModel(id: string): Promise<BikeModelRow | null> {
  const db = await getDb();
  const [row] = await db.select().from(bikeModels).where(eq(bikeModels.id, id));
  return row ?? null;
}

/** True when another model already uses the slug. */
export async function slugTaken(slug: string, exceptId?: string): Promise<boolean> {
  const db = await getDb();
  const [row] = await db
    .select({ id: bikeModels.id })
    .from(bikeModels)
    .where(exceptId ? and(eq(bikeModels.slug, slug), ne(bikeModels.id, exceptId)) : eq(bikeModels.slug, slug));
  return Boolean(row);
}

export async function createBikeModel(values: BikeModelValues): Promise<BikeModelRow> {
  const db = await getDb();
  const [row] = await db.insert(bikeModels).values(columnsOf(values)).returning();
  return row!;
}

export async function updateBikeModel(id: string, values: BikeModelValues): Promise<BikeModelRow | null> {
  const db = await getDb();
  const [row] = await db
    .update(bikeModels)
    .set({ ...columnsOf(values), isTypical: false, updatedAt: new Date() })
    .where(eq(bikeModels.id, id))
    .returning();
  return row ?? null;
}

/** Creates or replaces the model with this slug (CSV import); returns whether it was new. */
export async function upsertBikeModelBySlug(values: BikeModelValues, retired: boolean): Promise<"created" | "updated"> {
  const db = await getDb();
  const [existing] = await db
    .select({ id: bikeModels.id, retiredAt: bikeModels.retiredAt })
    .from(bikeModels)
    .where(eq(bikeModels.slug, values.slug));
  const retiredAt = retired ? (existing?.retiredAt ?? new Date()) : null;
  if (existing) {
    await db
      .update(bikeModels)
      .set({ ...columnsOf(values), retiredAt, updatedAt: new Date() })
      .where(eq(bikeModels.id, existing.id));
    return "updated";
  }
  await db.insert(bikeModels).values({ ...columnsOf(values), retiredAt });
  return "created";
}

/** Retire (leaves the rider's picker, stays readable on old requests) or bring back. */
export async function setBikeModelRetired(id: string, retired: boolean): Promise<BikeModelRow | null> {
  const db = await getDb();
  const [row] = await db
    .update(bikeModels)
    .set({ retiredAt: retired ? new Date() : null, updatedAt: new Date() })
    .where(eq(bikeModels.id, id))
    .returning();
  return row ?? null;
}
