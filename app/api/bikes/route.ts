// GET /api/bikes?q=: the shop's active catalog for the public bike picker (no specs beyond travel).
import { NextResponse } from "next/server";
import { z } from "zod";
import { listActiveBikes } from "@/db/queries/intake";
import { withErrors } from "@/lib/api/respond";
import { publicRoute } from "@/lib/auth/guard";
import { text } from "@/lib/validations/text";

export const dynamic = "force-dynamic";

const querySchema = z.object({ q: text().trim().max(60, "Keep the search under 60 characters").optional() });

export const GET = publicRoute(
  withErrors(async (request: Request) => {
    const { q } = querySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
    const bikes = await listActiveBikes(q || undefined);
    return NextResponse.json({
      items: bikes.map((b) => ({
        id: b.id,
        name: b.name,
        bikeClass: b.bikeClass,
        typical: b.isTypical,
        travel: { rearWheelMm: b.rearWheelTravelMm, forkMm: b.forkTravelMm },
      })),
    });
  }),
);
