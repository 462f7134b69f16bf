// Mutation testing (issue 16): `npm run test:mutation` runs Stryker over the engine, the refrigerant physics,
// the service arithmetic, the units and the interview machine, then scripts/mutation-score.ts prints the
// score per area from the JSON report. Not part of `npm test`: it takes far longer.

// The areas, each run by itself when MUTATION_AREA names it (scripts/mutation.sh does, one after the other):
// each keeps its own incremental file and JSON report under reports/, so a rerun of one area, or of one file
// in it with --mutate, reuses every other result, and scripts/mutation-score.ts merges the reports.
const AREAS = {
  diagnosis: ["lib/diagnosis/**/*.ts"],
  refrigerants: ["lib/refrigerants/**/*.ts"],
  service: ["lib/service/**/*.ts"],
  units: ["lib/units/**/*.ts"],
  machines: ["machines/**/*.ts"],
};
const NOT_MUTATED = [
  "!**/*.test.ts",
  // helpers that only the tests use
  "!machines/interview-test-kit.ts",
  "!lib/diagnosis/fixtures/**",
  "!lib/diagnosis/test-inputs.ts",
];
const area = process.env.MUTATION_AREA || undefined;
if (area !== undefined && !(area in AREAS))
  throw new Error(`MUTATION_AREA=${area}: expected one of ${Object.keys(AREAS).join(", ")}`);
const reportName = area ?? "all";

/** @type {import("@stryker-mutator/api/core").PartialStrykerOptions} */
const config = {
  testRunner: "vitest",
  plugins: ["@stryker-mutator/vitest-runner"],
  vitest: { configFile: "vitest.mutation.config.mts" },
  coverageAnalysis: "perTest",
  // The machine is shared: one worker unless told otherwise (`-- --concurrency 2` on a quiet machine).
  concurrency: 1,
  mutate: area ? [...AREAS[area], ...NOT_MUTATED] : [...Object.values(AREAS).flat(), ...NOT_MUTATED],
  ignorePatterns: [
    ".data",
    ".next",
    "coverage",
    "test-results",
    "playwright-report",
    "blob-report",
    "reports",
  ],
  reporters: ["json", "progress", "clear-text"],
  jsonReporter: { fileName: `reports/mutation/${reportName}.json` },
  clearTextReporter: { allowColor: false, logTests: false, reportScoreTable: true, reportMutants: false },
  // Later runs retest only the mutants whose code or tests changed; `npm run test:mutation -- --force` retests all.
  incremental: true,
  incrementalFile: `reports/incremental/${reportName}.json`,
  // A mutant in code that runs when a module loads (the catalogues, unit tables, sources and the likelihood
  // table) cannot be traced to the tests that read it, so Stryker reruns the whole suite for each: about 1,000
  // of them, 98 % of the run, hours on this machine. They are reported as ignored, never as killed;
  // `npm run test:mutation -- --ignoreStatic false` runs them too.
  ignoreStatic: true,
  thresholds: { high: 90, low: 80, break: null },
  timeoutMS: 10000,
  tempDirName: ".stryker-tmp",
  cleanTempDir: "always",
};
export default config;
