import { defineConfig } from "vitest/config";

// Browser tests: one server for the whole run (tests/e2e/harness.ts), files one after another
// because they share the demo database, generous timeouts for a cold headless Chromium.
export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    include: ["tests/e2e/**/*.e2e.ts"],
    environment: "node",
    globalSetup: ["tests/e2e/harness.ts"],
    pool: "forks",
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
