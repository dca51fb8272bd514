// GET /api/shop/catalog?q=&retired=hide|show|only: the catalog. POST: a new model (staff).
import { NextResponse } from "next/server";
import { createBikeModel, listBikeModels, slugTaken } from "@/db/queries/bikes";
import { HttpError, withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { bikeModelSchema, catalogQuerySchema } from "@/lib/validations/bike";
import { jsonBody } from "../_lib/body";
import { auditShop } from "../_lib/audit";

export const dynamic = "force-dynamic";

export const GET = withErrors(async (request: Request) => {
  await requireRole(STAFF_ROLES, { headers: request.headers });
  const query = catalogQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  return NextResponse.json({ items: await listBikeModels(query) });
});

export const POST = withErrors(async (request: Request) => {
  const user = await requireRole(STAFF_ROLES, { headers: request.headers });
  const values = bikeModelSchema.parse(await jsonBody(request));
  if (await slugTaken(values.slug))
    throw new HttpError(409, "Another model already uses this slug.", { slug: "Already used by another model" });
  const row = await createBikeModel(values);
  await auditShop(user, "bike.created", { id: row.id, slug: row.slug });
  return NextResponse.json(row, { status: 201 });
});
