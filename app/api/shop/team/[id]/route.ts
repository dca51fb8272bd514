// PATCH /api/shop/team/[id] { role?, active? }: change a role or (de)activate (admin only).
// Deactivation ends the person's sessions at once; the last active admin can be neither demoted
// nor deactivated (409).
import { NextResponse } from "next/server";
import { HttpError, withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { updateStaffMember } from "@/lib/auth/staff";
import { memberUpdateSchema } from "@/lib/validations/team";
import { jsonBody, type IdContext } from "../../_lib/body";
import { auditShop } from "../../_lib/audit";

export const PATCH = withErrors(async (request: Request, { params }: IdContext) => {
  const admin = await requireRole(["admin"], { headers: request.headers });
  const { id } = await params;
  const change = memberUpdateSchema.parse(await jsonBody(request));
  if (id === admin.id && change.active === false)
    throw new HttpError(409, "You cannot deactivate your own account.", { active: "Your own account" });
  const member = await updateStaffMember(id, change, request.headers);
  await auditShop(admin, "staff.changed", { userId: id, ...change });
  return NextResponse.json(member);
});
