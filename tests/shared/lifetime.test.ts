import { describe, expect, it } from 'vitest';
import { lifetimeOffset, toLifetimeValue, toRawValue } from '../../shared/domain/lifetime';

const t = (iso: string) => Date.parse(iso);
// Meter swapped twice: at 3,000 h for a new one from 0, and at 1,200 h on that for one from 5 h.
const replacements = [
  { replacedAtMs: t('2025-06-01T00:00:00Z'), oldFinalValue: 1200, newStartValue: 5 },
  { replacedAtMs: t('2024-03-01T00:00:00Z'), oldFinalValue: 3000, newStartValue: 0 },
];

describe('lifetime values', () => {
  it('lifetime — before any replacement — raw value unchanged', () => {
    expect(toLifetimeValue(2950, t('2024-02-01T00:00:00Z'), replacements)).toBe(2950);
  });

  it('lifetime — after the first replacement — raw + 3,000', () => {
    expect(toLifetimeValue(40, t('2024-04-01T00:00:00Z'), replacements)).toBe(3040);
  });

  it('lifetime — after both (in any order) — raw + 3,000 + 1,195', () => {
    expect(lifetimeOffset(t('2025-07-01T00:00:00Z'), replacements)).toBe(4195);
    expect(toLifetimeValue(15, t('2025-07-01T00:00:00Z'), replacements)).toBe(4210);
  });

  it('lifetime — a reading at the very instant of a swap is on the new meter', () => {
    expect(toLifetimeValue(0, t('2024-03-01T00:00:00Z'), replacements)).toBe(3000);
  });

  it('lifetime — toRawValue inverts toLifetimeValue', () => {
    for (const iso of ['2024-01-01T00:00:00Z', '2024-05-01T00:00:00Z', '2025-08-01T00:00:00Z']) {
      expect(
        toRawValue(toLifetimeValue(123.4, t(iso), replacements), t(iso), replacements),
      ).toBeCloseTo(123.4, 9);
    }
  });
});
