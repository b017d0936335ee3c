// The words of a season service's due (shared/domain/due-words.ts), as the machine page and the
// due list say them; dates in the English test format ("1 Aug 2026").
import { describe, expect, it } from 'vitest';
import {
  SEASON_MONTHS_MISSING,
  seasonDueText,
  seasonTimingText,
} from '../../shared/domain/due-words';

describe('season due words', () => {
  it('season timing — 21 days before, 1 day after, 0 days — said with the right words', () => {
    expect(seasonTimingText('before_start', 21)).toBe('21 days before the season starts');
    expect(seasonTimingText('after_end', 1)).toBe('1 day after the season ends');
    expect(seasonTimingText('before_start', 0)).toBe('when the season starts');
  });

  it('season due — 14 days before a start on 1 Aug 2026 — with the date of the start', () => {
    expect(
      seasonDueText({ anchor: 'before_start', offsetDays: 14, seasonDate: '2026-08-01' }),
    ).toBe('14 days before the season starts on 1 Aug 2026');
    expect(seasonDueText({ anchor: 'after_end', offsetDays: 14, seasonDate: '2026-10-31' })).toBe(
      '14 days after the season ends on 31 Oct 2026',
    );
  });

  it('season due — a machine without season months — says to set them', () => {
    expect(seasonDueText({ anchor: 'after_end', offsetDays: 7, seasonDate: null })).toBe(
      SEASON_MONTHS_MISSING,
    );
    expect(SEASON_MONTHS_MISSING).toBe("set the machine's season months");
  });
});
