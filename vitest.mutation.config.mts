import { defineConfig } from "vitest/config";
import base from "./vitest.config.mts";

// The tests Stryker runs against each mutant (stryker.config.mjs): the unit tests of the mutated areas themselves.
// Each area is scored on what its own tests catch; tests elsewhere (the interview, the spec import, components)
// reach the same code through many files, and loading them for every mutant made a run take hours on a shared
// machine. The integration tests start a database and tests/unit lints and scans the tree: neither belongs here.
export default defineConfig({
  resolve: base.resolve,
  test: {
    include: [
      "lib/diagnosis/**/*.test.ts",
      "lib/refrigerants/**/*.test.ts",
      "lib/service/**/*.test.ts",
      "lib/units/**/*.test.ts",
      "machines/**/*.test.ts",
    ],
    environment: "node",
    // Each mutant reruns every property that reaches it: 50 inputs each instead of up to 3,000
    // (tests/support/property-runs.ts). `npm test` still runs the full counts.
    env: { MUTATION_PROPERTY_RUNS: "50" },
    setupFiles: ["tests/support/mutation-setup.ts"],
    // The machine is shared and Stryker times each mutant itself (timeoutMS in stryker.config.mjs).
    testTimeout: 60000,
  },
});
