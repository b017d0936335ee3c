// Building blocks of the service library: one task builder, wear parts, and the service items
// that most engine-driven machines share. Every interval is common practice, not a
// manufacturer's figure; the machine's operator's manual wins wherever the two differ.
import type { Hazard, TaskInput, TaskPart } from '../../schemas/schedule';
import { DAILY_CARE_MAX_HOURS, dailyItems } from './daily-care';

/** What every library task says about its interval, so the label stays once it is applied. */
export const COMMON_PRACTICE_NOTE =
  "Interval: common practice, not the manufacturer's figure — this machine's operator's manual wins.";

/** What the library says of itself, wherever it is offered. */
export const SERVICE_LIBRARY_NOTE =
  "The intervals of the service library are common practice, not a manufacturer's figures. " +
  "Where this machine's operator's manual says otherwise, the manual wins: edit each task to " +
  'match it. Parts carry no part numbers; enter your own.';

const LOCK_OUT = 'Park on level ground, lower everything, stop the engine and take the key. ';

type Fields = Partial<TaskInput> & Pick<TaskInput, 'name' | 'instructions'>;

/** A full library task: warning windows follow from the intervals (about a tenth). */
export function libTask(fields: Fields): TaskInput {
  const intervalMeter = fields.intervalMeter ?? null;
  const intervalDays = fields.intervalDays ?? null;
  return {
    intervalMeter,
    intervalDays,
    firstServiceMeter: null,
    warnMeter: intervalMeter === null ? null : Math.max(1, Math.round(intervalMeter / 10)),
    warnDays:
      intervalDays === null ? null : Math.min(30, Math.max(3, Math.round(intervalDays / 12))),
    parts: [],
    fluids: [],
    labourHours: null,
    safetyNotes: '',
    hazards: [],
    dailyCare: false,
    seasonAnchor: null,
    seasonOffsetDays: null,
    ...fields,
    instructions: `${fields.instructions}\n\n${COMMON_PRACTICE_NOTE}`,
  };
}

/** A wear part: inspected at each service, replaced when worn, never counted as used. */
export const wear = (description: string, quantity = 1): TaskPart => ({
  partNumber: '',
  description,
  quantity,
  wearPart: true,
});

/**
 * Grease points on a meter interval; PTO shaft crosses and loader pivots every 8–10 h. A round of
 * a working day or less is daily care, signed off by the operator in the walkaround.
 */
export function grease(name: string, every: number, hazards: Hazard[], what: string): TaskInput {
  return libTask({
    name,
    intervalMeter: every,
    labourHours: 0.3,
    hazards,
    dailyCare: every <= DAILY_CARE_MAX_HOURS,
    instructions: `${LOCK_OUT}${what} Wipe each nipple first; pump until fresh grease shows.`,
  });
}

/** The PTO shaft of a trailed or mounted machine: crosses and sliding tubes every 8 h. */
export const ptoShaft = (): TaskInput =>
  grease(
    'PTO shaft crosses and sliding tubes',
    8,
    ['pto'],
    'Grease both universal-joint crosses and the sliding profile tubes; check the guard turns freely and its chains are fitted.',
  );

/** Wheel nuts re-torqued soon after a wheel is fitted (break-in style first point), then checked. */
export function wheelNuts(unit: 'h' | 'km' = 'h'): TaskInput {
  const km = unit === 'km';
  return libTask({
    name: 'Wheel nut torque',
    firstServiceMeter: km ? 100 : 10,
    intervalMeter: km ? 10000 : 250,
    labourHours: 0.5,
    hazards: ['tyres_rims'],
    instructions: `Torque every wheel nut in a cross pattern to the manual's figure. After any wheel is fitted or refitted, re-torque at about ${km ? '50–100 km' : '10 h'} and again at ${km ? '500 km' : '50 h'}: record a service of this task each time.`,
  });
}

/** Gearbox oil of an implement: first change after break-in, then seasonal or by hours. */
export function gearboxOil(name: string, what: string, hazards: Hazard[] = ['hot_fluid']) {
  return libTask({
    name,
    firstServiceMeter: 50,
    intervalMeter: 500,
    intervalDays: 365,
    labourHours: 0.75,
    hazards,
    instructions: `${LOCK_OUT}${what} Drain warm, clean the magnetic plug, refill with the manual's oil to the level plug. The first change, after about 50 h, takes out the running-in metal.`,
  });
}

export interface EngineOptions {
  /** exhaust aftertreatment fitted: DPF check; with `def`, the DEF filter too */
  dpf?: boolean;
  def?: boolean;
  /** the cab's air filter: 'charcoal' on a sprayer, 'dust' elsewhere; none without a cab */
  cab?: 'dust' | 'charcoal' | null;
  /** the radiator screen as a daily item (harvesters blow it out in their daily clean-down) */
  screen?: boolean;
}

