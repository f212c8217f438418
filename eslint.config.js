// Lint: the recommended JS and TypeScript rules, nothing stylistic (formatting is not a lint concern here).
import js from "@eslint/js";
import tseslint from "typescript-eslint";
import globals from "globals";

export default tseslint.config(
  { ignores: ["dist/", "node_modules/", "coverage/"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
  {
    // No function over 80 lines in the code (issue 11): a longer one is split into named steps.
    files: ["src/**/*.ts"],
    // The table editor is being rebuilt as components (issue 11 item 5); drop this exemption with it.
    rules: { "max-lines-per-function": ["error", { max: 80, skipBlankLines: true, skipComments: true }] },
  },
);
