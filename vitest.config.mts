import { defineConfig } from "vitest/config";
import react from "@vitejs/plugin-react";
import { fileURLToPath } from "node:url";

// Unit, component and integration tests. End-to-end tests have their own config
// (vitest.e2e.config.mts) because they need a built, running app; so does the crash-safety
// test (vitest.reliability.config.mts, `npm run test:crash`), which starts its own.
export default defineConfig({
  plugins: [react()],
  resolve: {
    alias: {
      "@": fileURLToPath(new URL("./", import.meta.url)),
      // `server-only` throws outside a React Server Components bundle; tests are not one.
      "server-only": fileURLToPath(new URL("./tests/support/empty-module.ts", import.meta.url)),
    },
  },
  test: {
    environment: "jsdom",
    include: ["tests/**/*.test.{ts,tsx}"],
    exclude: ["tests/e2e/**", "tests/reliability/**", "node_modules/**"],
    setupFiles: ["./tests/setup.ts"],
    // Integration tests share one database: run files one at a time, tests in order.
    fileParallelism: false,
    // next-auth imports "next/server" without an extension; let Vite resolve it.
    server: { deps: { inline: ["next-auth"] } },
    testTimeout: 20000,
    hookTimeout: 60000,
  },
});
