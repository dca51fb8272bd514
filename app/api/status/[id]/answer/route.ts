// POST /api/status/:id/answer `{ token?, body }`: the rider answers the tuner's question.
import { createLimiter } from "@/lib/api/rate-limit";
import { requireRiderAccess } from "@/lib/api/rider-access";
import { idParams, json, route } from "@/lib/api/route";
import { answerShopQuestion } from "@/lib/requests/rider-answer";
import { riderAnswerSchema } from "@/lib/validations/status";

const limit = createLimiter("rider-answer", 20, 15 * 60);

// Public on purpose: the status token (or the rider's session) is checked by requireRiderAccess.
export const POST = route(
  { access: "public", limit, params: idParams, notFound: "No such request.", body: riderAnswerSchema },
  async ({ request, params, body }) => {
    await requireRiderAccess(request, params.id, body.token);
    await answerShopQuestion(params.id, body.body);
    return json({ status: "in_review" }, 201);
  },
);
