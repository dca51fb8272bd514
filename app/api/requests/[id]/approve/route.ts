// POST /api/requests/[id]/approve (staff): freezes the current draft version and e-mails the rider
// the sheet link. Body (optional): { version } to refuse approving a draft the tuner has not seen,
// { acknowledgedWarnings } the codes of the sanity warnings the tuner has checked.
import { NextResponse } from "next/server";
import { approveRecommendation } from "@/db/queries/workflow";
import { withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { jsonBody, requestIdFrom, type IdContext } from "@/lib/review/route-input";
import { approveSchema } from "@/lib/validations/review";

export const POST = withErrors(async (request: Request, context: IdContext) => {
  const actor = await requireRole(STAFF_ROLES, { headers: request.headers });
  const id = await requestIdFrom(context);
  // The body is optional: an empty POST approves whatever draft is current.
  const body = request.headers.get("content-length") === "0" || !request.body ? {} : await jsonBody(request, approveSchema);
  const { version, revised, mail } = await approveRecommendation(id, actor, body.version, body.acknowledgedWarnings ?? []);
  return NextResponse.json({ version, revised, email: mail.status });
});
