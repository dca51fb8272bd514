// POST /api/shop/catalog/[id]/duplicate: a copy to edit into a sibling model ("… (copy)").
import { NextResponse } from "next/server";
import { createBikeModel, getBikeModel, slugTaken } from "@/db/queries/bikes";
import { HttpError, withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { bikeModelSchema } from "@/lib/validations/bike";
import { uuidParam, type IdContext } from "../../../_lib/body";
import { auditShop } from "../../../_lib/audit";

export const POST = withErrors(async (request: Request, { params }: IdContext) => {
  const user = await requireRole(STAFF_ROLES, { headers: request.headers });
  const source = await getBikeModel(await uuidParam(params, "bike model"));
  if (!source) throw new HttpError(404, "No such bike model.");
  let slug = `${source.slug}-copy`.slice(0, 75);
  for (let n = 2; await slugTaken(slug); n++) slug = `${source.slug.slice(0, 70)}-copy-${n}`;
  const values = bikeModelSchema.parse({
    name: `${source.name} (copy)`.slice(0, 120),
    slug,
    bikeClass: source.bikeClass,
    yearFrom: source.yearFrom,
    yearTo: source.yearTo,
    notes: source.notes,
    spec: source.spec,
  });
  const row = await createBikeModel(values);
  await auditShop(user, "bike.duplicated", { id: row.id, from: source.id });
  return NextResponse.json(row, { status: 201 });
});
