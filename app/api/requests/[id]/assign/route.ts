// POST /api/requests/[id]/assign (staff): assigns the request to a tuner (or none). Body: { tunerId }.
import { NextResponse } from "next/server";
import { findStaffMember } from "@/db/queries/review";
import { assignRequest } from "@/db/queries/workflow";
import { HttpError, withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { jsonBody, requestIdFrom, type IdContext } from "@/lib/review/route-input";
import { assignSchema } from "@/lib/validations/review";

export const POST = withErrors(async (request: Request, context: IdContext) => {
  const actor = await requireRole(STAFF_ROLES, { headers: request.headers });
  const id = await requestIdFrom(context);
  const { tunerId } = await jsonBody(request, assignSchema);
  const tuner = tunerId ? await findStaffMember(tunerId) : null;
  if (tunerId && !tuner) throw new HttpError(400, "Pick an active staff member.", { tunerId: "Not an active staff member" });
  await assignRequest(id, tuner, actor);
  return NextResponse.json({ assignedTunerId: tuner?.id ?? null, assignedTunerName: tuner?.name ?? null });
});
