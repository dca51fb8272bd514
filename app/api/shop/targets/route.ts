// PUT /api/shop/targets { discipline, skill, values }: save one row of setup targets (admin).
import { saveSetupTarget } from "@/db/queries/targets";
import { json, route } from "@/lib/api/route";
import { saveTargetSchema } from "@/lib/validations/targets";
import { auditShop } from "../_lib/audit";

export const PUT = route(
  { access: ["admin"], body: saveTargetSchema },
  async ({ user, body: { discipline, skill, values } }) => {
    await saveSetupTarget(discipline, skill, values);
    await auditShop(user, "targets.saved", { discipline, skill, values });
    return json({ discipline, skill, values });
  },
);
