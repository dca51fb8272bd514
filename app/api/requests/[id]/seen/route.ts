// POST /api/requests/[id]/seen (staff): marks the request's notices (new request, rider's answer,
// sag report, payment) seen, so they leave the counts on the navigation and the marks in the queue.
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { markRequestSeen } from "@/lib/review/workflow";

export const POST = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such request." },
  async ({ user, params }) => json(await markRequestSeen(params.id, user)),
);
