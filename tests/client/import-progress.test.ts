// The import page's progress step (src/features/readings/components/import-progress.tsx): the
// share sent follows the upload's progress events; the moment the last byte goes is kept once, so
// the seconds waited for the server count from then. Hand-worked sequence: 0 → 0.5 → 1 → 1.
import { afterEach, describe, expect, it, vi } from 'vitest';
import {
  progressed,
  type ImportStage,
} from '../../src/features/readings/components/import-progress';

const start: ImportStage = { step: 'import', fileName: 'readings.csv', sent: 0, sentAt: null };

describe('import progress', () => {
  afterEach(() => vi.useRealTimers());

  it('import progress — half sent has no end time; all sent keeps the first end time', () => {
    vi.useFakeTimers({ now: 1_000 });
    const half = progressed(start, 0.5)!;
    expect(half).toEqual({ ...start, sent: 0.5, sentAt: null });
    const done = progressed(half, 1)!;
    expect(done.sentAt).toBe(1_000);
    vi.setSystemTime(5_000);
    // a second "all sent" event (upload load after the last progress event) keeps the first time
    expect(progressed(done, 1)!.sentAt).toBe(1_000);
  });

  it('import progress — no stage (the call already answered) stays none', () => {
    expect(progressed(null, 0.7)).toBeNull();
  });
});
