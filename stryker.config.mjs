// Mutation testing of the pure rules (npm run test:mutation). Not part of `npm test`: it takes minutes to hours.
// On a shared machine measure one slice at a time, each with its own incremental file and report:
//   STRYKER_SLICE=asme-ix npm run test:mutation      (slices below; then: node scripts/mutation-score.mjs)
const slices = {
  'asme-ix': ['shared/rules/asme-ix/**/*.ts'],
  'aws-d1.1': ['shared/rules/aws-d1.1/**/*.ts'],
  'aws-d1.3': ['shared/rules/aws-d1.3/**/*.ts'],
  'iso-9606-1': ['shared/rules/iso-9606-1/**/*.ts'],
  'iso-15614-1': ['shared/rules/iso-15614-1/**/*.ts'],
  'rules': ['shared/rules/*.ts'],
  'qualification': ['shared/qualification/**/*.ts'],
}
const slice = process.env.STRYKER_SLICE
if (slice && !slices[slice]) throw new Error(`STRYKER_SLICE must be one of ${Object.keys(slices).join(', ')}`)

/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  testRunner: 'vitest',
  vitest: { configFile: 'stryker.vitest.config.ts', related: false },
  plugins: ['@stryker-mutator/vitest-runner'],
  mutate: [...(slice ? slices[slice] : ['shared/rules/**/*.ts', 'shared/qualification/**/*.ts']), '!shared/rules/**/types.ts'],
  coverageAnalysis: 'perTest',
  // Static mutants (module-level tables) each need a full reload of every test: hours at concurrency 1.
  // They are reported as ignored; the tables are covered by the boundary and table tests instead.
  ignoreStatic: true,
  concurrency: 1,
  timeoutMS: 10000,
  // The first (dry) run of every rule test takes 2 minutes on a quiet machine and over 5 on a busy shared one.
  dryRunTimeoutMinutes: 30,
  incremental: true,
  incrementalFile: slice ? `reports/mutation/${slice}-incremental.json` : 'reports/mutation/stryker-incremental.json',
  reporters: ['clear-text', 'progress-append-only', 'html', 'json'],
  htmlReporter: { fileName: slice ? `reports/mutation/${slice}.html` : 'reports/mutation/index.html' },
  jsonReporter: { fileName: slice ? `reports/mutation/${slice}.json` : 'reports/mutation/mutation.json' },
  clearTextReporter: { allowColor: false, logTests: false, reportMutants: true, reportScoreTable: true },
  thresholds: { high: 90, low: 80, break: null },
  tempDirName: '.stryker-tmp',
  ignorePatterns: ['.nuxt*', '.output*', '.data*', 'e2e', 'tests/api', 'reports', 'test-results', 'playwright-report'],
}
