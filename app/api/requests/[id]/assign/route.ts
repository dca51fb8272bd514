// POST /api/requests/[id]/assign (staff): assigns the request to a tuner (or none). Body: { tunerId }.
import { findStaffMember } from "@/db/queries/review";
import { assignRequest } from "@/lib/review/workflow";
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { ValidationError } from "@/lib/errors";
import { assignSchema } from "@/lib/validations/review";

export const POST = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such request.", body: assignSchema },
  async ({ user, params, body: { tunerId } }) => {
    const tuner = tunerId ? await findStaffMember(tunerId) : null;
    if (tunerId && !tuner)
      throw new ValidationError("Pick an active staff member.", { tunerId: "Not an active staff member" });
    await assignRequest(params.id, tuner, user);
    return json({ assignedTunerId: tuner?.id ?? null, assignedTunerName: tuner?.name ?? null });
  },
);
