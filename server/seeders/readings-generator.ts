// Invented meter readings for the demo: a seeded, deterministic history that follows a machine's
// season and ends at `end`, so the demo is always current. The day's use is drawn first (busy and
// idle days, peaks, short campaigns), then readings are taken the way people take them: in the
// morning before work or in the evening after it, every 1–3 days in season, every 2–4 weeks out
// of it, with the odd gap and the odd reading entered days late. No reading breaks the reading
// rules of shared/domain (never backwards, never faster than the meter can advance).
import { TZDate } from '@date-fns/tz';
import type { MeterUnit } from '../../shared/constants';
import {
  checkReading,
  dayNumberFromIso,
  isoFromDayNumber,
  localDayNumber,
  type ReadingAt,
} from '../../shared/domain';
import { createRandom, type Random } from './random';

/** A short stretch of work inside a month (e.g. a silage cut): from firstDay (1–31) for `days` days. */
export interface Campaign {
  month: number;
  firstDay: number;
  days: number;
}

/** When a machine works. */
export interface SeasonProfile {
  /** months (1–12) the machine works; empty = all year */
  months: number[];
  /** months of heaviest use (more days worked, longer days) */
  peakMonths?: number[];
  /** when given, the machine works only inside these stretches (shifted a few days each year) */
  campaigns?: Campaign[];
  /** chance of use on an in-season weekday or Saturday (default 0.7) */
  useShare?: number;
  /** chance of use on an in-season Sunday (default 0.25) */
  sundayShare?: number;
  /** share of the year's use that falls out of season: moving, odd jobs (default 0.04) */
  offSeasonShare?: number;
}

export interface GenerateReadingsOptions {
  seed: number;
  start: Date;
  end: Date;
  /** IANA time zone of the farm: readings fall at plausible local times */
  timeZone: string;
  season: SeasonProfile;
  /** average use per calendar day over a whole year, meter units per day */
  ratePerDay: number;
  /** meter value aimed at on the last reading, meter units (reached within ±1%) */
  endValue: number;
  meterUnit?: MeterUnit;
  /** days between readings in season, [min, max] (default [1, 3]) */
  inSeasonEvery?: [number, number];
  /** days between readings out of season, [min, max] (default [14, 28]) */
  offSeasonEvery?: [number, number];
}

export interface GeneratedReading {
  takenAt: Date;
  /** meter units, on one continuous (lifetime) scale */
  value: number;
  /** when the reading was typed in: minutes after takenAt, or days for the odd late entry */
  enteredAt: Date;
}

/** Longest working day drawn, meter units; well inside the reading rules' per-day limits. */
const MAX_USE_PER_DAY: Record<MeterUnit, number> = {
  h: 14,
  km: 850,
  mi: 520,
  bales: 450,
  ha: 60,
  acres: 150,
};
const DECIMALS: Record<MeterUnit, number> = { h: 1, km: 0, mi: 0, bales: 0, ha: 1, acres: 1 };
const LATE_ENTRY_SHARE = 0.03;
const GAP_SHARE = 0.04;
const MORNING: [number, number] = [6 * 60 + 15, 8 * 60 + 45];
const EVENING: [number, number] = [17 * 60 + 30, 20 * 60 + 45];
const MS_PER_DAY = 86_400_000;

interface Slot {
  /** index of the local day from the first day of the history */
  index: number;
  /** local minutes after midnight */
  minute: number;
  /** an evening reading counts that day's work; a morning one does not */
  evening: boolean;
}

function ymd(day: number): { year: number; month: number; date: number } {
  const [year, month, date] = isoFromDayNumber(day).split('-').map(Number);
  return { year, month, date };
}

/** Day numbers inside the season's campaigns, each shifted by a few days per year. */
function campaignDays(season: SeasonProfile, firstDay: number, lastDay: number, rng: Random) {
  const days = new Set<number>();
  for (let year = ymd(firstDay).year - 1; year <= ymd(lastDay).year; year += 1) {
    for (const c of season.campaigns ?? []) {
      const from =
        dayNumberFromIso(`${year}-${String(c.month).padStart(2, '0')}-01`) +
        c.firstDay -
        1 +
        rng.int(-3, 3);
      const length = Math.max(1, c.days + rng.int(-1, 1));
      for (let d = from; d < from + length; d += 1) days.add(d);
    }
  }
  return days;
}

/** Scales day weights to the target total, moving anything above the daily cap to other working days. */
function scaleUse(weights: number[], total: number, cap: number): number[] {
  const sum = weights.reduce((a, b) => a + b, 0);
  const use = weights.map((w) => (sum > 0 ? (w * total) / sum : 0));
  for (let round = 0; round < 30; round += 1) {
    let excess = 0;
    for (let i = 0; i < use.length; i += 1) {
      if (use[i] > cap) {
        excess += use[i] - cap;
        use[i] = cap;
      }
    }
    const free = use.reduce((a, u) => (u > 0 && u < cap ? a + u : a), 0);
    if (excess < 1e-9 || free <= 0) break;
    const factor = 1 + excess / free;
    for (let i = 0; i < use.length; i += 1) if (use[i] > 0 && use[i] < cap) use[i] *= factor;
  }
  return use;
}

function floorTo(value: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.floor(value * f + 1e-7) / f;
}

/**
 * A deterministic reading history for one machine from `start` to `end` (same seed, same
 * readings). Values are non-decreasing, rounded to the meter's resolution, the last one taken at
 * the latest plausible time on or before `end` and within ±1% of endValue.
 */
