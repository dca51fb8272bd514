// POST /api/shop/targets/reset { discipline, skill }: put one row back to the engine's defaults (admin).
import { NextResponse } from "next/server";
import { saveSetupTarget } from "@/db/queries/targets";
import { withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { defaultTargetValues } from "@/lib/shop/targets";
import { targetKeySchema } from "@/lib/validations/targets";
import { jsonBody } from "../../_lib/body";
import { auditShop } from "../../_lib/audit";

export const POST = withErrors(async (request: Request) => {
  const user = await requireRole(["admin"], { headers: request.headers });
  const { discipline, skill } = targetKeySchema.parse(await jsonBody(request));
  const values = defaultTargetValues(discipline, skill);
  await saveSetupTarget(discipline, skill, values);
  await auditShop(user, "targets.reset", { discipline, skill });
  return NextResponse.json({ discipline, skill, values });
});
