// GET /api/requests/[id] (staff): the request with its versions, messages, photos, sag reports,
// e-mails and audit trail.
import { NextResponse } from "next/server";
import { getRequestDetail } from "@/db/queries/review";
import { HttpError, withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { requestIdFrom, type IdContext } from "@/lib/review/route-input";

export const dynamic = "force-dynamic";

export const GET = withErrors(async (request: Request, context: IdContext) => {
  await requireRole(STAFF_ROLES, { headers: request.headers });
  const detail = await getRequestDetail(await requestIdFrom(context));
  if (!detail) throw new HttpError(404, "No such request.");
  return NextResponse.json(detail);
});
