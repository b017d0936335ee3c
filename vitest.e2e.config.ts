import { BaseSequencer, type TestSpecification } from 'vitest/node';
import { defineConfig } from 'vitest/config';

/**
 * Files that read the shared demo as every other file leaves it. The screens test checks that the
 * boards fit their screen; run last, it sees the rows every other browser test adds to the demo
 * (a machine without readings, long names), as CI's order happened to, instead of depending on it.
 */
const LAST = ['screens-fit.e2e.ts'];

class DemoReadersLast extends BaseSequencer {
  override async sort(files: TestSpecification[]) {
    const sorted = await super.sort(files);
    const isLast = (f: TestSpecification) => LAST.some((name) => f.moduleId.endsWith(name));
    return [...sorted.filter((f) => !isLast(f)), ...sorted.filter(isLast)];
  }
}

// Browser tests: chromium against the built app served by the API (see scripts/test.mjs).
export default defineConfig({
  test: {
    include: ['tests/e2e/**/*.e2e.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 60000,
    hookTimeout: 60000,
    sequence: { sequencer: DemoReadersLast },
  },
});
