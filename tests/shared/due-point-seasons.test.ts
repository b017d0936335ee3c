// Due points through daylight-saving changes, a seasonal combine and a busy week: hand-worked
// examples, calendar arithmetic checked against date-fns (CHECKS.md §3: the reference library).
import { TZDate } from '@date-fns/tz';
import { describe, expect, it } from 'vitest';
import {
  addDaysIso,
  dayNumberFromIso,
  daysBetweenIso,
  localDayNumber,
} from '../../shared/domain/calendar';
import { computeDuePoint } from '../../shared/domain/due-point';
import { estimateUsage } from '../../shared/domain/usage';
import { inHarvest, readingsFrom, referenceAddDays, seasonalReadings, task } from './fixtures';

/** The instant of 07:00 local time on an ISO date in a zone (via the reference library). */
function sevenAm(iso: string, zone: string): Date {
  const [y, m, d] = iso.split('-').map(Number);
  return new Date(new TZDate(y, m - 1, d, 7, 0, 0, zone).getTime());
}

describe('due point — daily readings at 07:00 local across DST changes, 8 h/day', () => {
  const changes = [
    { zone: 'America/Chicago', change: '2026-03-08' },
    { zone: 'America/Chicago', change: '2026-11-01' },
    { zone: 'Europe/Dublin', change: '2026-03-29' },
    { zone: 'Europe/Dublin', change: '2026-10-25' },
  ];
  for (const { zone, change } of changes) {
    it(`due point — ${zone}, DST change ${change} — rate exactly 8 h/day, dates not shifted`, () => {
      const start = addDaysIso(change, -10);
      const readings = Array.from({ length: 21 }, (_, i) => ({
        day: localDayNumber(sevenAm(addDaysIso(start, i), zone), zone),
        value: 1000 + 8 * i,
      }));
      // The day ending at 07:00 on the change date really is 23 h (spring) or 25 h (autumn) long.
      const hoursBefore =
        (sevenAm(change, zone).getTime() - sevenAm(addDaysIso(change, -1), zone).getTime()) /
        3_600_000;
      expect(hoursBefore).toBe(change.slice(5, 7) === '03' ? 23 : 25);
      for (const r of readings) expect(r.day - Math.floor(r.day)).toBeCloseTo(7 / 24, 10);

      const asOfIso = addDaysIso(start, 20);
      const usage = estimateUsage(readings, localDayNumber(sevenAm(asOfIso, zone), zone));
      expect(usage.rate).toBeCloseTo(8, 9);
      expect(usage.low).toBeCloseTo(8, 9);
      expect(usage.high).toBeCloseTo(8, 9);

      // Done at 1,000 h at 07:00 on the start day: 250 h / 8 = 31.25 days → 13:00 on day 31.
      const t = task({
        intervalMeter: 250,
        intervalDays: 30,
        lastDoneMeter: 1000,
        lastDoneOn: start,
      });
      const due = computeDuePoint(t, usage, asOfIso, 1160);
      expect(due.dueDate).toBe(referenceAddDays(start, 30));
      expect(due.projectedDate).toBe(referenceAddDays(start, 31));
      expect(due.remainingDays).toBe(10);
      expect(due.governs).toBe('calendar');
      expect(due.status).toBe('ok');
    });
  }
});

