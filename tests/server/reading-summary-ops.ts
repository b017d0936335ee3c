// Random reading histories for the summary property test (reading-summary.property.test.ts): each
// step is an intent (fast-check values) that `applyStep` turns into a concrete call of the real
// service — logReading, logBulkReadings, correctReading, deleteReading, replaceMeter — against
// the machine's current readings, so most steps are valid and some are refused on purpose. Each
// step is on one meter of the machine (issue 13): the primary, sent without a meter id as older
// clients do, or a second meter named by its id; the rules and summaries of the two never mix.
//
// Times run over four years (so the summary's three-year window matters) with extra weight on the
// daylight-saving changes of America/Chicago: since 2007 the US changes at 2:00 local time on the
// second Sunday of March and the first Sunday of November (Energy Policy Act of 2005, §110; the
// IANA tz database's "US" rules). On 5 Nov 2023, 3 Nov 2024 and 2 Nov 2025 the hour 01:00–02:00
// comes twice: 06:xx UTC (CDT, UTC−5) and 07:xx UTC (CST, UTC−6) show the same local time.
import fc from 'fast-check';
import { AppError } from '../../server/errors';
import { MeterReading, MeterReplacement, type Machine } from '../../server/models';
import type { OrgAccess } from '../../server/policies/context';
import { logBulkReadings, logReading } from '../../server/services/reading-log';
import { correctReading, deleteReading } from '../../server/services/reading-corrections';
import { replaceMeter } from '../../server/services/meter-changes';
import { toRawValue, type MeterReplacementPoint } from '../../shared/domain';
import { DST_CHANGES_UTC, timeChoice, type TimeChoice } from './reading-summary-times';

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
export const START_MS = Date.UTC(2022, 5, 1);
const SPAN_MS = 4 * 365 * DAY;
/** The hour meter's ceiling per elapsed day (shared/domain/reading-rules.ts, 'h': 24 h a day). */
const MAX_PER_DAY = 24;
/** Clock skew the pace rule allows on elapsed time (reading-rules.ts: 5 minutes). */
const SKEW_MS = 5 * 60_000;

const fraction = fc.double({ min: 0, max: 1, noNaN: true });
/** Which stored reading a step takes (0…1 over them in order); often the last, the usual typo. */
const pick = fc.oneof(fraction, fc.constant(1));
/** Values with two decimals, as people type them; sometimes three (the column keeps two). */
const decimals = fc.constantFrom(2, 2, 2, 3);

export const step = fc.oneof(
  {
    weight: 5,
    arbitrary: fc.record({
      kind: fc.constant('insert' as const),
      at: timeChoice,
      frac: fraction,
      decimals,
      bad: fc.boolean(),
    }),
  },
  {
    weight: 2,
    arbitrary: fc.record({
      kind: fc.constant('batch' as const),
      at: fc.array(timeChoice, { minLength: 2, maxLength: 4 }),
      frac: fraction,
      decimals,
    }),
  },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('repeat' as const), pick: fraction }) },
  {
    weight: 2,
    arbitrary: fc.record({
      kind: fc.constant('correct' as const),
      pick,
      at: fc.option(timeChoice),
      frac: fraction,
      decimals,
    }),
  },
  { weight: 2, arbitrary: fc.record({ kind: fc.constant('delete' as const), pick }) },
  {
    weight: 1,
    arbitrary: fc.record({
      kind: fc.constant('replace' as const),
      hours: fc.integer({ min: 1, max: 300 }),
      extra: fraction,
      newStart: fc.integer({ min: 0, max: 50 }),
    }),
  },
);
export type Step = typeof step extends fc.Arbitrary<infer T> ? T : never;

interface Stored {
  id: string;
  lifetime: number;
  at: number;
}

/** The meter a step is on: its id, and whether the call names it (the primary need not). */
export interface StepMeter {
  id: string;
  named: boolean;
}

async function storedReadings(machine: Machine, meter: StepMeter): Promise<Stored[]> {
  const rows = await MeterReading.findAll({
    where: { machineId: machine.id, meterId: meter.id },
    order: [
      ['takenAt', 'ASC'],
      ['lifetimeValue', 'ASC'],
    ],
  });
  return rows.map((r) => ({ id: r.id, lifetime: r.lifetimeValue, at: r.takenAt.getTime() }));
}

async function replacementsOf(
  machine: Machine,
  meter: StepMeter,
): Promise<MeterReplacementPoint[]> {
  const rows = await MeterReplacement.findAll({
    where: { machineId: machine.id, meterId: meter.id },
  });
  return rows.map((r) => ({
    replacedAtMs: r.replacedAt.getTime(),
    oldFinalValue: r.oldFinalValue,
    newStartValue: r.newStartValue,
  }));
}

const pickOf = <T>(items: T[], f: number) =>
  items[Math.min(items.length - 1, Math.floor(f * items.length))];

