// @ts-check
import js from "@eslint/js";
import tseslint from "typescript-eslint";

export default tseslint.config(
  { ignores: ["dist/", "coverage/", "docs/api/", "node_modules/", ".tmp/", ".stryker-tmp/", "reports/", "out/", "**/*.mjs", "**/*.js"] },
  js.configs.recommended,
  ...tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
    },
    rules: {
      "@typescript-eslint/switch-exhaustiveness-check": ["error", { considerDefaultExhaustiveForUnions: true }],
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
      "@typescript-eslint/consistent-type-imports": "error",
      "no-restricted-imports": ["error", { patterns: [{ group: ["node:*", "fs", "path", "process", "child_process"], message: "Node-only modules belong in src/cli/." }] }],
    },
  },
  {
    files: ["src/cli/**", "tests/**", "bench/**", "scripts/**", "examples/**", "*.config.ts"],
    rules: { "no-restricted-imports": "off" },
  },
  {
    files: ["tests/**", "bench/**"],
    rules: { "@typescript-eslint/no-non-null-assertion": "off", "@typescript-eslint/unbound-method": "off" },
  },
);
