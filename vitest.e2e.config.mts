import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

// End-to-end tests: headless Chromium (playwright-core) against the app that
// scripts/test.sh built and started. They run in Node, one file at a time.
export default defineConfig({
  resolve: { alias: { "@": fileURLToPath(new URL("./", import.meta.url)) } },
  test: {
    environment: "node",
    include: ["tests/e2e/**/*.test.ts"],
    fileParallelism: false,
    testTimeout: 60000,
    hookTimeout: 60000,
  },
});
