// Demo-data checks of the seeded readings generator and the demo schedule templates (pure, no
// database). They check that the invented demo history is plausible, not the forecast math.
import { describe, expect, it } from 'vitest';
import { TZDate } from '@date-fns/tz';
import { MACHINE_CATEGORIES } from '../../shared/constants';
import { isoFromDayNumber, localDayNumber } from '../../shared/domain';
import { hazardCautionText } from '../../shared/domain/hazards';
import { taskInputSchema } from '../../shared/schemas/schedule';
import {
  generateReadings,
  type GeneratedReading,
  type GenerateReadingsOptions,
} from '../../server/seeders/readings-generator';
import { DEMO_MACHINES } from '../../server/seeders/demo-fleet';
import { DEMO_ORGANIZATIONS } from '../../server/seeders/demo-people';
import { buildTemplates, TEMPLATE_DESCRIPTION } from '../../server/seeders/templates';
import { createRandom } from '../../server/seeders/random';

const DAY = 86_400_000;
const end = new Date('2026-06-15T18:40:00Z');
const start = new Date(end.getTime() - 800 * DAY);

// A harvest machine: August–October only, about 300 h a year, about 2,600 h at the end.
const combine: GenerateReadingsOptions = {
  seed: 17,
  start,
  end,
  timeZone: 'America/Chicago',
  season: { months: [8, 9, 10], peakMonths: [9] },
  ratePerDay: 300 / 365,
  endValue: 2600,
  meterUnit: 'h',
};

const gaps = (readings: GeneratedReading[]) =>
  readings.slice(1).map((r, i) => ({
    from: readings[i],
    to: r,
    days: (r.takenAt.getTime() - readings[i].takenAt.getTime()) / DAY,
    increase: r.value - readings[i].value,
  }));

/** Each interval's increase spread evenly over its local days, summed by month (1–12). */
function useByMonth(readings: GeneratedReading[], timeZone: string): number[] {
  const byMonth = new Array<number>(13).fill(0);
  for (const g of gaps(readings)) {
    const a = localDayNumber(g.from.takenAt, timeZone);
    const b = localDayNumber(g.to.takenAt, timeZone);
    const days = Math.max(1, Math.ceil(b - a));
    for (let d = 0; d < days; d += 1) {
      byMonth[Number(isoFromDayNumber(a + d).slice(5, 7))] += g.increase / days;
    }
  }
  return byMonth;
}

const demoOptions = (m: (typeof DEMO_MACHINES)[number]): GenerateReadingsOptions => ({
  seed: m.fleetNumber.length * 7919 + m.aboutNow,
  start,
  end,
  timeZone: DEMO_ORGANIZATIONS.find((o) => o.key === m.organization)!.timeZone,
  season: m.season,
  ratePerDay: m.perYear / 365,
  endValue: m.aboutNow,
  meterUnit: m.meterUnit,
  inSeasonEvery: m.inSeasonEvery,
});

