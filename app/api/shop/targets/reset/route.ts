// POST /api/shop/targets/reset { discipline, skill }: put one row back to the engine's defaults (admin).
import { saveSetupTarget } from "@/db/queries/targets";
import { json, route } from "@/lib/api/route";
import { defaultTargetValues } from "@/lib/shop/targets";
import { targetKeySchema } from "@/lib/validations/targets";
import { auditShop } from "../../_lib/audit";

export const POST = route(
  { access: ["admin"], body: targetKeySchema },
  async ({ user, body: { discipline, skill } }) => {
    const values = defaultTargetValues(discipline, skill);
    await saveSetupTarget(discipline, skill, values);
    await auditShop(user, "targets.reset", { discipline, skill });
    return json({ discipline, skill, values });
  },
);
