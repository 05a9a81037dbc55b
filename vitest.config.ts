import { defineConfig } from "vitest/config";

// Separate from vite.config.ts: the React Router plugin must not run under Vitest.
// Two projects in one run: unit and integration tests in Node, component tests (React rendered
// with @testing-library/react) in jsdom.
export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    testTimeout: 20000,
    hookTimeout: 30000,
    pool: "forks",
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: ["tests/unit/**/*.test.{ts,tsx}", "tests/integration/**/*.test.{ts,tsx}"],
          environment: "node",
        },
      },
      {
        extends: true,
        test: {
          name: "component",
          include: ["tests/component/**/*.test.tsx"],
          environment: "jsdom",
          setupFiles: ["tests/component/setup.ts"],
        },
      },
    ],
  },
});
