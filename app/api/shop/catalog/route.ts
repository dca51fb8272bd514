// GET /api/shop/catalog?q=&retired=hide|show|only: the catalog. POST: a new model (staff).
import { createBikeModel, listBikeModels, slugTaken } from "@/db/queries/bikes";
import { json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { ConflictError } from "@/lib/errors";
import { bikeModelSchema, catalogQuerySchema } from "@/lib/validations/bike";
import { auditShop } from "../_lib/audit";

export const dynamic = "force-dynamic";

export const GET = route({ access: STAFF_ROLES, query: catalogQuerySchema }, async ({ query }) =>
  json({ items: await listBikeModels(query) }),
);

export const POST = route({ access: STAFF_ROLES, body: bikeModelSchema }, async ({ user, body }) => {
  if (await slugTaken(body.slug))
    throw new ConflictError("Another model already uses this slug.", { slug: "Already used by another model" });
  const row = await createBikeModel(body);
  await auditShop(user, "bike.created", { id: row.id, slug: row.slug });
  return json(row, 201);
});
