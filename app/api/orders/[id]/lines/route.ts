// PUT /api/orders/[id]/lines `{ lines: [{ priceItemId?, description?, quantity, unitPriceMinor? }] }`
// (staff): the quote's lines, replaced as a whole until the rider accepts (409 after).
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { replaceLines } from "@/lib/orders/service";
import { orderErrors, replaceLinesSchema } from "@/lib/validations/orders";

export const PUT = route(
  {
    access: STAFF_ROLES,
    params: idParams,
    notFound: "No such order.",
    body: replaceLinesSchema,
    bodyErrors: orderErrors,
  },
  async ({ user, params, body }) => json(await replaceLines(params.id, body, { userId: user.id, label: user.name })),
);
