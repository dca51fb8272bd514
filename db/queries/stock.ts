// Springs on the shop's shelf; rates in N/mm. The engine picks from those with quantity > 0.
import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { springStock } from "@/db/schema";

export type SpringStockRow = typeof springStock.$inferSelect;
export interface SpringStockValues {
  end: "fork" | "shock";
  rateNmm: number;
  quantity: number;
  freeLengthMm?: number | null;
  innerDiameterMm?: number | null;
  fitNotes?: string | null;
}

const columnsOf = (v: SpringStockValues) => ({
  end: v.end,
  rateNmm: v.rateNmm,
  quantity: v.quantity,
  freeLengthMm: v.freeLengthMm ?? null,
  innerDiameterMm: v.innerDiameterMm ?? null,
  fitNotes: v.fitNotes ?? null,
});

export async function listSpringStock(): Promise<SpringStockRow[]> {
  const db = await getDb();
  return db.select().from(springStock).orderBy(asc(springStock.end), asc(springStock.rateNmm));
}

export async function createSpringStock(values: SpringStockValues): Promise<SpringStockRow> {
  const db = await getDb();
  const [row] = await db.insert(springStock).values(columnsOf(values)).returning();
  return row!;
}

export async function updateSpringStock(id: string, values: SpringStockValues): Promise<SpringStockRow | null> {
  const db = await getDb();
  const [row] = await db
    .update(springStock)
    .set({ ...columnsOf(values), updatedAt: new Date() })
    .where(eq(springStock.id, id))
    .returning();
  return row ?? null;
}

export async function deleteSpringStock(id: string): Promise<boolean> {
  const db = await getDb();
  const rows = await db.delete(springStock).where(eq(springStock.id, id)).returning({ id: springStock.id });
  return rows.length > 0;
}
