import { defineConfig } from "vitest/config";

export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    include: ["tests/**/*.test.{ts,tsx}"],
    exclude: ["tests/e2e/**", "node_modules/**"],
    environment: "node",
    setupFiles: ["tests/setup/guard.ts"],
    testTimeout: 30_000,
    hookTimeout: 60_000,
    // Integration tests share one test database; files run in parallel, tests in a file in order.
    pool: "forks",
    // next-auth imports "next/server" without an extension, which Node's ESM loader refuses; let
    // Vite resolve it, so tests can import code that sits beside the session (lib/auth).
    server: { deps: { inline: ["next-auth"] } },
  },
});
