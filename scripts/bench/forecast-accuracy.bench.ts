// `npm run bench:forecast-accuracy` (also a part of `npm run bench`). Backtest of the usage
// forecast (issue 17): on a simulated fleet whose future is known (accuracy-fleet.ts: harvest,
// two-season, year-round, custom-hire and young machines, several random fleets), each machine is
// cut off at days spread over its last year; the forecast made from the readings before the cut
// dates the day the meter reaches the last reading + R, for R = 5, 15, 30 and 60 % of a year's use;
// that is compared with the day the simulated meter really got there. Printed for the season
// method in use — on the simulated fleet and on the demo fleet (accuracy-demo.ts) — and, in the
// same run, a plain 90-day linear trend and the previous method (last
// year's same weeks scaled by the last 28 days): median and 90th-percentile absolute error in days,
// and the share of real dates inside the stated range.
//   --fleets=N (default 4)   --per-kind=N machines of each kind per fleet (default 12)
import { performance } from 'node:perf_hooks';
import {
  dayNumberFromIso,
  estimateUsage,
  projectDateForValue,
  type ReadingPoint,
  type UsageEstimate,
} from '../../shared/domain';
import { estimateTrend } from '../../shared/domain/usage-trend';
import {
  FLEET_KINDS,
  lifetimeCurve,
  readingsBefore,
  simulatedFleet,
  trueDayOf,
  type FleetKind,
} from './accuracy-fleet';
import { demoBacktests, demoTruthDay, yearUseBefore } from './accuracy-demo';
import { report } from './report';

const arg = (name: string, fallback: number) =>
  Number(process.argv.find((a) => a.startsWith(`--${name}=`))?.split('=')[1] ?? fallback);
const FLEETS = arg('fleets', 4);
const PER_KIND = arg('per-kind', 12);
const START = dayNumberFromIso('2022-01-01');
const HORIZON = 400;

type Method = 'season' | 'trend' | 'previous';
const METHODS: Method[] = ['season', 'trend', 'previous'];
const METHOD_NAMES: Record<Method, string> = {
  season: 'season method in use',
  trend: 'plain 90-day trend',
  previous: "previous method (last year's weeks × 28-day scale)",
};

function estimate(method: Method, points: ReadingPoint[], asOf: number, months: number[]) {
  const sorted = [...points].sort((a, b) => a.day - b.day);
  if (method === 'season') return estimateUsage(sorted, asOf, { seasonMonths: months });
  if (method === 'trend') return estimateTrend(sorted, asOf, 90, Infinity);
  return estimateUsage(sorted, asOf, { method: 'previous' });
}

const dayOf = (u: UsageEstimate, target: number, asOf: number, v: 'point' | 'low' | 'high') => {
  const iso = projectDateForValue(u, target, asOf, v);
  return iso === null ? null : dayNumberFromIso(iso);
};

type Kind = FleetKind | 'demo';
interface Outcome {
  kind: Kind;
  error: number;
  /** whether the method gave a date (and so a range) */
  dated: boolean;
  inRange: boolean;
}
const outcomes: Record<Method, Outcome[]> = { season: [], trend: [], previous: [] };
const SHARES = [0.05, 0.15, 0.3, 0.6];
let cases = 0;

/** Forecasts from the readings before `cut` against the truth, for each target share of a year. */
function backtest(
  kind: Kind,
  points: ReadingPoint[],
  cut: number,
  months: number[],
  yearUse: number,
  truthOf: (target: number) => number | null,
) {
  if (points.length < 2 || !(yearUse > 0)) return;
  const last = points[points.length - 1];
  const usages = Object.fromEntries(
    METHODS.map((k) => [k, estimate(k, points, cut, months)]),
  ) as Record<Method, UsageEstimate>;
  for (const share of SHARES) {
    const target = last.value + share * yearUse;
    const truth = truthOf(target);
    if (truth === null || truth - cut > HORIZON) continue;
    cases++;
    for (const k of METHODS) {
      const point = dayOf(usages[k], target, cut, 'point');
      const low = dayOf(usages[k], target, cut, 'low');
      const high = dayOf(usages[k], target, cut, 'high');
      const error = point === null ? HORIZON : Math.min(HORIZON, Math.abs(point - truth));
      const inRange = low !== null && low <= truth + 0.5 && (high === null || truth - 0.5 <= high);
      outcomes[k].push({ kind, error, dated: point !== null, inRange });
    }
  }
}

