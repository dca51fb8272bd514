// POST /api/requests/:id/ride-revision `{ feedbackId }`: the rider's feedback's clicker changes as a
// revised sheet in one step (saved, approved and e-mailed like any revision).
import { STAFF_ROLES } from "@/lib/auth/roles";
import { idParams, json, route } from "@/lib/api/route";
import { sendRideRevision } from "@/lib/review/ride-revision";
import { rideRevisionSchema } from "@/lib/validations/ride-feedback";

export const POST = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such request.", body: rideRevisionSchema },
  async ({ user, params, body }) => json(await sendRideRevision(params.id, body.feedbackId, user)),
);
