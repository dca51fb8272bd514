// PUT /api/shop/stock/[id]: change a spring line. DELETE: remove it from the shelf list.
import { deleteSpringStock, updateSpringStock } from "@/db/queries/stock";
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { NotFoundError } from "@/lib/errors";
import { springStockSchema } from "@/lib/validations/stock";

const springRoute = { access: STAFF_ROLES, params: idParams, notFound: "No such spring." } as const;

export const PUT = route({ ...springRoute, body: springStockSchema }, async ({ params, body }) => {
  const row = await updateSpringStock(params.id, body);
  if (!row) throw new NotFoundError("No such spring.");
  return json(row);
});

export const DELETE = route(springRoute, async ({ params }) => {
  if (!(await deleteSpringStock(params.id))) throw new NotFoundError("No such spring.");
  return new Response(null, { status: 204 });
});
