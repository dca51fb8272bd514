// The usual frame of an integration test file: a fresh database (optionally seeded with the demo
// scenario), msw standing in for the e-mail API, and optionally a temporary DATA_DIR for uploads.
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { setupServer } from "msw/node";
import { afterAll, beforeAll } from "vitest";
import { resetEnvForTests } from "@/lib/env";
import { seedDemo } from "@/db/seed-demo";
import { captureMail } from "./auth";
import { closeTestDatabase, createTestDatabase } from "./db";

export interface TestApp {
  server: ReturnType<typeof setupServer>;
  /** Every e-mail the app sent, in order. */
  sent: ReturnType<typeof captureMail>;
  dataDir: string;
}

export function setupTestApp(options: { seed?: boolean; tempDataDir?: boolean } = {}): TestApp {
  const app: TestApp = { server: setupServer(), sent: [], dataDir: "" };
  beforeAll(async () => {
    if (options.tempDataDir) {
      app.dataDir = mkdtempSync(path.join(os.tmpdir(), "sagwise-test-data-"));
      process.env.DATA_DIR = app.dataDir;
      resetEnvForTests();
    }
    await createTestDatabase();
    if (options.seed) await seedDemo();
    app.server.listen({ onUnhandledRequest: "error" });
    app.sent = captureMail(app.server);
  }, 120_000);
  afterAll(async () => {
    app.server.close();
    await closeTestDatabase();
    if (app.dataDir) rmSync(app.dataDir, { recursive: true, force: true });
  });
  return app;
}
