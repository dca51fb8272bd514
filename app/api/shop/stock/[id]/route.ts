// PUT /api/shop/stock/[id]: change a spring line. DELETE: remove it from the shelf list.
import { NextResponse } from "next/server";
import { deleteSpringStock, updateSpringStock } from "@/db/queries/stock";
import { HttpError, withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { springStockSchema } from "@/lib/validations/stock";
import { jsonBody, uuidParam, type IdContext } from "../../_lib/body";

export const PUT = withErrors(async (request: Request, { params }: IdContext) => {
  await requireRole(STAFF_ROLES, { headers: request.headers });
  const id = await uuidParam(params, "spring");
  const row = await updateSpringStock(id, springStockSchema.parse(await jsonBody(request)));
  if (!row) throw new HttpError(404, "No such spring.");
  return NextResponse.json(row);
});

export const DELETE = withErrors(async (request: Request, { params }: IdContext) => {
  await requireRole(STAFF_ROLES, { headers: request.headers });
  if (!(await deleteSpringStock(await uuidParam(params, "spring")))) throw new HttpError(404, "No such spring.");
  return new Response(null, { status: 204 });
});
