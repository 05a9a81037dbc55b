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
    },
  },
);
