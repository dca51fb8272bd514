import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

export default defineConfig({
  resolve: { alias: { "@": fileURLToPath(new URL("./", import.meta.url)) } },
  test: {
    include: ["tests/unit/**/*.test.ts", "tests/integration/**/*.test.ts"],
    environment: "node",
    pool: "forks",
    globalSetup: ["tests/helpers/global-setup.ts"],
    env: {
      NODE_ENV: "test",
      DATA_DIR: ".test-data",
      MAIL_FROM: "Sagwise test shop <setup@sagwise.test>",
      BETTER_AUTH_SECRET: "unit-test-secret-unit-test-secret-0123456789",
      BETTER_AUTH_URL: "http://localhost:3000",
    },
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