function timeOf(choice: TimeChoice, readings: Stored[]): number {
  switch (choice.near) {
    case 'anywhere':
      return START_MS + Math.round(choice.at * SPAN_MS);
    case 'dst':
      return DST_CHANGES_UTC[choice.change] + choice.minutes * 60_000;
    case 'repeated hour':
      return (
        DST_CHANGES_UTC[choice.change] - HOUR + choice.minute * 60_000 + (choice.second ? HOUR : 0)
      );
    case 'same day':
      return readings.length
        ? pickOf(readings, choice.pick).at + choice.minutes * 60_000
        : START_MS + choice.minutes * 60_000;
    case 'after last':
      return (readings.at(-1)?.at ?? START_MS) + choice.hours * HOUR;
    case 'same instant':
      return readings.length ? pickOf(readings, choice.pick).at : START_MS;
    case 'twin': {
      const inRepeatedHour = readings.filter((r) =>
        DST_CHANGES_UTC.some((c, i) => i % 2 === 1 && r.at >= c - HOUR && r.at < c + HOUR),
      );
      if (!inRepeatedHour.length) return DST_CHANGES_UTC[1] - HOUR / 2;
      const r = pickOf(inRepeatedHour, choice.pick);
      const change = DST_CHANGES_UTC.find((c) => r.at >= c - HOUR && r.at < c + HOUR)!;
      return r.at < change ? r.at + HOUR : r.at - HOUR;
    }
  }
}

/** A lifetime value at `at` that every reading rule accepts (between the neighbours, within pace). */
function validLifetime(
  readings: Stored[],
  at: number,
  frac: number,
  decimals: number,
  except?: string,
) {
  const others = readings.filter((r) => r.id !== except);
  const previous = others.filter((r) => r.at <= at).at(-1);
  const next = others.find((r) => r.at > at);
  let lo = previous?.lifetime ?? 0;
  let hi = next?.lifetime ?? lo + 500;
  if (previous) {
    hi = Math.min(hi, previous.lifetime + (MAX_PER_DAY * (at - previous.at + SKEW_MS)) / DAY);
  }
  if (next) lo = Math.max(lo, next.lifetime - (MAX_PER_DAY * (next.at - at + SKEW_MS)) / DAY);
  const scale = 10 ** decimals;
  // rounded inwards, so the rounded value still lies between the bounds
  const value = Math.ceil((lo + frac * Math.max(0, hi - lo)) * scale - 1e-6) / scale;
  return Math.min(value, Math.floor(hi * scale + 1e-6) / scale);
}

/** Runs one step through the services; a refusal (422) is expected for steps meant to break a rule. */
export async function applyStep(
  access: OrgAccess,
  machine: Machine,
  s: Step,
  meter: StepMeter,
): Promise<'done' | 'refused'> {
  const readings = await storedReadings(machine, meter);
  const replacements = await replacementsOf(machine, meter);
  const meterId = meter.named ? meter.id : undefined;
  const raw = (lifetime: number, at: number) =>
    Math.round(toRawValue(lifetime, at, replacements) * 1000) / 1000;
  try {
    switch (s.kind) {
      case 'insert': {
        const at = timeOf(s.at, readings);
        const lifetime = s.bad
          ? (readings.filter((r) => r.at <= at).at(-1)?.lifetime ?? 0) - 7
          : validLifetime(readings, at, s.frac, s.decimals);
        await logReading(access, machine.id, {
          value: raw(lifetime, at),
          takenAt: new Date(at).toISOString(),
          meterId,
        });
        break;
      }
      case 'batch': {
        // each checked against the others too: values follow the times of the whole batch
        const times = s.at.map((c) => timeOf(c, readings)).sort((a, b) => a - b);
        const base = validLifetime(readings, times[0], s.frac, s.decimals);
        await logBulkReadings(
          access,
          times.map((at) => ({
            machineId: machine.id,
            meterId,
            value: raw(base, at),
            takenAt: new Date(at).toISOString(),
          })),
        );
        break;
      }
      case 'repeat': {
        if (!readings.length) return 'done';
        const r = pickOf(readings, s.pick);
        await logReading(access, machine.id, {
          value: raw(r.lifetime, r.at),
          takenAt: new Date(r.at).toISOString(),
          meterId,
        });
        break;
      }
      case 'correct': {
        if (!readings.length) return 'done';
        const r = pickOf(readings, s.pick);
        const row = (await MeterReading.findByPk(r.id))!;
        const at = s.at ? timeOf(s.at, readings) : r.at;
        const lifetime = validLifetime(readings, at, s.frac, s.decimals, r.id);
        await correctReading(access, machine, row, {
          value: raw(lifetime, at),
          takenAt: new Date(at),
        });
        break;
      }
      case 'delete': {
        if (!readings.length) return 'done';
        await deleteReading(
          access,
          machine,
          (await MeterReading.findByPk(pickOf(readings, s.pick).id))!,
        );
        break;
      }
      case 'replace': {
        const last = readings.at(-1);
        const at = (last?.at ?? START_MS) + s.hours * HOUR;
        const oldFinal = raw((last?.lifetime ?? 0) + s.extra * s.hours * 0.5, at);
        await replaceMeter(access, machine, {
          meterId,
          oldFinalValue: Math.round(oldFinal * 100) / 100,
          newStartValue: s.newStart,
          replacedAt: new Date(at),
          note: '',
        });
        break;
      }
    }
    return 'done';
  } catch (err) {
    if (err instanceof AppError && err.status === 422) return 'refused';
    throw err;
  }
}
