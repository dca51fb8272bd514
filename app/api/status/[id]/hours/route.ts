// POST /api/status/:id/hours `{ token?, hours, date }`: the rider logs hours ridden; answers the next
// service due dates (lib/service). Another rider's token, or another rider's session, is refused (403).
import { createLimiter } from "@/lib/api/rate-limit";
import { isRequestRider } from "@/lib/api/rider-access";
import { idParams, json, route } from "@/lib/api/route";
import { ForbiddenError } from "@/lib/errors";
import { logRiderHours } from "@/lib/service/hours";
import { hourLogSchema } from "@/lib/validations/service";

const limit = createLimiter("service-hours", 30, 15 * 60);

// Public on purpose: the status token (or the rider's session) is checked by isRequestRider.
export const POST = route(
  { access: "public", limit, params: idParams, notFound: "No such request.", body: hourLogSchema },
  async ({ request, params, body }) => {
    if (!(await isRequestRider(request, params.id, body.token)))
      throw new ForbiddenError("This link is not for this request: open the link the shop e-mailed you.");
    const overview = await logRiderHours(params.id, body);
    return json({
      hoursLogged: overview.hoursLogged,
      startedOn: overview.startedOn,
      due: overview.due.map(({ item, label, dueOn, by, state }) => ({ item, label, dueOn, by, state })),
    });
  },
);
