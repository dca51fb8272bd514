import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { shopSettings } from "@/db/schema";

export async function getShopSettings() {
  const db = await getDb();
  const rows = await db.select().from(shopSettings).where(eq(shopSettings.id, 1)).limit(1);
  return rows[0] ?? null;
}

/** The shop's name for e-mails and pages; a neutral word before the shop has set one. */
export async function getShopName(): Promise<string> {
  return (await getShopSettings())?.name ?? "Your suspension shop";
}