/** The engine and cab items of a self-propelled diesel machine on hour intervals. */
export function engineTasks(opts: EngineOptions = {}): TaskInput[] {
  const { dpf = true, def = dpf, cab = 'dust', screen = true } = opts;
  const tasks: TaskInput[] = [
    libTask({
      name: 'Engine oil and filter',
      intervalMeter: 500,
      intervalDays: 365,
      labourHours: 1,
      hazards: ['hot_fluid'],
      instructions: `${LOCK_OUT}Drain warm oil, replace the filter, refill with the manual's grade to the full mark, run and check for leaks.`,
    }),
    libTask({
      name: 'Fuel filters and water separator',
      intervalMeter: 500,
      intervalDays: 365,
      labourHours: 0.75,
      instructions: `${LOCK_OUT}Replace the primary filter / water separator and the secondary filter, drain water, prime the system. No open flames; catch the fuel.`,
    }),
    libTask({
      name: 'Engine air filter',
      intervalMeter: 500,
      intervalDays: 365,
      labourHours: 0.3,
      instructions:
        'Replace the outer element at the interval or when the restriction indicator shows; check the housing and intake hose for cracks. Change the inner safety element every third outer element; never clean it.',
    }),
    libTask({
      name: 'Hydraulic/transmission filters',
      firstServiceMeter: 50,
      intervalMeter: 500,
      intervalDays: 365,
      labourHours: 0.75,
      hazards: ['hydraulic_pressure', 'hot_fluid'],
      instructions: `${LOCK_OUT}Relieve the pressure, replace the elements, top up and check the level with everything lowered. The first change, after about 50 h, catches the running-in debris.`,
    }),
    libTask({
      name: 'Hydraulic/transmission oil',
      intervalMeter: 1500,
      intervalDays: 730,
      labourHours: 2.5,
      hazards: ['hydraulic_pressure', 'hot_fluid'],
      instructions: `${LOCK_OUT}Drain the system, clean the suction screen, refill with the manual's oil and cycle every function to purge air.`,
    }),
    libTask({
      name: 'Coolant change',
      intervalMeter: 3000,
      intervalDays: 1095,
      labourHours: 2,
      hazards: ['hot_fluid', 'chemicals'],
      instructions:
        "Drain and flush the cooling system cold, refill with the manual's coolant and bleed air; check hoses, clamps and the cap.",
    }),
    libTask({
      name: 'Coolant freeze-point test before winter',
      intervalDays: 365,
      labourHours: 0.2,
      hazards: ['hot_fluid'],
      instructions:
        'Each autumn before the first frost, test the freeze point with a refractometer (and the inhibitor with test strips); correct the mix if it protects less than the coldest expected night. Open the cap only cold.',
    }),
    libTask({
      name: 'Engine valve clearance',
      intervalMeter: 2000,
      labourHours: 3,
      instructions:
        "Engine cold: check and set the inlet and exhaust valve clearances to the manual's figures, turning the engine by hand with the starter disabled; fit a new rocker-cover gasket if needed.",
    }),
  ];
  if (dpf)
    tasks.push(
      libTask({
        name: 'DPF and exhaust aftertreatment check',
        intervalMeter: 500,
        labourHours: 0.5,
        hazards: ['hot_fluid'],
        instructions:
          'Read the soot and ash load and the regeneration history on the display; look for exhaust leaks, soot trails and damaged sensors. Have the filter cleaned of ash at the interval the manual gives. Exhaust parts stay hot long after a regeneration.',
      }),
    );
  if (def)
    tasks.push(
      libTask({
        name: 'DEF filter',
        intervalMeter: 3000,
        intervalDays: 1095,
        labourHours: 0.5,
        hazards: ['chemicals'],
        instructions:
          'Replace the DEF pump filter and clean the tank strainer; use only fresh, certified DEF and keep the tank cap clean. DEF irritates eyes and skin and corrodes many metals: rinse spills with water.',
      }),
    );
  if (cab)
    tasks.push(
      cab === 'charcoal'
        ? libTask({
            name: 'Cab charcoal filter',
            intervalMeter: 400,
            intervalDays: 365,
            labourHours: 0.3,
            hazards: ['chemicals'],
            instructions:
              'Replace the activated-carbon cab filter and the dust pre-filter; replace it at once if you can smell chemicals in the cab. Wear gloves: a used filter holds chemical residue; bag it and dispose of it as the label of the products says.',
          })
        : libTask({
            name: 'Cab air filter',
            intervalMeter: 250,
            intervalDays: 365,
            labourHours: 0.3,
            instructions:
              'Clean the fresh-air and recirculation filters with low-pressure air from the clean side, or replace them when damaged or clogged; more often in dust.',
          }),
    );
  tasks.push(...dailyItems(libTask, { def, screen }));
  return tasks;
}

/** The calendar items: battery, fire extinguisher and an annual safety inspection. */
export function calendarTasks(
  inspection: string,
  extinguisher = true,
  inspectionHazards: Hazard[] = [],
): TaskInput[] {
  const tasks = [
    libTask({
      name: 'Annual safety inspection',
      intervalDays: 365,
      labourHours: 2,
      hazards: inspectionHazards,
      instructions: inspection,
    }),
    libTask({
      name: 'Battery check',
      intervalDays: 180,
      labourHours: 0.3,
      hazards: ['battery'],
      instructions:
        'Clean and tighten the terminals, check the charge and the hold-down, look for cracks and swelling.',
    }),
  ];
  if (extinguisher)
    tasks.push(
      libTask({
        name: 'Fire extinguisher check',
        intervalDays: 365,
        labourHours: 0.2,
        instructions:
          'Check the gauge, seal, hose and mounting; have it serviced as local rules require.',
      }),
    );
  return tasks;
}

/** What an annual inspection of a self-propelled machine covers. */
export const INSPECT_SELF_PROPELLED =
  'Lights and beacons, slow-moving-vehicle sign, seat belt and rollover or cab structure, guards and shields, steering, brakes and parking brake, mirrors, emergency stop.';

/** What an annual inspection of a trailed machine covers. */
export const INSPECT_TRAILED =
  'Hitch, drawbar and safety chain, lights and reflectors, slow-moving-vehicle sign, guards and shields, brakes if fitted, hoses and couplers, tyres.';
