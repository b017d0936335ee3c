// Daily care (issue 11) in words and states: where a grease round or daily item stands today,
// and the line the walkaround and the dashboard show ("Last greased 12 h ago, every 10 h").
import { englishDateText, englishMeter, type DateFormat, type MeterFormat } from './due-words';
import type { DueStatus } from './types';

/** Where a daily-care task stands today: past its interval, not yet done today, or done today. */
export const CARE_STATES = ['overdue', 'not_today', 'done_today'] as const;
export type CareState = (typeof CARE_STATES)[number];

/**
 * Where a daily-care task stands on `today` (ISO local date): overdue when its due point is past
 * (a 14 h harvest day outruns a 10 h grease interval even when it was done this morning), else
 * done today when it was, else not yet today.
 */
export function careState(
  dueStatus: DueStatus | null,
  lastDoneOn: string | null,
  today: string,
): CareState {
  if (dueStatus === 'overdue') return 'overdue';
  return lastDoneOn === today ? 'done_today' : 'not_today';
}

export interface CareFacts {
  name: string;
  /** the task's instructions: a round whose name or instructions speak of grease is greased */
  instructions?: string;
  intervalMeter: number | null;
  intervalDays: number | null;
  lastDoneOn: string | null;
  lastDoneMeter: number | null;
  /** meter units run since it was last done (null when unknown) */
  sinceMeter: number | null;
}

/** A grease round: its name or its instructions speak of grease ("Loader pivots and bucket pins"). */
export const isGreaseRound = (facts: Pick<CareFacts, 'name' | 'instructions'>) =>
  /grease/i.test(facts.name) || /\bgrease\b/i.test(facts.instructions ?? '');

/** "every 10 h", "every day", "every 10 h or 1 day": the task's interval. */
export function careIntervalText(
  facts: CareFacts,
  unit: string,
  meter: MeterFormat = englishMeter,
) {
  const parts: string[] = [];
  if (facts.intervalMeter !== null) parts.push(meter(facts.intervalMeter, unit));
  if (facts.intervalDays !== null)
    parts.push(facts.intervalDays === 1 ? 'day' : `${facts.intervalDays} days`);
  return parts.length ? `every ${parts.join(' or ')}` : '';
}

/**
 * "Last greased 12 h ago, every 10 h"; "Last done today, every 10 h"; "Not signed off yet, every
 * 10 h". Meter units; `today` an ISO local date.
 */
export function careSinceText(
  facts: CareFacts,
  unit: string,
  today: string,
  formats: { meter?: MeterFormat; date?: DateFormat } = {},
): string {
  const meter = formats.meter ?? englishMeter;
  const date = formats.date ?? englishDateText;
  const every = careIntervalText(facts, unit, meter);
  const verb = isGreaseRound(facts) ? 'greased' : 'done';
  let since: string;
  if (facts.lastDoneOn === null && facts.lastDoneMeter === null) since = 'Not signed off yet';
  else if (facts.sinceMeter !== null && facts.sinceMeter > 0)
    since = `Last ${verb} ${meter(facts.sinceMeter, unit)} ago`;
  else if (facts.lastDoneOn === today) since = `Last ${verb} today`;
  else if (facts.sinceMeter !== null) since = `Last ${verb} at the latest reading`;
  else if (facts.lastDoneOn !== null) since = `Last ${verb} ${date(facts.lastDoneOn)}`;
  else since = `Last ${verb} at ${meter(facts.lastDoneMeter!, unit)}`;
  return every ? `${since}, ${every}` : since;
}

export const CARE_STATE_LABELS: Record<CareState, string> = {
  overdue: 'Overdue',
  not_today: 'Not yet today',
  done_today: 'Done today',
};
