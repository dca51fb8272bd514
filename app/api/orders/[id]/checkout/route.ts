// POST /api/orders/[id]/checkout `{ token? }` → `{ url }`: a checkout session at the payment service
// for what is due (the fake's payment page in development; the URL ends with the session id).
import { requireOrderAccess } from "@/lib/api/order-access";
import { createLimiter } from "@/lib/api/rate-limit";
import { idParams, json, route } from "@/lib/api/route";
import { startCheckout } from "@/lib/orders/payments";
import { orderErrors, tokenOnlySchema } from "@/lib/validations/orders";

const limit = createLimiter("order-checkout", 30, 15 * 60);

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
    const { url, amountMinor } = await startCheckout(params.id, actor);
    return json({ url, amountMinor });
  },
);
