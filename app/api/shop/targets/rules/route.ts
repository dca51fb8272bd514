// PUT /api/shop/targets/rules { rules }: replace the clicker rules table (admin); DELETE: back to
// the engine's default rules.
import { NextResponse } from "next/server";
import { replaceClickerRules } from "@/db/queries/targets";
import { withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { sizingDefaults } from "@/lib/sizing";
import { clickerRulesSchema } from "@/lib/validations/targets";
import { jsonBody } from "../../_lib/body";
import { auditShop } from "../../_lib/audit";

export const PUT = withErrors(async (request: Request) => {
  const user = await requireRole(["admin"], { headers: request.headers });
  const { rules } = clickerRulesSchema.parse(await jsonBody(request));
  await replaceClickerRules(rules);
  await auditShop(user, "clicker-rules.saved", { count: rules.length });
  return NextResponse.json({ rules });
});

export const DELETE = withErrors(async (request: Request) => {
  const user = await requireRole(["admin"], { headers: request.headers });
  await replaceClickerRules(sizingDefaults.DEFAULT_CLICKER_RULES);
  await auditShop(user, "clicker-rules.reset");
  return NextResponse.json({ rules: sizingDefaults.DEFAULT_CLICKER_RULES });
});
