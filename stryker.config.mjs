// Mutation testing of the engine (README, "Mutation testing"): `npm run test:mutation`, then
// `npm run test:mutation:check` to compare the run with the figures the README states.
/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
const config = {
  mutate: ["physics/**/*.ts", "!physics/examples/**"],
  testRunner: "vitest",
  // The unit project narrowed to tests/unit/physics (vitest.mutation.config.mts).
  vitest: { configFile: "vitest.mutation.config.mts", related: false },
  checkers: ["typescript"],
  tsconfigFile: "tsconfig.stryker.json",
  coverageAnalysis: "perTest",
  // One type checker and one test runner, a core each (the README's run time was measured so).
  concurrency: 2,
  timeoutMS: 20000,
  // Code that runs at import (the input schema's definitions, module constants) is covered by no single test, so
  // each such mutant would need the whole suite rerun with a fresh module cache: ignored, and counted as ignored.
  ignoreStatic: true,
  // Reuses the last run's result for a mutant whose code and covering tests are unchanged; --force runs them all.
  incremental: true,
  incrementalFile: ".data/mutation/incremental.json",
  reporters: ["progress", "clear-text", "html", "json"],
  htmlReporter: { fileName: ".data/mutation/mutation.html" },
  jsonReporter: { fileName: ".data/mutation/mutation.json" },
  tempDirName: ".data/stryker-tmp",
  cleanTempDir: true,
  ignorePatterns: [".next", ".next-test", ".data", ".pgdata", "test-results", "playwright-report"],
};

export default config;
