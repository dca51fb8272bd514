// GET /api/requests/[id]/order[?token=T] → `{ orders }`: the request's orders, newest first (staff,
// or the request's rider: the status page lists them).
// POST /api/requests/[id]/order `{ serviceType, token? }` → 201 `{ id }`: an order from the request's
// approved sheet, by staff or by the request's rider (status token or own session).
import { requireRequestAccess } from "@/lib/api/order-access";
import { createLimiter } from "@/lib/api/rate-limit";
import { idParams, json, route } from "@/lib/api/route";
import { z } from "zod";
import { listOrdersForRequest } from "@/db/queries/orders";
import { createOrder } from "@/lib/orders/service";
import { loadOrderView } from "@/lib/orders/view";
import { statusTokenSchema } from "@/lib/validations/status";
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

// Public on purpose: as POST, staff or the request's rider only (requireRequestAccess).
export const GET = route(
  { access: "public", params: idParams, notFound: "No such request.", query: z.object({ token: statusTokenSchema }) },
  async ({ request, params, query }) => {
    const { staff } = await requireRequestAccess(request, params.id, query.token);
    const rows = await listOrdersForRequest(params.id);
    return json({ orders: await Promise.all(rows.map((o) => loadOrderView(o.id, { staff }))) });
  },
);
