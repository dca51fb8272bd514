// POST /api/requests/[id]/decline (staff): declines with a reason that is e-mailed to the rider.
import { declineRequest } from "@/lib/review/workflow";
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { declineSchema } from "@/lib/validations/review";

export const POST = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such request.", body: declineSchema },
  async ({ user, params, body }) => {
    const mail = await declineRequest(params.id, body.reason, user);
    return json({ status: "declined", email: mail.status });
  },
);
