// POST /api/status/:id/answer `{ token?, body }`: the rider answers the tuner's question.
import { NextResponse } from "next/server";
import { recordRiderAnswer, StatusConflict } from "@/db/queries/status";
import { createLimiter } from "@/lib/api/rate-limit";
import { HttpError, withErrors } from "@/lib/api/respond";
import { publicRoute } from "@/lib/auth/guard";
import { riderAnswerSchema } from "@/lib/validations/status";
import { requireRiderAccess } from "@/lib/api/rider-access";

const limit = createLimiter("rider-answer", 20, 15 * 60);

// Public on purpose: the status token (or the rider's session) is checked by requireRiderAccess.
export const POST = publicRoute(
  withErrors(async (request: Request, context: { params: Promise<{ id: string }> }) => {
    await limit(request);
    const { id } = await context.params;
    const input = riderAnswerSchema.parse(await request.json().catch(() => ({})));
    await requireRiderAccess(request, id, input.token);
    try {
      await recordRiderAnswer(id, input.body);
    } catch (error) {
      if (error instanceof StatusConflict) throw new HttpError(409, error.message);
      throw error;
    }
    return NextResponse.json({ status: "in_review" }, { status: 201 });
  }),
);
