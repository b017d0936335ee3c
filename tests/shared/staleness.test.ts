// Stale meters by the hours that may have gone unrecorded (shared/domain/staleness.ts), on the
// cases the rule was written for. Provenance: derived — the arithmetic is in each test; the
// thresholds (5 % of the shortest meter interval, two and sixty days, 14 days without a pace) are
// the method's choices (common practice), not published figures.
import { describe, expect, it } from 'vitest';
import { isStaleMeter, staleThreshold, unrecordedUse } from '../../shared/domain/staleness';

describe('stale meters — hours at risk, not days alone', () => {
  // A combine in harvest: 10 h/day; its shortest interval 250 h → threshold 12.5 h.
  const combine = { ratePerDay: 10, shortestInterval: 250, inSeason: true };
  // A tractor in winter: half an hour a day, the same 250 h interval.
  const tractor = { ratePerDay: 0.5, shortestInterval: 250, inSeason: false };

  it('staleThreshold — 5 % of a 250 h interval is 12.5 h; without an interval, 10 units', () => {
    expect(staleThreshold(250)).toBe(12.5);
    expect(staleThreshold(null)).toBe(10);
  });

  it('combine in harvest — two days unread is 20 h at risk: stale', () => {
    expect(unrecordedUse(2, 10)).toBe(20);
    expect(isStaleMeter({ ...combine, daysSince: 2 })).toBe(true);
  });

  it('combine in harvest — read yesterday: never stale within two days', () => {
    expect(isStaleMeter({ ...combine, daysSince: 1 })).toBe(false);
  });

  it('tractor in winter — twenty days unread is 10 h at risk, under 12.5: not stale', () => {
    expect(unrecordedUse(20, 0.5)).toBe(10);
    expect(isStaleMeter({ ...tractor, daysSince: 20 })).toBe(false);
  });

  it('tractor in winter — thirty days is 15 h at risk: stale', () => {
    expect(isStaleMeter({ ...tractor, daysSince: 30 })).toBe(true);
  });

  it('an idle machine in season — stale after 60 days whatever its pace says', () => {
    const idle = { ratePerDay: 0, shortestInterval: 250, inSeason: true };
    expect(isStaleMeter({ ...idle, daysSince: 59 })).toBe(false);
    expect(isStaleMeter({ ...idle, daysSince: 60 })).toBe(true);
    expect(isStaleMeter({ ...idle, daysSince: 90, inSeason: false })).toBe(false);
  });

  it('no pace yet (one reading) — by days: 14 in season, never out of it', () => {
    const young = { ratePerDay: null, shortestInterval: 250 };
    expect(isStaleMeter({ ...young, inSeason: true, daysSince: 13 })).toBe(false);
    expect(isStaleMeter({ ...young, inSeason: true, daysSince: 14 })).toBe(true);
    expect(isStaleMeter({ ...young, inSeason: false, daysSince: 40 })).toBe(false);
  });

  it('never read — stale in season, not out of it', () => {
    expect(isStaleMeter({ ...combine, daysSince: null })).toBe(true);
    expect(isStaleMeter({ ...tractor, daysSince: null })).toBe(false);
  });
});
