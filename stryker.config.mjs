// Mutation testing of the pure rules (npm run test:mutation). Not part of `npm test`: it takes minutes.
// Measure one folder: npx stryker run --mutate 'shared/rules/asme-ix/**/*.ts'
/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  testRunner: 'vitest',
  vitest: { configFile: 'stryker.vitest.config.ts', related: false },
  plugins: ['@stryker-mutator/vitest-runner'],
  mutate: ['shared/rules/**/*.ts', 'shared/qualification/**/*.ts', '!shared/rules/**/types.ts'],
  coverageAnalysis: 'perTest',
  // Static mutants (module-level tables) each need a full reload of every test: hours at concurrency 1.
  // They are reported as ignored; the tables are covered by the boundary and table tests instead.
  ignoreStatic: true,
  concurrency: 1,
  timeoutMS: 10000,
  incremental: true,
  incrementalFile: 'reports/mutation/stryker-incremental.json',
  reporters: ['clear-text', 'progress-append-only', 'html', 'json'],
  htmlReporter: { fileName: 'reports/mutation/index.html' },
  jsonReporter: { fileName: 'reports/mutation/mutation.json' },
  clearTextReporter: { allowColor: false, logTests: false, reportMutants: true, reportScoreTable: true },
  thresholds: { high: 90, low: 80, break: null },
  tempDirName: '.stryker-tmp',
  ignorePatterns: ['.nuxt*', '.output*', '.data*', 'e2e', 'tests/api', 'reports', 'test-results', 'playwright-report'],
}
