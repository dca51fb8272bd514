// POST /api/payments/webhook: events from the payment service, signed with the endpoint's secret.
// A bad or stale signature answers 400 and changes nothing; an event delivered twice is handled once.
import { json, route } from "@/lib/api/route";
import { handlePaymentWebhook } from "@/lib/orders/payments";

// Public on purpose: the payment service calls it without a session; the signature
// (stripe.webhooks.constructEvent with PAYMENT_WEBHOOK_SECRET) is what admits it.
export const POST = route({ access: "public" }, async ({ request }) =>
  json(await handlePaymentWebhook(await request.text(), request.headers.get("stripe-signature"))),
);
