// @ts-nocheck
import { defineConfig } from "vitest/config";
import path from "node:path";

// Unit, property and database integration tests. Browser and HTTP tests live in
// tests/e2e and run from vitest.e2e.config.ts once the app is built and serving.
export default defineConfig({
  resolve: { alias: { "@": path.resolve(import.meta.dirname) , "server-only": path.resolve(import.meta.dirname, "tests/support/server-only-stub.ts") } },
  test: {
    include: ["tests/**/*.test.ts"],
    exclude: ["tests/e2e/**", "node_modules/**"],
    environment: "node",
    testTimeout: 30_000,
    hookTimeout: 60_000,
    fileParallelism: true,
  },
});
