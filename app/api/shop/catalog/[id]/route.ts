// GET /api/shop/catalog/[id]: one model (retired ones too). PUT: replace it (staff).
import { NextResponse } from "next/server";
import { getBikeModel, slugTaken, updateBikeModel } from "@/db/queries/bikes";
import { HttpError, withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { bikeModelSchema } from "@/lib/validations/bike";
import { jsonBody, uuidParam, type IdContext } from "../../_lib/body";
import { auditShop } from "../../_lib/audit";

export const dynamic = "force-dynamic";

export const GET = withErrors(async (request: Request, { params }: IdContext) => {
  await requireRole(STAFF_ROLES, { headers: request.headers });
  const model = await getBikeModel(await uuidParam(params, "bike model"));
  if (!model) throw new HttpError(404, "No such bike model.");
  return NextResponse.json(model);
});

export const PUT = withErrors(async (request: Request, { params }: IdContext) => {
  const user = await requireRole(STAFF_ROLES, { headers: request.headers });
  const id = await uuidParam(params, "bike model");
  const values = bikeModelSchema.parse(await jsonBody(request));
  if (!(await getBikeModel(id))) throw new HttpError(404, "No such bike model.");
  if (await slugTaken(values.slug, id))
    throw new HttpError(409, "Another model already uses this slug.", { slug: "Already used by another model" });
  const row = await updateBikeModel(id, values);
  await auditShop(user, "bike.updated", { id, slug: values.slug });
  return NextResponse.json(row);
});
