// Lint for every TypeScript and JavaScript file of the project (npm run lint; part of npm test).
import js from "@eslint/js";
import tseslint from "typescript-eslint";

const node = { console: "readonly", process: "readonly", Buffer: "readonly", require: "readonly", module: "writable", __dirname: "readonly", __filename: "readonly", globalThis: "readonly", setTimeout: "readonly", clearTimeout: "readonly", URL: "readonly" };
const browser = { window: "readonly", document: "readonly", setTimeout: "readonly", clearTimeout: "readonly", console: "readonly", globalThis: "readonly", Promise: "readonly" };

export default tseslint.config(
  { ignores: ["dist/**", "node_modules/**", "coverage/**", "bench/.out/**"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: node },
    rules: { "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", caughtErrors: "none" }] },
  },
  {
    // Worksheet wrappers: Excel passes every argument as a matrix of any (custom-functions-metadata
    // reads `any[][]` as a range of any type), and each wrapper hands its `arguments` to its
    // declaration in one call, so the named parameters (functions.json's names) are read only there.
    files: ["src/functions/*.ts"],
    rules: { "@typescript-eslint/no-explicit-any": "off", "@typescript-eslint/no-unused-vars": ["error", { args: "none" }], "prefer-rest-params": "off" },
  },
  {
    // CommonJS: build configuration, scripts and the CLI entry.
    files: ["**/*.cjs", "webpack.config.js", "bin/*.js"],
    rules: { "@typescript-eslint/no-require-imports": "off" },
  },
  {
    // Scripts that run in a page (the Office.js stand-in of the browser tests).
    files: ["test/browser/*.js"],
    languageOptions: { globals: browser },
    rules: { "@typescript-eslint/no-this-alias": "off" },
  },
  {
    // Node scripts that also hand functions to a page (playwright's page.evaluate).
    files: ["scripts/make-icons.mjs", "scripts/screenshots.ts", "test/browser/*.ts"],
    languageOptions: { globals: { ...node, ...browser } },
  },
  {
    // Test doubles and the engine plugin reach into untyped internals (HyperFormula's AST and
    // interpreter, office-addin-mock's objects); `any` marks those seams.
    files: ["test/**/*.ts", "src/runner/engine.ts"],
    rules: { "@typescript-eslint/no-explicit-any": "off" },
  },
  {
    // A test that rethrows names the failing function in its own message; the ES2020 library the
    // project compiles against has no Error cause option.
    // Reference values are written with every digit their source prints, even past float64's.
    files: ["test/**/*.ts"],
    rules: { "preserve-caught-error": "off", "no-loss-of-precision": "off" },
  },
);
