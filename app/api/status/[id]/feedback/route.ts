// POST /api/status/:id/feedback `{ token?, front, rear, notes? }`: how the bike rides after the first
// rides; answers the clicker changes the engine proposes from the fitted setup.
import { createLimiter } from "@/lib/api/rate-limit";
import { requireRiderAccess } from "@/lib/api/rider-access";
import { idParams, json, route } from "@/lib/api/route";
import { reportRideFeedback } from "@/lib/requests/ride-feedback";
import { rideFeedbackSchema } from "@/lib/validations/ride-feedback";

const limit = createLimiter("ride-feedback", 20, 15 * 60);

// Public on purpose: the status token (or the rider's session) is checked by requireRiderAccess.
export const POST = route(
  { access: "public", limit, params: idParams, notFound: "No such request.", body: rideFeedbackSchema },
  async ({ request, params, body }) => {
    await requireRiderAccess(request, params.id, body.token);
    return json(await reportRideFeedback(params.id, body), 201);
  },
);
