// POST /api/status/:id/sag `{ token?, unit, front, rear }`: the rider's measured sag, judged at once.
import { createLimiter } from "@/lib/api/rate-limit";
import { requireRiderAccess } from "@/lib/api/rider-access";
import { idParams, json, route } from "@/lib/api/route";
import { reportSag } from "@/lib/requests/sag-follow-up";
import { sagReportSchema } from "@/lib/validations/status";

const limit = createLimiter("sag-report", 20, 15 * 60);

// Public on purpose: the status token (or the rider's session) is checked by requireRiderAccess.
export const POST = route(
  { access: "public", limit, params: idParams, notFound: "No such request.", body: sagReportSchema },
  async ({ request, params, body }) => {
    await requireRiderAccess(request, params.id, body.token);
    return json(await reportSag(params.id, body), 201);
  },
);
