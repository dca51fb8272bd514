// POST /api/requests/[id]/approve (staff): freezes the current draft version and e-mails the rider
// the sheet link. Body (optional, an empty POST approves whatever draft is current): { version } to
// refuse approving a draft the tuner has not seen, { acknowledgedWarnings } the codes of the sanity
// warnings the tuner has checked.
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { approveRecommendation } from "@/lib/review/workflow";
import { approveSchema } from "@/lib/validations/review";

export const POST = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such request.", body: approveSchema },
  async ({ user, params, body }) => {
    const { version, revised, mail } = await approveRecommendation(
      params.id,
      user,
      body.version,
      body.acknowledgedWarnings ?? [],
    );
    return json({ version, revised, email: mail.status });
  },
);