const t0 = performance.now();
for (let f = 0; f < FLEETS; f++) {
  for (const m of simulatedFleet(PER_KIND, 17 + f, START)) {
    const curve = lifetimeCurve(m);
    const yearUse = curve[3 * 365] - curve[2 * 365];
    for (let c = 0; c < 6; c++) {
      // cut-offs spread over the fourth year, each machine at its own days
      const cut = START + 3 * 365 + Math.round(((c + ((m.id.length * 7 + f) % 6) / 6) * 365) / 6);
      if (m.kind === 'young') m.firstReadDay = cut - 200;
      const points = readingsBefore(m, curve, cut, cut * 31 + f);
      backtest(m.kind, points, cut, m.seasonMonths, yearUse, (target) =>
        trueDayOf(m, curve, cut, target),
      );
    }
  }
}
// the demo fleet: its machines' generated readings, cut at eight days over the year before their
// last, so a year of truth follows each cut
const TODAY = new Date('2026-11-30T12:00:00Z');
for (const d of demoBacktests(TODAY)) {
  const end = d.points[d.points.length - 1].day;
  for (let c = 0; c < 8; c++) {
    const cut = Math.floor(end - 730 + (c * 365) / 8);
    const before = d.points.filter((p) => p.day < cut);
    backtest('demo', before, cut, d.seasonMonths, yearUseBefore(d.points, cut), (target) =>
      demoTruthDay(d.points, cut, target),
    );
  }
}

const quantile = (values: number[], q: number) => {
  const s = [...values].sort((a, b) => a - b);
  return s.length ? s[Math.min(s.length - 1, Math.floor(q * s.length))] : Number.NaN;
};
const summary = (list: Outcome[]) => ({
  median: quantile(
    list.map((o) => o.error),
    0.5,
  ),
  p90: quantile(
    list.map((o) => o.error),
    0.9,
  ),
  // a range is stated only with a date: the share of real dates inside it counts those cases
  coverage: list.filter((o) => o.inRange).length / Math.max(1, list.filter((o) => o.dated).length),
  dated: list.filter((o) => o.dated).length / Math.max(1, list.length),
});
console.log(
  `${cases} cases (${FLEETS} simulated fleets × ${PER_KIND} machines of each of ${FLEET_KINDS.length} kinds × 6 cut-offs, and the demo fleet × 8 cut-offs; × 4 targets) in ${((performance.now() - t0) / 1000).toFixed(1)} s`,
);
console.log(
  'median / p90 error in days (no date counts as 400), real dates inside the stated range, cases dated, by kind:',
);
for (const kind of [...FLEET_KINDS, 'demo' as const]) {
  const line = METHODS.map((k) => {
    const s = summary(outcomes[k].filter((o) => o.kind === kind));
    return `${k} ${s.median.toFixed(1)} / ${s.p90.toFixed(0)} d, ${(s.coverage * 100).toFixed(0)} % in range, ${(s.dated * 100).toFixed(0)} % dated`;
  }).join(' · ');
  console.log(`  ${kind.padEnd(12)} ${line}`);
}
const all = Object.fromEntries(METHODS.map((k) => [k, summary(outcomes[k])])) as Record<
  Method,
  ReturnType<typeof summary>
>;
report({
  name: 'forecast median error',
  value: all.season.median,
  unit: 'days',
  baseline: { what: METHOD_NAMES.trend, value: all.trend.median },
  target: '≤ 0.5×',
  met: all.season.median <= 0.5 * all.trend.median,
});
report({
  name: 'forecast median error against the previous method',
  value: all.season.median,
  unit: 'days',
  baseline: { what: METHOD_NAMES.previous, value: all.previous.median },
});
report({
  name: 'forecast p90 error',
  value: all.season.p90,
  unit: 'days',
  baseline: { what: METHOD_NAMES.trend, value: all.trend.p90 },
});
report({
  name: 'forecast range holds the real date',
  value: all.season.coverage * 100,
  unit: '%',
  baseline: { what: METHOD_NAMES.previous, value: all.previous.coverage * 100 },
  target: '75–90 %',
  met: all.season.coverage >= 0.75 && all.season.coverage <= 0.9,
});
report({
  name: 'forecast cases dated',
  value: all.season.dated * 100,
  unit: '%',
  baseline: { what: METHOD_NAMES.trend, value: all.trend.dated * 100 },
});
report({
  name: 'forecast range holds the real date, plain trend',
  value: all.trend.coverage * 100,
  unit: '%',
  baseline: null,
});
