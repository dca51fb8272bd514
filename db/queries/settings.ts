import { eq } from "drizzle-orm";
import { getDb, type Executor } from "@/db/client";
import { prepared } from "@/db/prepared";
import { shopSettings } from "@/db/schema";

const settingsQuery = (db: Executor) => db.select().from(shopSettings).where(eq(shopSettings.id, 1)).limit(1);
// Read by the landing page and the request form on every view.
const settingsRow = prepared("shop_settings", (db, name) => settingsQuery(db).prepare(name));

/** The single settings row (in the caller's transaction when given). */
export async function getShopSettings(executor?: Executor) {
  const rows = executor ? await settingsQuery(executor) : await settingsRow(await getDb()).execute();
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