describe('due point — seasonal combine, used August–October only', () => {
  // Two harvests of 92 days at 4 h/day from 1,500 h: 2,236 h at the last reading (2026-05-04).
  const readings = seasonalReadings('2024-05-06', '2026-05-04', 7, 1500, (d) =>
    inHarvest(d) ? 4 : 0,
  );
  const asOfIso = '2026-05-10';
  const asOfDay = dayNumberFromIso(asOfIso);
  // Done at 2,100 h after last harvest: due 2,350 h, 114 h of harvest away (28.5 days from Aug 1).
  const t = task({
    intervalMeter: 250,
    intervalDays: 365,
    lastDoneMeter: 2100,
    lastDoneOn: '2025-10-31',
  });

  it('due point — combine idle all spring, asOf in May — projected late August, with the season start spread', () => {
    expect(readings[readings.length - 1].value).toBe(2236);
    const usage = estimateUsage(readings, asOfDay);
    expect(usage.method).toBe('season');
    const due = computeDuePoint(t, usage, asOfIso, 2236);
    // Hand-worked: 114 h at last year's 4 h/day from its 1 August start is 28.5 days → 29–30 Aug;
    // shifts and paces are spread evenly about last year's, so the median stays about there.
    expect(due.projectedDate! >= '2026-08-27' && due.projectedDate! <= '2026-09-02').toBe(true);
    // Nothing this spring says when harvest starts: the range carries the start spread (14 days
    // sd with one past year, about ±18 days at the 10th/90th percentiles) and the pace spread.
    expect(due.projectedLow! >= '2026-08-01' && due.projectedLow! <= '2026-08-20').toBe(true);
    expect(due.projectedHigh! >= '2026-09-10' && due.projectedHigh! <= '2026-10-10').toBe(true);
    expect(due.governs).toBe('meter');
    expect(due.dueDate).toBe('2026-10-31');
    expect(due.status).toBe('ok');
  });

  it('due point — the same combine by trend alone — rate 0, no date (what the season method fixes)', () => {
    const usage = estimateUsage(readings, asOfDay, { method: 'trend' });
    expect(usage.rate).toBe(0);
    const due = computeDuePoint({ ...t, intervalDays: null }, usage, asOfIso, 2236);
    expect(due.projectedDate).toBeNull();
  });

  it('due point — combine asOf mid-harvest — the remaining hours come at about 4 h/day, a narrow range', () => {
    const midHarvest = seasonalReadings('2024-05-06', '2026-08-10', 7, 1500, (d) =>
      inHarvest(d) ? 4 : 0,
    );
    const last = midHarvest[midHarvest.length - 1];
    const usage = estimateUsage(midHarvest, last.day);
    expect(usage.method).toBe('season');
    expect(usage.rate).toBeGreaterThan(3.5);
    expect(usage.rate).toBeLessThan(4.5);
    const due = computeDuePoint(
      task({ intervalMeter: 250, lastDoneMeter: last.value - 210 }),
      usage,
      '2026-08-10',
      last.value,
    );
    // 40 h left at 4 h/day → 10 days after the reading at noon on 2026-08-10; the season has
    // started, so only the pace is uncertain: a range of days, not weeks.
    expect(due.projectedDate! >= '2026-08-19' && due.projectedDate! <= '2026-08-21').toBe(true);
    expect(
      due.projectedLow! <= due.projectedDate! && due.projectedDate! <= due.projectedHigh!,
    ).toBe(true);
    expect(daysBetweenIso(due.projectedLow!, due.projectedHigh!)).toBeLessThanOrEqual(10);
  });
});

describe('due point — a busy week then idle weeks', () => {
  it('due point — 10 h/day for a week, then 8 idle weeks — not projected at the busy pace', () => {
    const pairs: Array<[number, number]> = [
      ...Array.from({ length: 8 }, (_, d): [number, number] => [d, 100 + 10 * d]),
      ...Array.from({ length: 8 }, (_, w): [number, number] => [14 + 7 * w, 170]),
    ];
    const readings = readingsFrom('2025-04-01', pairs);
    const asOfIso = referenceAddDays('2025-04-01', 63);
    const usage = estimateUsage(readings, dayNumberFromIso(asOfIso));
    const due = computeDuePoint(
      task({ intervalMeter: 250, lastDoneMeter: 0 }),
      usage,
      asOfIso,
      170,
    );
    // At the busy pace the last 80 h would take 8 days; the fading trend puts it months away.
    expect(due.projectedDate! > referenceAddDays(asOfIso, 60)).toBe(true);
    expect(due.status).toBe('ok');
  });
});
