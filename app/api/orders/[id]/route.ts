// GET /api/orders/[id][?token=T]: the order (staff, or the request's rider). PATCH (staff)
// `{ stage?, carrier?, trackingNumber?, dueOn?, … }`: an illegal stage change answers 409.
import { z } from "zod";
import { requireOrderAccess } from "@/lib/api/order-access";
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { patchOrder } from "@/lib/orders/service";
import { loadOrderView } from "@/lib/orders/view";
import { orderErrors, patchOrderSchema } from "@/lib/validations/orders";
import { statusTokenSchema } from "@/lib/validations/status";

export const dynamic = "force-dynamic";

// Public on purpose: staff see every order; a rider only their own (token or session), else 404.
export const GET = route(
  { access: "public", params: idParams, notFound: "No such order.", query: z.object({ token: statusTokenSchema }) },
  async ({ request, params, query }) => {
    const { staff } = await requireOrderAccess(request, params.id, query.token);
    return json(await loadOrderView(params.id, { staff }));
  },
);

export const PATCH = route(
  {
    access: STAFF_ROLES,
    params: idParams,
    notFound: "No such order.",
    body: patchOrderSchema,
    bodyErrors: orderErrors,
  },
  async ({ user, params, body }) => {
    const order = await patchOrder(params.id, body, { userId: user.id, label: user.name });
    return json({ id: order.id, stage: order.stage });
  },
);
