import js from "@eslint/js";
import reactHooks from "eslint-plugin-react-hooks";
import tseslint from "typescript-eslint";

export default tseslint.config(
  {
    ignores: [
      "build/",
      ".react-router/",
      "node_modules/",
      "data/",
      "test-results/",
      "coverage/",
      "drizzle/meta/",
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  // Hooks rules only where React lives: the tests' `use...()` helpers are vitest set-up, not hooks.
  { ...reactHooks.configs.flat.recommended, files: ["app/**/*.{ts,tsx}"] },
  {
    rules: {
      // `_`-prefixed names mark parameters a signature needs but the body does not use.
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", caughtErrorsIgnorePattern: "^_" },
      ],
      // One import statement per module (a separate `import type` is allowed).
      "no-duplicate-imports": ["error", { allowSeparateTypeImports: true }],
    },
  },
  {
    // The engine's front door: outside app/analysis, code imports the engine only through `~/analysis`.
    // The engine's own unit tests (tests/unit/analysis) may reach its parts.
    files: ["**/*.{ts,tsx,js,mjs}"],
    ignores: ["app/analysis/**", "tests/unit/analysis/**"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              group: ["~/analysis/*", "**/app/analysis/*"],
              message: "Import the engine through its front door: `~/analysis`.",
            },
            {
              group: ["~/db/schema", "**/db/schema"],
              importNames: ["ROLES", "Role", "LAYOUT_STATUSES", "LayoutStatus"],
              message: "Shared constants live in `~/lib/` so the table definitions stay out of the browser.",
            },
          ],
        },
      ],
    },
  },
);
