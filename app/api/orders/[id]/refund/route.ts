// POST /api/orders/[id]/refund `{ amountMinor?, reason }` (staff): refunds what was paid (all of it
// by default) through the payment service; audited.
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { refundOrder } from "@/lib/orders/payments";
import { orderErrors, refundSchema } from "@/lib/validations/orders";

export const POST = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such order.", body: refundSchema, bodyErrors: orderErrors },
  async ({ user, params, body }) => {
    const order = await refundOrder(params.id, body, { userId: user.id, label: user.name });
    return json({ paymentStatus: order.paymentStatus, refundedMinor: order.refundedMinor });
  },
);
