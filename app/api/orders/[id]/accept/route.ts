// POST /api/orders/[id]/accept `{ token? }`: the rider accepts the quote (or staff on the rider's word).
import { requireOrderAccess } from "@/lib/api/order-access";
import { createLimiter } from "@/lib/api/rate-limit";
import { idParams, json, route } from "@/lib/api/route";
import { acceptQuote } from "@/lib/orders/service";
import { orderErrors, tokenOnlySchema } from "@/lib/validations/orders";

const limit = createLimiter("order-accept", 30, 15 * 60);

// Public on purpose: the rider's token or session (or a staff session), checked by requireOrderAccess.
export const POST = route(
  {
    access: "public",
    limit,
    params: idParams,
    notFound: "No such order.",
    body: tokenOnlySchema,
    bodyErrors: orderErrors,
  },
  async ({ request, params, body }) => {
    const { actor } = await requireOrderAccess(request, params.id, body.token);
    const order = await acceptQuote(params.id, actor);
    return json({ id: order.id, acceptedAt: order.acceptedAt });
  },
);
