// Lint: typescript-eslint's recommended rules, plus the layer rule that keeps the
// solver (src/core) free of any host or DOM name.
import js from "@eslint/js";
import tseslint from "typescript-eslint";

const hostNames = ["Office", "Excel", "CustomFunctions", "document", "window", "navigator", "fetch", "XMLHttpRequest"];

export default tseslint.config(
  { ignores: ["dist/**", "node_modules/**", "coverage/**", "test-artifacts/**", "tmp/**", ".certs/**", "**/*.js", "**/*.mjs"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      "@typescript-eslint/no-explicit-any": "off",
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
  {
    files: ["src/core/**/*.ts"],
    rules: {
      "no-restricted-globals": ["error", ...hostNames.map((name) => ({ name, message: "src/core is pure: no host or DOM names." }))],
      "no-restricted-imports": ["error", { patterns: ["../sheet/*", "../pane/*", "../cli/*", "../../functions/*"] }],
      "no-restricted-syntax": [
        "error",
        ...hostNames.map((name) => ({ selector: `Identifier[name='${name}']`, message: "src/core is pure: no host or DOM names." })),
      ],
    },
  },
  {
    files: ["src/sheet/**/*.ts"],
    rules: {
      "no-restricted-imports": ["error", { patterns: ["../pane/*", "../cli/*", "../../functions/*"] }],
    },
  },
);
