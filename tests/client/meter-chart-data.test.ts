// The meter chart's data shaping (src/features/machines/lib/meter-chart-data.ts): hand-worked
// examples. The rates come in from the server; the chart only extends the last reading by them.
import { describe, expect, it } from 'vitest';
import {
  buildMeterChartData,
  niceTicks,
  PROJECTION_DAYS,
} from '../../src/features/machines/lib/meter-chart-data';
import { DUE_LINE_COLOURS } from '../../src/features/machines/lib/meter-chart-colours';

type Reading = Parameters<typeof buildMeterChartData>[0][number];
type Replacement = Parameters<typeof buildMeterChartData>[1][number];
type Usage = NonNullable<Parameters<typeof buildMeterChartData>[2]>;

const DAY = 86_400_000;
const T0 = Date.parse('2025-01-01T00:00:00Z');
const at = (days: number) => T0 + days * DAY;
const reading = (days: number, lifetimeValue: number): Reading => ({
  id: `r-${days}`,
  meterId: 'meter-1',
  value: lifetimeValue,
  lifetimeValue,
  takenAt: new Date(at(days)).toISOString(),
  source: 'manual',
  sourceName: null,
  enteredBy: null,
});
const replacement = (days: number): Replacement => ({
  id: `m-${days}`,
  meterId: 'meter-1',
  kind: 'replacement',
  replacedAt: new Date(at(days)).toISOString(),
  oldFinalValue: 0,
  newStartValue: 0,
  note: '',
});
const usage = (rate: number, low: number, high: number): Usage => ({
  method: 'trend',
  rate,
  low,
  high,
  readingCount: 3,
  explanation: 'hand-built',
});

describe('meter chart data — no readings', () => {
  it('buildMeterChartData — no readings — null (the chart is not drawn)', () => {
    expect(buildMeterChartData([], [], usage(5, 4, 6), [])).toBeNull();
  });
});

describe('meter chart data — three readings, 5 h/day (4…6), whole history', () => {
  // Readings 100, 150, 200 h on days 0, 10, 20 (given newest first, as the API lists them).
  const data = buildMeterChartData(
    [reading(20, 200), reading(10, 150), reading(0, 100)],
    [],
    usage(5, 4, 6),
    [
      { taskName: 'Engine oil', dueMeter: 250 },
      { taskName: 'Air filter', dueMeter: 250 },
      { taskName: 'Coolant', dueMeter: 5000 },
    ],
  )!;

  it('buildMeterChartData — points — readings oldest first, then the line ahead every 15 days', () => {
    expect(PROJECTION_DAYS).toBe(90);
    // 200 + 5 × d, band 200 + 4 × d … 200 + 6 × d, for d = 15, 30 … 90.
    expect(data.points).toEqual([
      { t: at(0), meter: 100 },
      { t: at(10), meter: 150 },
      { t: at(20), meter: 200, trend: 200, band: [200, 200] },
      { t: at(35), trend: 275, band: [260, 290] },
      { t: at(50), trend: 350, band: [320, 380] },
      { t: at(65), trend: 425, band: [380, 470] },
      { t: at(80), trend: 500, band: [440, 560] },
      { t: at(95), trend: 575, band: [500, 650] },
      { t: at(110), trend: 650, band: [560, 740] },
    ]);
  });

  it('buildMeterChartData — projection — 650 h (560–740) 90 days after the last reading', () => {
    expect(data.projection).toEqual({ t: at(110), value: 650, low: 560, high: 740 });
    expect(data.firstReading).toEqual({ t: at(0), value: 100 });
    expect(data.first).toEqual({ t: at(0), value: 100 });
    expect(data.last).toEqual({ t: at(20), value: 200 });
    expect(data.xDomain).toEqual([at(0), at(110)]);
  });

  it('buildMeterChartData — due lines — two tasks at 250 h share one line; 5,000 h is beyond', () => {
    // Reach = top 740 + 15 % of (740 − 100) = 836: 250 h is drawn, 5,000 h listed below.
    // y ticks over 100 − 32 … 740 + 32 (5 % pad of 640): step 200 (704 / 4 = 176 → 200).
    expect(data.yTicks).toEqual([0, 200, 400, 600, 800]);
    expect(data.yDomain).toEqual([0, 800]);
    expect(data.dueLines).toEqual([
      {
        value: 250,
        label: 'Engine oil, Air filter',
        labelled: true,
        side: 'left',
        colour: DUE_LINE_COLOURS[0],
        alsoHere: 0,
      },
    ]);
    expect(data.dueBeyond).toEqual([{ value: 5000, label: 'Coolant' }]);
  });
});

