// POST /api/requests/[id]/decline (staff): declines with a reason that is e-mailed to the rider.
import { NextResponse } from "next/server";
import { declineRequest } from "@/db/queries/workflow";
import { withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { jsonBody, requestIdFrom, type IdContext } from "@/lib/review/route-input";
import { declineSchema } from "@/lib/validations/review";

export const POST = withErrors(async (request: Request, context: IdContext) => {
  const actor = await requireRole(STAFF_ROLES, { headers: request.headers });
  const id = await requestIdFrom(context);
  const { reason } = await jsonBody(request, declineSchema);
  const mail = await declineRequest(id, reason, actor);
  return NextResponse.json({ status: "declined", email: mail.status });
});
