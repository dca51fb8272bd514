// GET /api/bikes?q=: the shop's active catalog for the public bike picker (no specs beyond travel).
// Public on purpose: riders pick their bike before they have any account.
import { z } from "zod";
import { listActiveBikes } from "@/db/queries/intake";
import { json, route } from "@/lib/api/route";
import { text } from "@/lib/validations/text";

export const dynamic = "force-dynamic";

const querySchema = z.object({ q: text().trim().max(60, "Keep the search under 60 characters").optional() });

export const GET = route({ access: "public", query: querySchema }, async ({ query }) => {
  const bikes = await listActiveBikes(query.q || undefined);
  return json({
    items: bikes.map((b) => ({
      id: b.id,
      name: b.name,
      bikeClass: b.bikeClass,
      typical: b.isTypical,
      travel: { rearWheelMm: b.rearWheelTravelMm, forkMm: b.forkTravelMm },
    })),
  });
});
