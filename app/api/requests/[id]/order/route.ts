// POST /api/requests/[id]/order `{ serviceType, token? }` → 201 `{ id }`: an order from the request's
// approved sheet, by staff or by the request's rider (status token or own session).
import { requireRequestAccess } from "@/lib/api/order-access";
import { createLimiter } from "@/lib/api/rate-limit";
import { idParams, json, route } from "@/lib/api/route";
import { createOrder } from "@/lib/orders/service";
import { createOrderSchema, orderErrors } from "@/lib/validations/orders";

const limit = createLimiter("order-create", 20, 15 * 60);

// Public on purpose: staff sessions, or the rider's token/session, checked by requireRequestAccess.
export const POST = route(
  {
    access: "public",
    limit,
    params: idParams,
    notFound: "No such request.",
    body: createOrderSchema,
    bodyErrors: orderErrors,
  },
  async ({ request, params, body }) => {
    const { actor } = await requireRequestAccess(request, params.id, body.token);
    const order = await createOrder(params.id, body.serviceType, actor);
    return json({ id: order.id }, 201);
  },
);
