// @ts-nocheck
import { defineConfig } from "vitest/config";
import path from "node:path";

// HTTP and browser tests against the built app that scripts/test.ts serves (BASE_URL).
// One file at a time: they share the server, the database and the two cores of this machine.
export default defineConfig({
  resolve: { alias: { "@": path.resolve(import.meta.dirname), "server-only": path.resolve(import.meta.dirname, "tests/support/server-only-stub.ts") } },
  test: {
    include: ["tests/e2e/**/*.test.ts"],
    environment: "node",
    testTimeout: 90_000,
    hookTimeout: 90_000,
    fileParallelism: false,
  },
});
