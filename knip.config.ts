import type { KnipConfig } from "knip";

// knip finds unused files, exports and dependencies; `npm test` fails on any finding.
const config: KnipConfig = {
  entry: [
    "scripts/*.{ts,mjs}",
    "scripts/support/*.ts",
    "tests/**/*.test.{ts,tsx}",
    "tests/support/reset-and-seed.ts",
    "tests/support/empty-module.ts",
    "vitest.e2e.config.mts",
    // The finder, load and upload benches run in child processes (bench/finder.ts, bench/load.ts); the
    // profiler is run by hand.
    "bench/finder-run.ts",
    "bench/finder-profile.ts",
    "bench/load-run.ts",
    "bench/upload-run.ts",
    // The engine's public API (docs/architecture.md, "The computation contract").
    "lib/chem/index.ts",
    // The trace parser's public API, wired into the upload route and trace block by main.
    "lib/traces/index.ts",
  ],
  project: ["**/*.{ts,tsx,mts,mjs}"],
  ignoreExportsUsedInFile: false,
  ignoreDependencies: [
    // Pinned to the same version as @tiptap/react, which would otherwise pull a newer one
    // that does not resolve against the rest of tiptap 3.31.
    "@tiptap/extension-bubble-menu",
    "@tiptap/extension-floating-menu",
  ],
};

export default config;
