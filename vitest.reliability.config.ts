import { defineConfig } from "vitest/config";

// Reliability tests (`npm run test:reliability`, a stage of `npm test` after the build): the
// analysis budget with real worker threads, and saves surviving a killed server. Files run one
// after another: they load the machine's cores on purpose.
export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    include: ["tests/reliability/**/*.test.ts"],
    environment: "node",
    pool: "forks",
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
