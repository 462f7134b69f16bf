import { defineConfig } from "vitest/config";
import base from "./vitest.config.mts";

// The tests Stryker runs against each mutant (stryker.config.mjs): the pure unit tests only. The integration
// project is left out because it starts a database; tests/unit is left out because it lints and scans the
// tree and covers none of the mutated code.
export default defineConfig({
  resolve: base.resolve,
  test: {
    include: ["lib/**/*.test.ts", "machines/**/*.test.ts", "data/**/*.test.ts", "components/**/*.test.ts"],
    environment: "node",
    // Each mutant reruns every property that reaches it: 100 inputs each instead of up to 3,000
    // (tests/support/property-runs.ts). `npm test` still runs the full counts.
    env: { MUTATION_PROPERTY_RUNS: "100" },
    setupFiles: ["tests/support/mutation-setup.ts"],
    // The machine is shared and Stryker times each mutant itself (timeoutMS in stryker.config.mjs).
    testTimeout: 60000,
  },
});
