import { defineConfig } from "vitest/config";

// Reliability tests: the real built server (server/index.ts, bundled) with its own temporary
// database, hit over loopback with bad, oversized and racing requests (tests/reliability/harness.ts);
// the analysis budget and the kill -9 save test start servers of their own.
// Files run one after another: they share the server and one of them measures its memory.
export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    include: ["tests/reliability/**/*.test.ts"],
    environment: "node",
    globalSetup: ["tests/reliability/harness.ts"],
    pool: "forks",
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
