// ESLint is house law: `npm test` fails on any finding, `npm run lint` fixes what it can.
// Besides the usual TypeScript, React and Next.js rules it enforces the architecture's import
// rules (docs/architecture.md, "Layers") with eslint-plugin-boundaries.
import nextPlugin from "@next/eslint-plugin-next";
import boundaries from "eslint-plugin-boundaries";
import drizzle from "eslint-plugin-drizzle";
import reactHooks from "eslint-plugin-react-hooks";
import tseslint from "typescript-eslint";

/** Where each layer lives. The first matching pattern wins, so narrow ones come first. */
const ELEMENTS = [
  { type: "chem", pattern: "lib/chem/**", partialMatch: false },
  { type: "document", pattern: "lib/document/**", partialMatch: false },
  { type: "traces", pattern: "lib/traces/**", partialMatch: false },
  // Pure modules both the browser and the server use: shapes, rules, validation, UI helpers.
  {
    type: "shared",
    partialMatch: false,
    pattern: ["lib/{contract,rules,errors,ui,validation,shell}/**"],
  },
  { type: "server", pattern: "lib/**", partialMatch: false },
  { type: "db", pattern: "db/**", partialMatch: false },
  { type: "app", pattern: "app/**", partialMatch: false },
  { type: "components", pattern: "components/**", partialMatch: false },
  { type: "editor", pattern: "editor/**", partialMatch: false },
  { type: "scripts", pattern: "scripts/**", partialMatch: false },
  { type: "bench", pattern: "bench/**", partialMatch: false },
  { type: "tests", pattern: "tests/**", partialMatch: false },
  { type: "root", pattern: "*.{ts,mts,mjs}", partialMatch: false },
];

/** Which layer may import which (everything not listed is refused). */
const IMPORT_POLICIES = [
  // lib/chem imports nothing of ours; db/ imports nothing of ours.
  { from: ["chem"], allow: ["chem"] },
  { from: ["db"], allow: ["db"] },
  { from: ["document"], allow: ["document", "chem", "shared"] },
  { from: ["traces"], allow: ["traces", "chem"] },
  // The shared vocabulary re-exports the database's value lists (pure constants).
  { from: ["shared"], allow: ["shared", "chem", "document", "traces", "db"] },
  { from: ["server"], allow: ["server", "shared", "document", "chem", "traces", "db"] },
  // Client code never reaches db/ or server-only modules.
  { from: ["components"], allow: ["components", "editor", "shared", "document", "chem", "traces"] },
  { from: ["editor"], allow: ["editor", "components", "shared", "document", "chem", "traces"] },
  {
    from: ["app"],
    allow: ["app", "components", "editor", "server", "shared", "document", "chem", "traces"],
  },
  { from: ["root"], allow: ["server", "shared"] },
  // Scripts and benches may use the whole app, never the tests.
  {
    from: ["scripts", "bench"],
    allow: ["scripts", "bench", "server", "shared", "document", "chem", "traces", "db"],
  },
  {
    from: ["tests"],
    allow: [
      "tests",
      "app",
      "components",
      "editor",
      "server",
      "shared",
      "document",
      "chem",
      "traces",
      "db",
      "scripts",
    ],
  },
];

export default tseslint.config(
  {
    ignores: [
      "node_modules/**",
      ".next/**",
      ".next-test/**",
      ".data/**",
      ".test-data/**",
      "uploads/**",
      "drizzle/**",
      "coverage/**",
      "next-env.d.ts",
      "tests/fixtures/lint/**",
    ],
  },
  ...tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
    },
    plugins: {
      "@next/next": nextPlugin,
      "react-hooks": reactHooks,
      drizzle,
      boundaries,
    },
    settings: {
      "boundaries/elements": ELEMENTS,
      "boundaries/include": ["**/*.{ts,tsx,mts,mjs}"],
      "import/resolver": { typescript: { alwaysTryTypes: true, project: "./tsconfig.json" } },
    },
    rules: {
      ...nextPlugin.configs.recommended.rules,
      ...nextPlugin.configs["core-web-vitals"].rules,
      "react-hooks/rules-of-hooks": "error",
      "react-hooks/exhaustive-deps": "error",
      "@typescript-eslint/no-floating-promises": "error",
      "@typescript-eslint/no-misused-promises": [
        "error",
        { checksVoidReturn: { attributes: false } },
      ],
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", ignoreRestSiblings: true },
      ],
      "@typescript-eslint/consistent-type-imports": [
        "error",
        { prefer: "type-imports", fixStyle: "inline-type-imports" },
      ],
      // A Drizzle update or delete without where() would touch every row of a table.
      "drizzle/enforce-delete-with-where": [
        "error",
        { drizzleObjectName: ["db", "tx", "executor"] },
      ],
      "drizzle/enforce-update-with-where": [
        "error",
        { drizzleObjectName: ["db", "tx", "executor"] },
      ],
      "boundaries/dependencies": [
        "error",
        {
          default: "disallow",
          policies: IMPORT_POLICIES.map(({ from, allow }) => ({
            from: from.map((type) => ({ element: { type } })),
            allow: allow.map((type) => ({ to: { element: { type } } })),
          })),
          message:
            "{{from.element.type}} may not import {{to.element.type}} (docs/architecture.md, Layers).",
        },
      ],
      eqeqeq: ["error", "smart"],
      "no-console": ["error", { allow: ["warn", "error"] }],
    },
  },
  {
    // lib/chem runs in the browser and on the server: no framework, no Node, no database.
    files: ["lib/chem/**", "lib/document/**"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              group: ["react", "react-dom", "react/*", "next", "next/*"],
              message: "Keep this module framework-free.",
            },
            {
              group: ["node:*", "fs", "path", "crypto", "os", "stream"],
              message: "No Node-only APIs here (it runs in the browser).",
            },
            {
              group: ["pg", "drizzle-orm", "drizzle-orm/*", "server-only"],
              message: "No database here.",
            },
          ],
        },
      ],
    },
  },
  {
    // Scripts, benches and tests print what they do.
    files: ["scripts/**", "bench/**", "tests/**"],
    rules: { "no-console": "off" },
  },
  {
    // Tests read untyped JSON bodies and use matchers such as expect.any(), typed `any`.
    files: ["tests/**"],
    rules: {
      "@typescript-eslint/no-unsafe-assignment": "off",
      "@typescript-eslint/no-unsafe-member-access": "off",
      "@typescript-eslint/no-unsafe-return": "off",
      "@typescript-eslint/no-unsafe-argument": "off",
      "@typescript-eslint/no-unsafe-call": "off",
    },
  },
  {
    files: ["**/*.mjs"],
    ...tseslint.configs.disableTypeChecked,
  },
);
