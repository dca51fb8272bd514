// GET/PUT /api/shop/settings: the shop's name, contact, units, paper, footer, gear mass (admin only).
import { getShopSettings, saveShopSettings } from "@/db/queries/settings";
import { json, route } from "@/lib/api/route";
import { shopSettingsSchema } from "@/lib/validations/settings";
import { auditShop } from "../_lib/audit";

export const dynamic = "force-dynamic";

export const GET = route({ access: ["admin"] }, async () => json(await getShopSettings()));

export const PUT = route({ access: ["admin"], body: shopSettingsSchema }, async ({ user, body }) => {
  const row = await saveShopSettings(body);
  await auditShop(user, "settings.saved", {});
  return json(row);
});
