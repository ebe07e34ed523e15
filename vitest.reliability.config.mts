import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

// `npm run test:crash`: the crash-safety test (tests/reliability), which provisions its own
// durable PostgreSQL cluster and production server and kills them. About ten minutes, so it is not
// part of `npm test`.
export default defineConfig({
  resolve: {
    alias: {
      "@": fileURLToPath(new URL("./", import.meta.url)),
      "server-only": fileURLToPath(new URL("./tests/support/empty-module.ts", import.meta.url)),
    },
  },
  test: {
    environment: "node",
    include: ["tests/reliability/**/*.test.ts"],
    fileParallelism: false,
    testTimeout: 20 * 60_000,
    hookTimeout: 15 * 60_000,
  },
});
