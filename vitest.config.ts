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
  },
});
