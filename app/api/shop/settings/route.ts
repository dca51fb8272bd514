// GET/PUT /api/shop/settings: the shop's name, contact, units, paper, footer, gear mass (admin only).
import { NextResponse } from "next/server";
import { getShopSettings, saveShopSettings } from "@/db/queries/settings";
import { withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { shopSettingsSchema } from "@/lib/validations/settings";
import { jsonBody } from "../_lib/body";
import { auditShop } from "../_lib/audit";

export const dynamic = "force-dynamic";

export const GET = withErrors(async (request: Request) => {
  await requireRole(["admin"], { headers: request.headers });
  return NextResponse.json(await getShopSettings());
});

export const PUT = withErrors(async (request: Request) => {
  const user = await requireRole(["admin"], { headers: request.headers });
  const values = shopSettingsSchema.parse(await jsonBody(request));
  const row = await saveShopSettings(values);
  await auditShop(user, "settings.saved", {});
  return NextResponse.json(row);
});
