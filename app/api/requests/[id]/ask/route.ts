// POST /api/requests/[id]/ask (staff): e-mails the rider a question; the request waits for the rider.
import { askRider } from "@/lib/review/workflow";
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { askRiderSchema } from "@/lib/validations/review";

export const POST = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such request.", body: askRiderSchema },
  async ({ user, params, body }) => {
    const mail = await askRider(params.id, body.question, user);
    return json({ status: "waiting_for_rider", email: mail.status });
  },
);
