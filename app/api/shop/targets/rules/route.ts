// PUT /api/shop/targets/rules { rules }: replace the clicker rules table (admin); DELETE: back to
// the engine's default rules.
import { replaceClickerRules } from "@/db/queries/targets";
import { json, route } from "@/lib/api/route";
import { sizingDefaults } from "@/lib/sizing";
import { clickerRulesSchema } from "@/lib/validations/targets";
import { auditShop } from "../../_lib/audit";

export const PUT = route({ access: ["admin"], body: clickerRulesSchema }, async ({ user, body: { rules } }) => {
  await replaceClickerRules(rules);
  await auditShop(user, "clicker-rules.saved", { count: rules.length });
  return json({ rules });
});

export const DELETE = route({ access: ["admin"] }, async ({ user }) => {
  await replaceClickerRules(sizingDefaults.DEFAULT_CLICKER_RULES);
  await auditShop(user, "clicker-rules.reset");
  return json({ rules: sizingDefaults.DEFAULT_CLICKER_RULES });
});
