// POST /api/status/:id/sag `{ token?, unit, front, rear }`: the rider's measured sag, judged at once.
import { NextResponse } from "next/server";
import { createLimiter } from "@/lib/api/rate-limit";
import { withErrors } from "@/lib/api/respond";
import { publicRoute } from "@/lib/auth/guard";
import { reportSag } from "@/lib/requests/sag-follow-up";
import { sagReportSchema } from "@/lib/validations/status";
import { requireRiderAccess } from "@/lib/api/rider-access";

const limit = createLimiter("sag-report", 20, 15 * 60);

// Public on purpose: the status token (or the rider's session) is checked by requireRiderAccess.
export const POST = publicRoute(
  withErrors(async (request: Request, context: { params: Promise<{ id: string }> }) => {
    await limit(request);
    const { id } = await context.params;
    const input = sagReportSchema.parse(await request.json().catch(() => ({})));
    await requireRiderAccess(request, id, input.token);
    return NextResponse.json(await reportSag(id, input), { status: 201 });
  }),
);
