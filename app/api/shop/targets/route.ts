// PUT /api/shop/targets { discipline, skill, values }: save one row of setup targets (admin).
import { NextResponse } from "next/server";
import { saveSetupTarget } from "@/db/queries/targets";
import { withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { saveTargetSchema } from "@/lib/validations/targets";
import { jsonBody } from "../_lib/body";
import { auditShop } from "../_lib/audit";

export const PUT = withErrors(async (request: Request) => {
  const user = await requireRole(["admin"], { headers: request.headers });
  const { discipline, skill, values } = saveTargetSchema.parse(await jsonBody(request));
  await saveSetupTarget(discipline, skill, values);
  await auditShop(user, "targets.saved", { discipline, skill, values });
  return NextResponse.json({ discipline, skill, values });
});
