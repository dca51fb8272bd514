// GET /api/requests/[id] (staff): the request with its versions, messages, photos, sag reports,
// e-mails and audit trail.
import { getRequestDetail } from "@/db/queries/review";
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { NotFoundError } from "@/lib/errors";

export const dynamic = "force-dynamic";

export const GET = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such request." },
  async ({ params }) => {
    const detail = await getRequestDetail(params.id);
    if (!detail) throw new NotFoundError("No such request.");
    return json(detail);
  },
);
