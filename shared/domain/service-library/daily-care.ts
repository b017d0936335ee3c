// Daily care: what the operator does at the start of each working day and signs off inside the
// walkaround (a tick resets the task; no service record, no overdue e-mail). Common practice, not
// a manufacturer's figure; the machine's operator's manual wins.
import type { TaskInput } from '../../schemas/schedule';

/**
 * The longest meter interval that is daily care: about one working day (hours). Grease points on
 * 8–10 h are the operator's round each morning; 50 h points are a weekly job for the shop.
 */
export const DAILY_CARE_MAX_HOURS = 10;

const ENGINE_OFF = 'Engine off, key out, parking brake on. ';

export interface DailyItemOptions {
  /** exhaust aftertreatment with a DEF tank */
  def: boolean;
  /** the radiator or rotary screen (harvesters carry it in their daily clean-down instead) */
  screen: boolean;
}

/** The daily items of a self-propelled diesel machine: water separator, DEF, radiator screen. */
export function dailyItems(
  build: (fields: Partial<TaskInput> & Pick<TaskInput, 'name' | 'instructions'>) => TaskInput,
  { def, screen }: DailyItemOptions,
): TaskInput[] {
  const tasks: TaskInput[] = [
    build({
      name: 'Fuel water separator: let the water out',
      intervalMeter: DAILY_CARE_MAX_HOURS,
      labourHours: 0.1,
      hazards: ['chemicals'],
      dailyCare: true,
      instructions: `${ENGINE_OFF}Open the separator's bowl valve into a container until clean diesel runs, then close it; water in the fuel ruins injectors. No flames; gloves, as diesel harms skin. Dispose of the water and fuel as local rules say.`,
    }),
  ];
  if (def)
    tasks.push(
      build({
        name: 'DEF level: check and top up',
        intervalMeter: DAILY_CARE_MAX_HOURS,
        labourHours: 0.1,
        hazards: ['chemicals'],
        dailyCare: true,
        instructions: `${ENGINE_OFF}Check the DEF gauge and top up with fresh, certified DEF from a clean container; keep the cap and filler clean. DEF irritates eyes and skin: rinse spills with water.`,
      }),
    );
  if (screen)
    tasks.push(
      build({
        name: 'Radiator screen: blow out',
        intervalMeter: DAILY_CARE_MAX_HOURS,
        labourHours: 0.2,
        hazards: ['hot_fluid'],
        dailyCare: true,
        instructions: `${ENGINE_OFF}Wait for the fan to stop. Take out or open the radiator screen and blow chaff and dust off it and the cooler faces with low-pressure air, from the clean side; wear eye protection. Never open the radiator cap hot.`,
      }),
    );
  return tasks;
}
