// computeDuePoint (shared/domain/due-point.ts) for season services: the date comes from the
// machine's season months (season-dates.ts), a meter interval may come first, and a machine
// without season months gives no season date. Dates worked by hand in the comments and checked
// against date-fns (CHECKS.md §3). The 21 / 14 day offsets and the two-week default warning are
// common practice, not published figures.
import { describe, expect, it } from 'vitest';
import { computeDuePoint, DEFAULT_SEASON_WARN_DAYS } from '../../shared/domain/due-point';
import { referenceAddDays, task } from './fixtures';
import { asOf, none, trend } from './due-point-rules-fixture';

const HARVEST = [8, 9, 10]; // a combine: August–October
// asOf is 2 Jun 2025. The 2025 season starts 1 Aug 2025; 21 days before: 31 Jul − 20 = 11 Jul.
const preSeason = (overrides: Parameters<typeof task>[0] = {}) =>
  task({ seasonAnchor: 'before_start', seasonOffsetDays: 21, ...overrides });

describe('due point — pre-season service, combine harvesting August–October', () => {
  it('due point — pre-season 21 days, done 10 Jul 2024 — due 11 Jul 2025, 39 days left, ok', () => {
    // 2 Jun → 2 Jul = 30 days (June has 30), → 11 Jul = 39 days.
    const due = computeDuePoint(
      preSeason({ lastDoneOn: '2024-07-10' }),
      none,
      asOf,
      null,
      null,
      HARVEST,
    );
    expect(due.dueDate).toBe('2025-07-11');
    expect(referenceAddDays('2025-08-01', -21)).toBe('2025-07-11');
    expect(due.remainingDays).toBe(39);
    expect(due.effectiveDate).toBe('2025-07-11');
    expect(due.governs).toBe('calendar');
    expect(due.status).toBe('ok');
    expect(due.basis).toBe('recorded');
    expect(due.season).toEqual({
      anchor: 'before_start',
      offsetDays: 21,
      seasonDate: '2025-08-01',
    });
  });

  it('due point — pre-season, 11 days before its date — due soon (default window two weeks)', () => {
    expect(DEFAULT_SEASON_WARN_DAYS).toBe(14);
    const due = computeDuePoint(
      preSeason({ lastDoneOn: '2024-07-10' }),
      none,
      '2025-06-30',
      null,
      null,
      HARVEST,
    );
    expect(due.remainingDays).toBe(11);
    expect(due.status).toBe('due_soon');
  });

  it('due point — pre-season, 15 Jul 2025 not yet done — overdue 4 days', () => {
    const due = computeDuePoint(
      preSeason({ lastDoneOn: '2024-07-10' }),
      none,
      '2025-07-15',
      null,
      null,
      HARVEST,
    );
    expect(due.remainingDays).toBe(-4);
    expect(due.status).toBe('overdue');
  });

  it('due point — pre-season with its own warning window of 30 days — due soon at 29 days', () => {
    const t = preSeason({ lastDoneOn: '2024-07-10', warnDays: 30 });
    expect(computeDuePoint(t, none, asOf, null, null, HARVEST).status).toBe('ok');
    expect(computeDuePoint(t, none, '2025-06-12', null, null, HARVEST).status).toBe('due_soon');
  });

  it('due point — pre-season with a 250 h interval, 150 h left at 5 h/day — the meter comes first', () => {
    // 1,000 h + 250 h = 1,250 h; 150 h / 5 h a day = 30 days → 2 Jul 2025, before 11 Jul.
    const due = computeDuePoint(
      preSeason({ intervalMeter: 250, lastDoneMeter: 1000, lastDoneOn: '2024-07-10' }),
      trend(1100, 5),
      asOf,
      1100,
      null,
      HARVEST,
    );
    expect(due.dueMeter).toBe(1250);
    expect(due.projectedDate).toBe('2025-07-02');
    expect(due.dueDate).toBe('2025-07-11');
    expect(due.governs).toBe('meter');
    expect(due.effectiveDate).toBe('2025-07-02');
    expect(due.status).toBe('ok');
  });

  it('due point — pre-season never done, first reading 10 Mar 2025 — the 2025 season: 11 Jul', () => {
    const due = computeDuePoint(preSeason(), none, asOf, null, '2025-03-10', HARVEST);
    expect(due.dueDate).toBe('2025-07-11');
    expect(due.basis).toBe('assumed');
  });

  it('due point — pre-season never done, no reading, asked on 20 Aug 2025 in season — 11 Jul 2026', () => {
    // Counted from today: the season under way began before it, so 1 Aug 2026 − 21 = 11 Jul 2026.
    const due = computeDuePoint(preSeason(), none, '2025-08-20', null, null, HARVEST);
    expect(due.dueDate).toBe('2026-07-11');
    expect(due.status).toBe('ok');
  });

  it('due point — pre-season counted from 20 Aug 2025 in place of a last service — 11 Jul 2026', () => {
    const due = computeDuePoint(
      preSeason({ countFromOn: '2025-08-20', countFromMeter: 900, historyUnknown: true }),
      none,
      '2025-08-25',
      null,
      '2024-01-01',
      HARVEST,
    );
    expect(due.dueDate).toBe('2026-07-11');
    expect(due.basis).toBe('counted');
  });

  it('due point — pre-season on a machine with an unknown history — history unknown, no date', () => {
    const due = computeDuePoint(
      preSeason({ historyUnknown: true }),
      none,
      asOf,
      null,
      null,
      HARVEST,
    );
    expect(due.status).toBe('history_unknown');
    expect(due.dueDate).toBeNull();
  });
});

