// Starts the mail fake and a seeded production server (`next start`, built beforehand by
// `npm run build`) on free ports with a temporary DATA_DIR. Their URLs reach the tests through the
// environment (Playwright starts its workers after global setup, with this process's environment).
// The returned function is Playwright's global teardown: it stops both and removes the data.
import { spawn, spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { freePort, stopChild, waitFor } from "../../../scripts/child-processes";
import { E2E_AUTH_SECRET, E2E_ENV } from "./env";

export default async function globalSetup() {
  if (!existsSync(path.join(".next", "BUILD_ID"))) {
    throw new Error("No production build: run `npm run build` before `npm run test:e2e`.");
  }
  const dataDir = mkdtempSync(path.join(os.tmpdir(), "sagwise-e2e-"));
  const [appPort, mailPort, paymentsPort] = await Promise.all([freePort(), freePort(), freePort()]);
  const baseUrl = `http://localhost:${appPort}`;
  const mailUrl = `http://127.0.0.1:${mailPort}`;
  const paymentsUrl = `http://127.0.0.1:${paymentsPort}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: "production",
    PORT: String(appPort),
    DATA_DIR: dataDir,
    BETTER_AUTH_SECRET: E2E_AUTH_SECRET,
    BETTER_AUTH_URL: baseUrl,
    RESEND_BASE_URL: mailUrl,
    MAIL_FAKE_PORT: String(mailPort),
    MAIL_FAKE_DIR: path.join(dataDir, "mail-fake"),
    PAYMENT_FAKE_PORT: String(paymentsPort),
    PAYMENT_API_URL: paymentsUrl,
    PAYMENT_WEBHOOK_URL: `${baseUrl}/api/payments/webhook`,
    // The browser tests run on the embedded database even when the shell points at PostgreSQL.
    DATABASE_URL: "",
    // The browser tests send X-Forwarded-For as one proxy in front would (tests/e2e/support/fixtures.ts).
    TRUST_PROXY_HOPS: "1",
  };

  const seeded = spawnSync("npx", ["tsx", "scripts/prepare-data.ts", "--seed"], { env, stdio: "inherit" });
  if (seeded.status !== 0) throw new Error("Seeding the e2e database failed");

  const output = (name: string) => (chunk: Buffer) => {
    if (process.env.E2E_VERBOSE) process.stdout.write(`[${name}] ${chunk}`);
  };
  const mail = spawn("npx", ["tsx", "fakes/mail/server.ts"], { env, detached: true });
  const payments = spawn("npx", ["tsx", "fakes/payments/server.ts"], { env, detached: true });
  const app = spawn("npx", ["next", "start", "-p", String(appPort)], { env, detached: true });
  for (const [name, child] of [
    ["mail", mail],
    ["payments", payments],
    ["app", app],
  ] as const) {
    child.stdout?.on("data", output(name));
    child.stderr?.on("data", (chunk: Buffer) => process.stderr.write(`[${name}] ${chunk}`));
  }
  const teardown = async () => {
    await Promise.all([stopChild(app), stopChild(mail), stopChild(payments)]);
    rmSync(dataDir, { recursive: true, force: true });
  };
  try {
    await waitFor(`${mailUrl}/emails`, mail, "mail fake");
    await waitFor(`${paymentsUrl}/payments`, payments, "payments fake");
    await waitFor(`${baseUrl}/api/health`, app, "next start");
  } catch (error) {
    await teardown();
    throw error;
  }

  process.env[E2E_ENV.baseUrl] = baseUrl;
  process.env[E2E_ENV.mailUrl] = mailUrl;
  process.env[E2E_ENV.paymentsUrl] = paymentsUrl;
  return teardown;
}
