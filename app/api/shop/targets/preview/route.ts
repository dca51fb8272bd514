// POST /api/shop/targets/preview: the recommendation for a reference rider with the saved row and
// with the edited one, so an admin sees what a change does before saving it.
import { NextResponse } from "next/server";
import { loadBikeSpec } from "@/db/queries/sizing-context";
import { HttpError, withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { previewTargets } from "@/lib/shop/target-preview";
import { targetPreviewSchema } from "@/lib/validations/targets";
import { jsonBody } from "../../_lib/body";

export const POST = withErrors(async (request: Request) => {
  await requireRole(["admin"], { headers: request.headers });
  const input = targetPreviewSchema.parse(await jsonBody(request));
  const bike = await loadBikeSpec(input.bikeModelId);
  if (!bike) throw new HttpError(400, "Choose a bike from the catalog.", { bikeModelId: "No such bike" });
  return NextResponse.json(await previewTargets({ ...input, bike: bike.spec, bikeName: bike.name }));
});
