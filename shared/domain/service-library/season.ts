// Season services of the library (issue 11): the pre-season service, due a set number of days
// before the machine's season starts, and the storage service, due a set number of days after it
// ends. They follow each machine's season months (shared/domain/season-dates.ts), so a yearly
// date never drifts into harvest; on a machine without season months they wait for them. The
// offsets are common practice, as the rest of the library: the operator's manual wins.
import type { TaskInput } from '../../schemas/schedule';
import { DEFAULT_SEASON_WARN_DAYS } from '../due-point';
import type { SeasonAnchor } from '../season-dates';
import { libTask } from './common';

type SeasonFields = Omit<Partial<TaskInput>, 'intervalDays' | 'seasonAnchor' | 'seasonOffsetDays'> &
  Pick<TaskInput, 'name' | 'instructions'>;

function seasonTask(anchor: SeasonAnchor, days: number, fields: SeasonFields): TaskInput {
  return libTask({
    warnDays: DEFAULT_SEASON_WARN_DAYS,
    ...fields,
    // the season gives the date: no day interval (a meter interval may come first)
    intervalDays: null,
    seasonAnchor: anchor,
    seasonOffsetDays: days,
  });
}

/** A pre-season service, due `days` calendar days before the machine's season starts. */
export const preSeasonService = (days: number, fields: SeasonFields) =>
  seasonTask('before_start', days, fields);

/** A storage (post-season) service, due `days` calendar days after the machine's season ends. */
export const storageService = (days: number, fields: SeasonFields) =>
  seasonTask('after_end', days, fields);

/**
 * The pre-season inspection of a self-propelled harvest machine, three weeks before the season
 * so that worn parts can be ordered in time. `what` names the machine's own crop parts.
 */
export const harvestPreSeason = (what: string): TaskInput =>
  preSeasonService(21, {
    name: 'Pre-season inspection',
    labourHours: 4,
    hazards: ['stored_energy', 'raised_load', 'tyres_rims'],
    instructions:
      `Three weeks before the season, so parts can come in time. Engine off, key out, crop parts on their locks: ${what} ` +
      'Check belts, chains and bearings and order what is worn; clear out rodent nests and old crop; check tyre pressures and wheel nuts; test the lights, horn and the header or crop-part lock. ' +
      'Then, with everyone clear, run each drive at low idle from the seat and listen for bearings.',
  });

/**
 * The storage service of a self-propelled harvest machine, two weeks after the season's end:
 * residue out before it draws moisture and rodents, springs relaxed, bright parts protected.
 */
export const harvestStorage = (name: string, what: string): TaskInput =>
  storageService(14, {
    name,
    labourHours: 6,
    hazards: ['raised_load', 'stored_energy'],
    instructions:
      `After the season: ${what} Grease every point and oil the chains; relieve belt tension as the manual says (tensioner springs hold energy: release them with the tool, never by hand); ` +
      'fill the fuel tank against condensation; fog the engine or cover the intake and exhaust openings if the manual says so; cover or shed the machine with crop parts lowered on blocks.',
  });

/**
 * The storage service of a trailed hay machine, two weeks after its season: crop and dust out,
 * springs and clutches relaxed as the manual says, stored lowered under cover.
 */
export const hayStorage = (what: string): TaskInput =>
  storageService(14, {
    name: 'Storage service',
    labourHours: 2,
    hazards: ['pto', 'stored_energy', 'raised_load'],
    instructions:
      'After the season, PTO disengaged, tractor stopped, key out: blow out crop and dust (they hold moisture and draw rodents), ' +
      `${what} Grease every point, oil the chains, touch up bare metal, and store lowered on blocks under cover.`,
  });