export function generateReadings(options: GenerateReadingsOptions): GeneratedReading[] {
  const { season, timeZone } = options;
  const unit = options.meterUnit ?? 'h';
  const rng = createRandom(options.seed);
  const firstDay = Math.floor(localDayNumber(options.start, timeZone));
  const endLocal = localDayNumber(options.end, timeZone);
  const lastDay = Math.floor(endLocal);
  if (lastDay - firstDay < 2) throw new RangeError('The history must span at least two days');

  const campaigns = season.campaigns?.length ? campaignDays(season, firstDay, lastDay, rng) : null;
  const dayCount = lastDay - firstDay + 1;
  const months = Array.from({ length: dayCount }, (_, i) => ymd(firstDay + i).month);
  const inSeason = (i: number) =>
    campaigns
      ? campaigns.has(firstDay + i)
      : season.months.length === 0 || season.months.includes(months[i]);

  // 1. The use of every local day.
  const weights = months.map((month, i) => {
    if (!inSeason(i)) return rng.chance(0.05) ? rng.between(0.1, 0.4) : 0;
    const peak = season.peakMonths?.includes(month) ?? false;
    const sunday = new Date((firstDay + i) * MS_PER_DAY).getUTCDay() === 0;
    const share = sunday ? (season.sundayShare ?? 0.25) : (season.useShare ?? 0.7);
    const p = Math.min(0.97, share + (peak ? 0.15 : 0));
    return rng.chance(p) ? rng.between(0.5, 1.5) * (peak ? 1.6 : 1) : 0;
  });
  // Odd jobs out of season get a fixed small share, however short the season is.
  const offShare = season.offSeasonShare ?? 0.04;
  const sumIn = weights.reduce((a, w, i) => (inSeason(i) ? a + w : a), 0);
  const sumOff = weights.reduce((a, w, i) => (inSeason(i) ? a : a + w), 0);
  const offFactor = sumIn > 0 && sumOff > 0 ? (offShare / (1 - offShare)) * (sumIn / sumOff) : 1;
  for (let i = 0; i < dayCount; i += 1) if (!inSeason(i)) weights[i] *= offFactor;
  const use = scaleUse(weights, options.ratePerDay * dayCount, MAX_USE_PER_DAY[unit]);
  const before: number[] = [0];
  for (const u of use) before.push(before[before.length - 1] + u);
  const valueAt = (s: Slot) => before[s.index] + (s.evening ? use[s.index] : 0);

  // 2. When readings are taken. The last one is the latest plausible slot on or before `end`.
  const minuteIn = ([from, to]: [number, number]) => rng.int(from, to);
  const endMinute = (endLocal - lastDay) * 1440;
  const morning = minuteIn(MORNING);
  const evening = minuteIn(EVENING);
  const final: Slot =
    endMinute >= evening
      ? { index: dayCount - 1, minute: evening, evening: true }
      : endMinute >= morning
        ? { index: dayCount - 1, minute: morning, evening: false }
        : { index: dayCount - 2, minute: evening, evening: true };
  const [inMin, inMax] = options.inSeasonEvery ?? [1, 3];
  const [offMin, offMax] = options.offSeasonEvery ?? [14, 28];
  const slots: Slot[] = [];
  for (let i = rng.int(0, 2); i < final.index;) {
    const isEvening = rng.chance(0.45);
    slots.push({ index: i, minute: minuteIn(isEvening ? EVENING : MORNING), evening: isEvening });
    let step: number;
    if (inSeason(i)) {
      step = rng.int(inMin, inMax) + (rng.chance(GAP_SHARE) ? rng.int(4, 9) : 0);
    } else {
      step = rng.int(offMin, offMax);
      // Out of season readings are sparse, but the first days of a season are logged again.
      for (let k = 1; k < step && i + k < dayCount; k += 1) {
        if (inSeason(i + k)) {
          step = k + rng.int(0, 2);
          break;
        }
      }
    }
    i += step;
  }
  slots.push(final);

  // 3. Values, counted back from the end value so the history lands where the scenario says.
  const decimals = DECIMALS[unit];
  const endValue = floorTo(options.endValue * (1 + rng.between(-0.01, 0.01)), decimals);
  const finalUse = valueAt(final);
  const endMs = options.end.getTime();
  const candidates = slots.map((s, n) => {
    const { year, month, date } = ymd(firstDay + s.index);
    const local = new TZDate(
      year,
      month - 1,
      date,
      Math.floor(s.minute / 60),
      s.minute % 60,
      0,
      0,
      timeZone,
    );
    const takenAt = new Date(local.getTime());
    const delayMs =
      n < slots.length - 1 && rng.chance(LATE_ENTRY_SHARE)
        ? rng.int(1, 5) * MS_PER_DAY + rng.int(0, 600) * 60_000
        : rng.int(1, 40) * 60_000;
    return {
      takenAt,
      value: Math.max(0, floorTo(endValue - (finalUse - valueAt(s)), decimals)),
      enteredAt: new Date(Math.min(takenAt.getTime() + delayMs, endMs)),
    };
  });
  return keepPlausible(candidates, unit, endMs);
}

/** Drops any reading that would break a reading rule against the one kept before it (a safety net). */
function keepPlausible(
  readings: GeneratedReading[],
  unit: MeterUnit,
  nowMs: number,
): GeneratedReading[] {
  const kept: GeneratedReading[] = [];
  const at = (r: GeneratedReading): ReadingAt => ({
    value: r.value,
    takenAtMs: r.takenAt.getTime(),
  });
  readings.forEach((r, n) => {
    const isLast = n === readings.length - 1;
    const broken = () => {
      const previous = kept[kept.length - 1];
      return (
        previous !== undefined &&
        checkReading(at(r), { previous: at(previous) }, { nowMs, meterUnit: unit }) !== null
      );
    };
    // The last reading carries the end value, so earlier ones give way to it.
    if (isLast) while (broken()) kept.pop();
    if (!broken()) kept.push(r);
  });
  return kept;
}