describe('meter chart data — the last 183 days of a long history, no estimate', () => {
  // 2 h/day: 0, 400, 800 h on days 0, 200, 400; replacements on days 100 and 300.
  const data = buildMeterChartData(
    [reading(400, 800), reading(200, 400), reading(0, 0)],
    [replacement(100), replacement(300)],
    { ...usage(0, 0, 0), method: 'none' },
    [
      { taskName: 'Belts', dueMeter: 830 },
      { taskName: 'Grease', dueMeter: 820 },
    ],
    183,
  )!;

  it('buildMeterChartData — window — starts 183 days back, on the line between the readings', () => {
    // Window from day 217: the reading of day 200 is kept so the line enters from the left;
    // the value at day 217 is 400 + 400 × 17 / 200 = 434.
    expect(data.points).toEqual([
      { t: at(200), meter: 400 },
      { t: at(400), meter: 800 },
    ]);
    expect(data.first).toEqual({ t: at(217), value: 434 });
    expect(data.firstReading).toEqual({ t: at(0), value: 0 });
    expect(data.projection).toBeNull();
    expect(data.xDomain).toEqual([at(217), at(400)]);
  });

  it('buildMeterChartData — replacements — only those inside the window', () => {
    expect(data.replacements).toEqual([{ t: at(300), label: 'Meter replaced' }]);
  });

  it('buildMeterChartData — a counter reset (issue 13) — marked as a reset, not a new meter', () => {
    const reset = { ...replacement(300), kind: 'reset' as const };
    const chart = buildMeterChartData(
      [reading(400, 800), reading(200, 400), reading(0, 0)],
      [reset],
      null,
      [],
      'all',
    );
    expect(chart?.replacements).toEqual([{ t: at(300), label: 'Counter reset' }]);
  });

  it('buildMeterChartData — due lines 10 h apart — each its own colour, labels at opposite ends', () => {
    // Values 434 … 830, pad 19.8 → ticks over 414.2 … 849.8: step 200 (435.6 / 4 = 108.9).
    // A label needs 18/220 of 600 = 49 h: 830 is too close to 820 for the same end, so it takes
    // the right end of its line.
    expect(data.yTicks).toEqual([400, 600, 800, 1000]);
    expect(data.dueLines).toEqual([
      {
        value: 820,
        label: 'Grease',
        labelled: true,
        side: 'left',
        colour: DUE_LINE_COLOURS[0],
        alsoHere: 0,
      },
      {
        value: 830,
        label: 'Belts',
        labelled: true,
        side: 'right',
        colour: DUE_LINE_COLOURS[1],
        alsoHere: 0,
      },
    ]);
    expect(data.dueBeyond).toEqual([]);
  });
});

describe('meter chart data — three due lines within one label height', () => {
  // 0 … 800 h over 400 days, no estimate; due at 820, 825 and 830 h: both ends are taken by the
  // first two, so the third is unlabelled and the nearest label below (825, right) says "+1".
  const data = buildMeterChartData(
    [reading(400, 800), reading(0, 0)],
    [],
    { ...usage(0, 0, 0), method: 'none' },
    [
      { taskName: 'Grease', dueMeter: 820 },
      { taskName: 'Belts', dueMeter: 825 },
      { taskName: 'Chains', dueMeter: 830 },
    ],
  )!;

  it('buildMeterChartData — the third line has its own colour and no label; "+1" on the one below', () => {
    expect(data.dueLines.map((l) => [l.value, l.labelled, l.side, l.alsoHere])).toEqual([
      [820, true, 'left', 0],
      [825, true, 'right', 1],
      [830, false, undefined, undefined],
    ]);
    expect(new Set(data.dueLines.map((l) => l.colour)).size).toBe(3);
  });
});

describe('meter chart data — a single reading (issue 10)', () => {
  // One reading of 4,210 h on day 0, no estimate yet.
  const data = buildMeterChartData(
    [reading(0, 4210)],
    [],
    { ...usage(0, 0, 0), method: 'none' },
    [],
  )!;

  it('buildMeterChartData — one reading — the week around it on the time axis', () => {
    expect(data.xDomain).toEqual([at(-3), at(3)]);
  });

  it('buildMeterChartData — one reading — value ticks of distinct whole values around 4,210 h', () => {
    // A flat line gets 2 % of its value (84.2 h) each side: 4,125.8 … 4,294.2, step 50.
    expect(data.yTicks).toEqual([4100, 4150, 4200, 4250, 4300]);
  });
});

describe('meter chart data — niceTicks', () => {
  it('niceTicks — 0…10 in about 5 — steps of 2.5', () => {
    expect(niceTicks(0, 10, 5)).toEqual([0, 2.5, 5, 7.5, 10]);
  });

  it('niceTicks — 95…1,005 in about 5 — steps of 250 from 0 past the top', () => {
    // 910 / 4 = 227.5 → the next round step is 250; 1,000 < 1,005, so 1,250 closes the axis.
    expect(niceTicks(95, 1005, 5)).toEqual([0, 250, 500, 750, 1000, 1250]);
  });

  it('niceTicks — 0.3…0.9 — at least a step of 1 (range under 1 counts as 1)', () => {
    // max(0.6, 1) / 4 = 0.25 → step 0.25 from 0.25.
    expect(niceTicks(0.3, 0.9, 5)).toEqual([0.25, 0.5, 0.75, 1]);
  });
});