describe('demo seed — readings generator', () => {
  it('seed generator — same seed — the same readings; another seed — different ones', () => {
    const a = generateReadings(combine);
    const b = generateReadings(combine);
    const c = generateReadings({ ...combine, seed: 18 });
    expect(b).toEqual(a);
    expect(c.map((r) => r.value)).not.toEqual(a.map((r) => r.value));
  });

  it('seed generator — random helper — mulberry32 stream repeats for a seed and stays in range', () => {
    const a = createRandom(99);
    const b = createRandom(99);
    const draws = Array.from({ length: 1000 }, () => a.next());
    expect(Array.from({ length: 1000 }, () => b.next())).toEqual(draws);
    expect(Math.min(...draws)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...draws)).toBeLessThan(1);
    const ints = Array.from({ length: 500 }, () => a.int(1, 3));
    expect(new Set(ints)).toEqual(new Set([1, 2, 3]));
  });

  it('seed generator — every demo machine — values never decrease, times strictly increase', () => {
    for (const m of DEMO_MACHINES) {
      const readings = generateReadings(demoOptions(m));
      for (const g of gaps(readings)) {
        expect(
          g.increase,
          `${m.fleetNumber} at ${g.to.takenAt.toISOString()}`,
        ).toBeGreaterThanOrEqual(0);
        expect(g.days, m.fleetNumber).toBeGreaterThan(0);
      }
    }
  });

  it('seed generator — hour meters — never more than 24 h per elapsed day; km ≤ 1500/day, bales ≤ 2000/day', () => {
    const limit = { h: 24, km: 1500, mi: 930, bales: 2000, ha: 300, acres: 750 } as const;
    for (const m of DEMO_MACHINES) {
      for (const g of gaps(generateReadings(demoOptions(m)))) {
        expect(g.increase, `${m.fleetNumber} ${g.to.takenAt.toISOString()}`).toBeLessThanOrEqual(
          limit[m.meterUnit] * g.days,
        );
      }
    }
  });

  it('seed generator — August–October combine — the season months carry most of the use', () => {
    const byMonth = useByMonth(generateReadings(combine), combine.timeZone);
    const total = byMonth.reduce((a, b) => a + b, 0);
    const inSeason = byMonth[8] + byMonth[9] + byMonth[10];
    expect(inSeason / total).toBeGreaterThan(0.85);
    // and the off-season months each see little
    for (const month of [1, 2, 3, 4, 5, 6, 12]) expect(byMonth[month] / total).toBeLessThan(0.03);
  });

  it('seed generator — three silage cuts — use falls inside the cut months', () => {
    const harvester = DEMO_MACHINES.find((m) => m.fleetNumber === 'FH-01')!;
    const byMonth = useByMonth(generateReadings(demoOptions(harvester)), 'Europe/Dublin');
    const total = byMonth.reduce((a, b) => a + b, 0);
    // A cut near a month's end can spill a few days over into the next month.
    expect((byMonth[5] + byMonth[6] + byMonth[7] + byMonth[9]) / total).toBeGreaterThan(0.85);
  });

  it('seed generator — end value — last reading within ±3% of the target, at or before the end', () => {
    for (const m of DEMO_MACHINES) {
      const readings = generateReadings(demoOptions(m));
      const last = readings[readings.length - 1];
      expect(Math.abs(last.value / m.aboutNow - 1), m.fleetNumber).toBeLessThanOrEqual(0.03);
      expect(last.takenAt.getTime()).toBeLessThanOrEqual(end.getTime());
      expect(end.getTime() - last.takenAt.getTime(), m.fleetNumber).toBeLessThan(1.5 * DAY);
      // two years of history at least
      expect(last.takenAt.getTime() - readings[0].takenAt.getTime()).toBeGreaterThan(730 * DAY);
    }
  });

  it('seed generator — a year of use — about ratePerDay × 365 between readings a year apart', () => {
    const readings = generateReadings(combine);
    const last = readings[readings.length - 1];
    const yearAgo = readings
      .filter((r) => r.takenAt.getTime() <= last.takenAt.getTime() - 365 * DAY)
      .pop()!;
    expect(last.value - yearAgo.value).toBeGreaterThan(300 * 0.8);
    expect(last.value - yearAgo.value).toBeLessThan(300 * 1.2);
  });

  it('seed generator — cadence — readings every few days in season, weeks apart out of season', () => {
    const readings = generateReadings(combine);
    const month = (r: GeneratedReading) =>
      new TZDate(r.takenAt.getTime(), combine.timeZone).getMonth() + 1;
    const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
    const all = gaps(readings);
    const inSeason = all.filter(
      (g) => [8, 9, 10].includes(month(g.from)) && [8, 9, 10].includes(month(g.to)),
    );
    const offSeason = all.filter((g) => [1, 2, 3, 4, 5, 6].includes(month(g.from)));
    expect(median(inSeason.map((g) => g.days))).toBeLessThanOrEqual(3.5);
    expect(median(offSeason.map((g) => g.days))).toBeGreaterThanOrEqual(13);
  });

  it('seed generator — local times — mornings or evenings; the odd late entry, never after the end', () => {
    const readings = generateReadings(combine);
    for (const r of readings) {
      const local = new TZDate(r.takenAt.getTime(), combine.timeZone);
      const minute = local.getHours() * 60 + local.getMinutes();
      const morning = minute >= 6 * 60 + 15 && minute <= 8 * 60 + 45;
      const evening = minute >= 17 * 60 + 30 && minute <= 20 * 60 + 45;
      expect(morning || evening, r.takenAt.toISOString()).toBe(true);
      expect(r.enteredAt.getTime()).toBeGreaterThanOrEqual(r.takenAt.getTime());
      expect(r.enteredAt.getTime()).toBeLessThanOrEqual(end.getTime());
    }
    const late = readings.filter((r) => r.enteredAt.getTime() - r.takenAt.getTime() > DAY);
    expect(late.length).toBeGreaterThan(0);
    expect(late.length / readings.length).toBeLessThan(0.1);
  });
});

describe('demo seed — schedule templates', () => {
  for (const units of ['metric', 'imperial'] as const) {
    it(`demo templates — ${units} — every category has a schedule whose tasks all validate`, () => {
      const templates = buildTemplates(units);
      expect(templates.map((t) => t.category).sort()).toEqual([...MACHINE_CATEGORIES].sort());
      for (const t of templates) {
        expect(t.description).toBe(TEMPLATE_DESCRIPTION);
        expect(t.tasks.length, t.category).toBeGreaterThanOrEqual(5);
        for (const task of t.tasks) {
          const parsed = taskInputSchema.safeParse(task);
          expect(parsed.success, `${t.category}: ${task.name} ${parsed.error?.message ?? ''}`).toBe(
            true,
          );
          // a hazard's caution comes from the one table; a task's own words never contradict it
          expect(`${task.instructions} ${task.safetyNotes}`, task.name).not.toMatch(
            /let (it|the machine) cool|drain(ed)? (it )?hot/i,
          );
          if (task.warnMeter !== null && task.intervalMeter !== null) {
            expect(task.warnMeter / task.intervalMeter, task.name).toBeLessThanOrEqual(0.1);
          }
        }
        const names = t.tasks.map((x) => x.name);
        expect(new Set(names).size, t.category).toBe(names.length);
      }
    });
  }

  it('demo templates — tractor — PTO check carries the PTO caution; oil is in gallons on an imperial farm', () => {
    const tractor = buildTemplates('imperial').find((t) => t.category === 'tractor')!;
    const pto = tractor.tasks.find((t) => t.name === 'PTO clutch and brake check')!;
    // Demo intervals are common practice (CHECKS.md §7: no published source gives universal hours).
    expect(pto.intervalMeter).toBe(1000);
    expect(pto.hazards).toEqual(['pto', 'stored_energy']);
    expect(pto.safetyNotes).toBe('');
    expect(hazardCautionText(pto.hazards)).toMatch(/540 rpm shaft turns 9 times a second/);
    const oil = tractor.tasks.find((t) => t.name === 'Engine oil and filter')!;
    expect([oil.intervalMeter, oil.intervalDays]).toEqual([500, 365]);
    expect(oil.fluids[0].unit).toBe('gal');
  });
});
