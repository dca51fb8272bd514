// POST /api/shop/targets/preview: the recommendation for a reference rider with the saved row and
// with the edited one, so an admin sees what a change does before saving it.
import { loadBikeSpec } from "@/db/queries/sizing-context";
import { json, route } from "@/lib/api/route";
import { ValidationError } from "@/lib/errors";
import { previewTargets } from "@/lib/shop/target-preview";
import { targetPreviewSchema } from "@/lib/validations/targets";

export const POST = route({ access: ["admin"], body: targetPreviewSchema }, async ({ body }) => {
  const bike = await loadBikeSpec(body.bikeModelId);
  if (!bike) throw new ValidationError("Choose a bike from the catalog.", { bikeModelId: "No such bike" });
  return json(await previewTargets({ ...body, bike: bike.spec, bikeName: bike.name }));
});
