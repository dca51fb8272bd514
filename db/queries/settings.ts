import { eq } from "drizzle-orm";
import { getDb, type Executor } from "@/db/client";
import { shopSettings } from "@/db/schema";

export async function getShopSettings(executor?: Executor) {
  const db = executor ?? (await getDb());
  const rows = await db.select().from(shopSettings).where(eq(shopSettings.id, 1)).limit(1);
  return rows[0] ?? null;
}

/** Stands for the shop's name before the shop has set one. */
export const FALLBACK_SHOP_NAME = "Your suspension shop";

/** The shop's name for e-mails and pages; a neutral word before the shop has set one. */
export async function getShopName(executor?: Executor): Promise<string> {
  return (await getShopSettings(executor))?.name ?? FALLBACK_SHOP_NAME;
}

export type ShopSettingsValues = Omit<typeof shopSettings.$inferInsert, "id" | "updatedAt">;

/** Creates or replaces the single settings row. */
export async function saveShopSettings(values: ShopSettingsValues) {
  const db = await getDb();
  const [row] = await db
    .insert(shopSettings)
    .values({ ...values, id: 1 })
    .onConflictDoUpdate({ target: shopSettings.id, set: { ...values, updatedAt: new Date() } })
    .returning();
  return row!;
}
