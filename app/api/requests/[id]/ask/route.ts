// POST /api/requests/[id]/ask (staff): e-mails the rider a question; the request waits for the rider.
import { NextResponse } from "next/server";
import { askRider } from "@/db/queries/workflow";
import { withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { jsonBody, requestIdFrom, type IdContext } from "@/lib/review/route-input";
import { askRiderSchema } from "@/lib/validations/review";

export const POST = withErrors(async (request: Request, context: IdContext) => {
  const actor = await requireRole(STAFF_ROLES, { headers: request.headers });
  const id = await requestIdFrom(context);
  const { question } = await jsonBody(request, askRiderSchema);
  const mail = await askRider(id, question, actor);
  return NextResponse.json({ status: "waiting_for_rider", email: mail.status });
});
