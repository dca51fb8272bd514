// The hosted payment service's official SDK (stripe), configured from the environment. In
// development and tests it talks to the local fake (fakes/payments) through the SDK's own host,
// port and protocol options, exactly as e-mail goes to the mail fake.
import Stripe from "stripe";
import { getEnv, paymentApiUrl } from "@/lib/env";

const holder = globalThis as unknown as { __sagwisePayments?: { key: string; client: Stripe } };

export function paymentClient(): Stripe {
  const env = getEnv();
  const url = paymentApiUrl();
  const key = `${env.PAYMENT_SECRET_KEY}|${url.href}`;
  if (holder.__sagwisePayments?.key === key) return holder.__sagwisePayments.client;
  const protocol = url.protocol === "http:" ? "http" : "https";
  const client = new Stripe(env.PAYMENT_SECRET_KEY, {
    host: url.hostname,
    port: url.port ? Number(url.port) : protocol === "http" ? 80 : 443,
    protocol,
    // One try: the caller reports a failure to the person, who can press the button again.
    maxNetworkRetries: 0,
    timeout: 15_000,
    telemetry: false,
  });
  holder.__sagwisePayments = { key, client };
  return client;
}

/** Verifies a webhook's signature with the SDK (default tolerance: 300 s) and returns the event. */
export function verifyWebhook(payload: string, signature: string): Stripe.Event {
  return paymentClient().webhooks.constructEvent(payload, signature, getEnv().PAYMENT_WEBHOOK_SECRET);
}

export type { Stripe };
