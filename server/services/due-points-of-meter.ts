// The due math of one meter, pure: its usage estimate from the stored daily summary and each of
// its tasks' due points (shared/domain), and the usage as stored. forecast.ts reads and writes the
// rows around it.
import type { MachineForecast } from '../models';
import {
  computeDuePoint,
  estimateUsage,
  isoFromDayNumber,
  localDayNumber,
  type DuePoint,
  type UsageEstimate,
} from '../../shared/domain';
import type { DueTask } from './forecast-rows';

/**
 * The due point of each task of one meter, from its summary, as of a local date; the machine's
 * season months (1–12, [] = all year) date its season services.
 */
export function duePointsFor(
  forecast: Pick<MachineForecast, 'daily' | 'lastValue' | 'firstTakenAt' | 'firstValue'> | null,
  tasks: DueTask[],
  timeZone: string,
  asOfIso: string,
  now: Date,
  seasonMonths: readonly number[] = [],
  plannedSeasonUse: number | null = null,
): { usage: UsageEstimate; points: Map<string, DuePoint> } {
  const daily = forecast?.daily ?? [];
  // season months are the prior of a machine in its first year; the season's plan that of its pace
  const usage = estimateUsage(daily, localDayNumber(now, timeZone), {
    seasonMonths,
    plannedSeasonUse,
  });
  const startIso = forecast?.firstTakenAt
    ? isoFromDayNumber(localDayNumber(forecast.firstTakenAt, timeZone))
    : null;
  // A machine whose first reading was above zero came with hours: a task added to it without a
  // last service has an unknown history, not the "serviced on time since new" assumption.
  const cameWithHours = (forecast?.firstValue ?? 0) > 0;
  const points = new Map<string, DuePoint>();
  for (const task of tasks) {
    points.set(
      task.id,
      computeDuePoint(
        {
          intervalMeter: task.intervalMeter,
          intervalDays: task.intervalDays,
          firstServiceMeter: task.firstServiceMeter,
          warnMeter: task.warnMeter,
          warnDays: task.warnDays,
          lastDoneMeter: task.lastDoneMeter,
          lastDoneOn: task.lastDoneOn,
          countFromMeter: task.countFromMeter,
          countFromOn: task.countFromOn,
          historyUnknown: task.historyUnknown && cameWithHours,
          seasonAnchor: task.seasonAnchor ?? null,
          seasonOffsetDays: task.seasonOffsetDays ?? null,
        },
        usage,
        asOfIso,
        forecast?.lastValue ?? null,
        startIso,
        seasonMonths,
      ),
    );
  }
  return { usage, points };
}

/**
 * The usage estimate as stored: without its daily profiles (a few thousand numbers), which only
 * date the due points computed beside it and are never read back.
 */
export function storedUsage(usage: UsageEstimate): UsageEstimate {
  const { profile: _p, profileFast: _f, profileSlow: _s, ...kept } = usage;
  return kept;
}
