import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

// Browser tests: one seeded `next start` and one mail fake for the whole run (tests/e2e/setup.ts),
// Debian's Chromium driven by playwright-core. Files run one at a time: 2 cores.
export default defineConfig({
  resolve: { alias: { "@": fileURLToPath(new URL("./", import.meta.url)) } },
  test: {
    include: ["tests/e2e/**/*.test.ts"],
    environment: "node",
    globalSetup: ["tests/e2e/setup.ts"],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
