// POST /api/shop/catalog/[id]/retire { retired }: retire a model or bring it back. A retired model
// leaves the rider's picker but stays readable on the requests that used it (nothing is deleted).
import { NextResponse } from "next/server";
import { setBikeModelRetired } from "@/db/queries/bikes";
import { HttpError, withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { retireSchema } from "@/lib/validations/bike";
import { jsonBody, uuidParam, type IdContext } from "../../../_lib/body";
import { auditShop } from "../../../_lib/audit";

export const POST = withErrors(async (request: Request, { params }: IdContext) => {
  const user = await requireRole(STAFF_ROLES, { headers: request.headers });
  const id = await uuidParam(params, "bike model");
  const { retired } = retireSchema.parse(await jsonBody(request));
  const row = await setBikeModelRetired(id, retired);
  if (!row) throw new HttpError(404, "No such bike model.");
  await auditShop(user, retired ? "bike.retired" : "bike.restored", { id });
  return NextResponse.json(row);
});