describe('due point — storage service, 14 days after the season ends', () => {
  it('due point — storage, done 20 Nov 2024 — due 14 Nov 2025, 165 days left', () => {
    // The 2025 season ends 31 Oct; + 14 days = 14 Nov. From 2 Jun: 28 days to 30 Jun, then
    // 28 + 31 + 31 + 30 + 31 = 151 to 31 Oct, + 14 in November = 165.
    const due = computeDuePoint(
      task({ seasonAnchor: 'after_end', seasonOffsetDays: 14, lastDoneOn: '2024-11-20' }),
      none,
      asOf,
      null,
      null,
      HARVEST,
    );
    expect(due.dueDate).toBe('2025-11-14');
    expect(referenceAddDays(asOf, 165)).toBe('2025-11-14');
    expect(due.remainingDays).toBe(165);
    expect(due.season).toEqual({ anchor: 'after_end', offsetDays: 14, seasonDate: '2025-10-31' });
  });
});

describe('due point — season service on a machine with no season months (all year)', () => {
  it('due point — no season months, no meter interval — no forecast, seasonDate null', () => {
    const due = computeDuePoint(preSeason({ lastDoneOn: '2024-07-10' }), none, asOf, null, null);
    expect(due.status).toBe('no_forecast');
    expect(due.dueDate).toBeNull();
    expect(due.effectiveDate).toBeNull();
    expect(due.season).toEqual({ anchor: 'before_start', offsetDays: 21, seasonDate: null });
  });

  it('due point — no season months, 250 h interval at 5 h/day — dated by the meter alone', () => {
    const due = computeDuePoint(
      preSeason({ intervalMeter: 250, lastDoneMeter: 1000, lastDoneOn: '2024-07-10' }),
      trend(1100, 5),
      asOf,
      1100,
      null,
      [],
    );
    expect(due.dueDate).toBeNull();
    expect(due.governs).toBe('meter');
    expect(due.effectiveDate).toBe('2025-07-02');
    expect(due.status).toBe('ok');
    expect(due.season?.seasonDate).toBeNull();
  });

  it('due point — an ordinary task — carries no season', () => {
    const due = computeDuePoint(
      task({ intervalDays: 365, lastDoneOn: '2024-07-10' }),
      none,
      asOf,
      null,
      null,
      HARVEST,
    );
    expect(due.dueDate).toBe('2025-07-10');
    expect('season' in due).toBe(false);
  });
});
