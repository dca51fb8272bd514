// Environment, validated once and failing fast with the variable named.
import { z } from "zod";

const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  PORT: z.coerce.number().int().positive().default(3000),
  DATA_DIR: z.string().min(1).default("./data"),
  DATABASE_URL: z.string().url().optional(),
  BETTER_AUTH_SECRET: z.string().min(32, "must be at least 32 characters").optional(),
  BETTER_AUTH_URL: z.string().url().optional(),
  RESEND_API_KEY: z.string().min(1).default("re_local_fake_key"),
  RESEND_BASE_URL: z.string().url().optional(),
  MAIL_FAKE_PORT: z.coerce.number().int().positive().default(4025),
  MAIL_FROM: z.string().min(3).default("Sagwise demo shop <setup@sagwise.test>"),
  DEMO_PASSWORD: z.string().min(8).default("sagwise-demo"),
  // How many proxies in front of the app append to X-Forwarded-For (0: clients connect directly).
  TRUST_PROXY_HOPS: z.coerce.number().int().min(0).max(10).default(0),
  // Shared photo storage for several instances (S3-compatible); unset keeps DATA_DIR/uploads.
  S3_BUCKET: z.string().min(3).optional(),
  S3_ENDPOINT: z.string().url().optional(),
  S3_REGION: z.string().min(1).default("us-east-1"),
  S3_ACCESS_KEY_ID: z.string().min(1).optional(),
  S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
  // Payments: the hosted payment service's SDK (lib/payments), pointed at the local fake unless
  // PAYMENT_API_URL says otherwise (README, configuration).
  PAYMENT_SECRET_KEY: z.string().min(1).default("sk_test_sagwise_local_fake"),
  PAYMENT_WEBHOOK_SECRET: z.string().min(1).default("whsec_sagwise_local_fake"),
  PAYMENT_API_URL: z.string().url().optional(),
  PAYMENT_FAKE_PORT: z.coerce.number().int().positive().default(4026),
  S3_FORCE_PATH_STYLE: z
    .enum(["true", "false", "1", "0"])
    .transform((v) => v === "true" || v === "1")
    .optional(),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

export function getEnv(): Env {
  if (cached) return cached;
  const raw = Object.fromEntries(Object.entries(process.env).map(([k, v]) => [k, v === "" ? undefined : v]));
  const parsed = envSchema.safeParse(raw);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join("\n")}`);
  }
  cached = parsed.data;
  return cached;
}

/** The URL the browser uses; better-auth checks the Origin header against it. */
export function appBaseUrl(): string {
  const env = getEnv();
  return env.BETTER_AUTH_URL ?? `http://localhost:${env.PORT}`;
}

/** Base URL the resend SDK posts to: the local mail fake unless configured otherwise. */
export function mailBaseUrl(): string {
  const env = getEnv();
  return env.RESEND_BASE_URL ?? `http://127.0.0.1:${env.MAIL_FAKE_PORT}`;
}

/** Where the payment SDK sends its calls: the local payments fake unless configured otherwise. */
export function paymentApiUrl(): URL {
  const env = getEnv();
  return new URL(env.PAYMENT_API_URL ?? `http://127.0.0.1:${env.PAYMENT_FAKE_PORT}`);
}

/** Tests reset the cache after changing process.env. */
export function resetEnvForTests(): void {
  cached = undefined;
}
