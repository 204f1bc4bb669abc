import { defineConfig } from "vitest/config";
import path from "node:path";

// The fast unit tests that cover calc/, lib/ and db/policy.ts, for Stryker's mutation run
// (`npm run test:mutation`). No database, no browser: each mutant reruns only the tests that
// reached it, so this list must stay quick. `npm test` keeps using vitest.config.ts.
export default defineConfig({
  resolve: { alias: { "@": path.resolve(import.meta.dirname), "server-only": path.resolve(import.meta.dirname, "tests/support/server-only-stub.ts") } },
  test: {
    include: ["tests/calc/**/*.test.ts", "tests/lib/**/*.test.ts", "tests/db/policy.test.ts"],
    environment: "node",
    setupFiles: ["tests/support/mutation-setup.ts"],
    testTimeout: 30_000,
    // One module graph for all test files: each mutant's rerun then imports calc/ and zod once,
    // not once per file (a rerun of tests/calc: 16 s isolated, 4 s shared). Safe here because
    // Stryker switches mutants at run time and these tests keep no state between files.
    isolate: false,
  },
});
