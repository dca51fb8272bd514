// GET /api/shop/catalog/[id]: one model (retired ones too). PUT: replace it (staff).
import { getBikeModel, slugTaken, updateBikeModel } from "@/db/queries/bikes";
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { ConflictError, NotFoundError } from "@/lib/errors";
import { bikeModelSchema } from "@/lib/validations/bike";
import { auditShop } from "../../_lib/audit";

export const dynamic = "force-dynamic";

const bikeRoute = { access: STAFF_ROLES, params: idParams, notFound: "No such bike model." } as const;

export const GET = route(bikeRoute, async ({ params }) => {
  const model = await getBikeModel(params.id);
  if (!model) throw new NotFoundError("No such bike model.");
  return json(model);
});

export const PUT = route({ ...bikeRoute, body: bikeModelSchema }, async ({ user, params: { id }, body }) => {
  if (!(await getBikeModel(id))) throw new NotFoundError("No such bike model.");
  if (await slugTaken(body.slug, id))
    throw new ConflictError("Another model already uses this slug.", { slug: "Already used by another model" });
  const row = await updateBikeModel(id, body);
  await auditShop(user, "bike.updated", { id, slug: body.slug });
  return json(row);
});
