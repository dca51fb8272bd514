// POST /api/requests/[id]/start (staff): "Start review" (body {}) or "Take" ({ "take": true }).
// Opening a request never changes it; this action does, audited (lib/review/workflow.ts).
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { startReview } from "@/lib/review/workflow";
import { startReviewSchema } from "@/lib/validations/review";

export const POST = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such request.", body: startReviewSchema },
  async ({ user, params, body }) => json(await startReview(params.id, user, { take: body.take ?? false })),
);
