// Mutation testing of the pure domain math: `npm run test:mutation` (not part of `npm test`).
// It runs the shared/ tests (vitest.shared.config.ts) against each mutant of shared/domain and
// fails below a score of 80 %. One worker, since the machine's two cores are shared.
/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  testRunner: 'vitest',
  vitest: { configFile: 'vitest.shared.config.ts' },
  mutate: ['shared/domain/**/*.ts', '!shared/domain/index.ts', '!shared/domain/types.ts'],
  // The sandbox needs only the domain, its tests and their configuration (not .data, dist…).
  ignorePatterns: [
    '/*',
    '!/shared',
    '!/tests',
    '/tests/*',
    '!/tests/shared',
    '!/package.json',
    '!/tsconfig.json',
    '!/vitest.shared.config.ts',
  ],
  concurrency: 1,
  reporters: ['clear-text', 'progress', 'html'],
  htmlReporter: { fileName: 'tests/.reports-mutation/index.html' },
  thresholds: { high: 90, low: 80, break: 80 },
  tempDirName: '.stryker-tmp',
};
