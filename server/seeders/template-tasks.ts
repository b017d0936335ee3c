// Building blocks of the demo schedule templates: safety notes per hazard, fluids in the farm's
// units, and the service items most engine-driven machines share. Intervals are typical figures
// of common practice for the demo, not taken from any manual.
import type { UnitSystem } from '../../shared/constants';
import type { Hazard, TaskFluid, TaskInput, TaskPart } from '../../shared/schemas/schedule';

/**
 * A full TaskInput from the fields that matter. The caution of its hazards comes from the one
 * table (shared/domain/hazards.ts) wherever the task is shown, so its own safety notes stay empty
 * unless the task needs words of its own.
 */
export function task(fields: Partial<TaskInput> & Pick<TaskInput, 'name'>): TaskInput {
  const hazards = fields.hazards ?? [];
  return {
    intervalMeter: null,
    intervalDays: null,
    firstServiceMeter: null,
    warnMeter: null,
    warnDays: null,
    parts: [],
    fluids: [],
    labourHours: null,
    instructions: '',
    hazards,
    dailyCare: false,
    seasonAnchor: null,
    seasonOffsetDays: null,
    ...fields,
    safetyNotes: fields.safetyNotes ?? '',
  };
}

const round1 = (n: number) => Math.round(n * 10) / 10;

/** A fluid given in litres or kilograms, shown in gallons / pounds on an imperial farm. */
export function fluid(
  units: UnitSystem,
  kind: string,
  amount: number,
  measure: 'L' | 'kg',
): TaskFluid {
  if (units === 'metric') return { kind, volume: amount, unit: measure };
  if (measure === 'kg') return { kind, volume: round1(amount * 2.20462), unit: 'lb' };
  const gallons = amount / 3.78541;
  return gallons < 1
    ? { kind, volume: round1(gallons * 4), unit: 'qt' }
    : { kind, volume: round1(gallons), unit: 'gal' };
}

export const part = (partNumber: string, description: string, quantity = 1): TaskPart => ({
  partNumber,
  description,
  quantity,
  wearPart: false,
});

/** What differs between categories in the shared engine items: part-number series and capacities. */
export interface EngineSpec {
  /** two digits that make this category's part numbers (HS-OF-<code>20 …) */
  code: string;
  engineOilL: number;
  hydraulicOilL: number;
  coolantL: number;
  /** fluid kind of the hydraulic/transmission system */
  hydraulicOil: string;
}

/** What an annual inspection of a self-propelled machine covers. */
export const INSPECT_SELF_PROPELLED =
  'Lights and beacons, slow-moving-vehicle sign, seat belt and rollover or cab structure, guards and shields, steering, brakes and parking brake, mirrors, emergency stop.';

export const UTF = 'Universal tractor fluid (UTF)';
export const HYD46 = 'Hydraulic oil ISO VG 46';

const LOCK_OUT = 'Park on level ground, lower all equipment, stop the engine and take the key. ';

/** The service items of an engine-driven machine on hour intervals (warning windows ~10%). */
export function engineTasks(units: UnitSystem, s: EngineSpec): TaskInput[] {
  const pn = (kind: string, n: number) => `HS-${kind}-${s.code}${n}`;
  return [
    task({
      name: 'Engine oil and filter',
      intervalMeter: 500,
      intervalDays: 365,
      warnMeter: 50,
      warnDays: 30,
      parts: [part(pn('OF', 20), 'Engine oil filter, spin-on')],
      fluids: [fluid(units, 'Engine oil 15W-40', s.engineOilL, 'L')],
      labourHours: 1,
      instructions: `${LOCK_OUT}Drain warm oil, replace the filter, refill to the full mark, run and check for leaks.`,
      hazards: ['hot_fluid'],
    }),
    task({
      name: 'Hydraulic/transmission filters',
      intervalMeter: 500,
      warnMeter: 50,
      warnDays: 14,
      parts: [
        part(pn('HF', 21), 'Hydraulic/transmission filter element'),
        part(pn('HF', 22), 'Charge pump filter'),
      ],
      labourHours: 0.75,
      instructions: `${LOCK_OUT}Replace both elements, top up the reservoir and check the level with everything lowered.`,
      hazards: ['hydraulic_pressure', 'hot_fluid'],
    }),
    task({
      name: 'Hydraulic/transmission oil',
      intervalMeter: 1500,
      intervalDays: 730,
      warnMeter: 150,
      warnDays: 60,
      parts: [part(pn('HF', 23), 'Suction screen gasket')],
      fluids: [fluid(units, s.hydraulicOil, s.hydraulicOilL, 'L')],
      labourHours: 2.5,
      instructions: `${LOCK_OUT}Drain the system, clean the suction screen, refill and cycle every function to purge air.`,
      hazards: ['hydraulic_pressure', 'hot_fluid'],
    }),
    task({
      name: 'Fuel filters',
      intervalMeter: 500,
      warnMeter: 50,
      warnDays: 14,
      parts: [
        part(pn('FF', 24), 'Primary fuel filter / water separator'),
        part(pn('FF', 25), 'Secondary fuel filter'),
      ],
      labourHours: 0.75,
      instructions: `${LOCK_OUT}Replace both filters, drain water from the separator and prime the system. No open flames.`,
    }),
    task({
      name: 'Air filter inspection',
      intervalMeter: 250,
      warnMeter: 25,
      warnDays: 14,
      parts: [part(pn('AF', 26), 'Air filter outer element')],
      labourHours: 0.3,
      instructions: `Check the restriction indicator and the outer element; replace it (${pn('AF', 26)}) when restricted or damaged. Never clean the inner safety element.`,
    }),
    task({
      name: 'Coolant',
      intervalMeter: 3000,
      intervalDays: 1095,
      warnMeter: 300,
      warnDays: 90,
      fluids: [fluid(units, 'Coolant, extended-life, 50/50 premix', s.coolantL, 'L')],
      labourHours: 2,
      instructions:
        'Drain and flush the cooling system cold, refill with premix and bleed air; check hoses and the cap.',
      hazards: ['hot_fluid'],
    }),
  ];
}

/** Grease points on a short meter interval (daily work); no day window, the meter says it. */
export function greaseTask(
  units: UnitSystem,
  name: string,
  interval: number,
  kg: number,
  hazards: Hazard[],
  instructions: string,
): TaskInput {
  return task({
    name,
    intervalMeter: interval,
    warnMeter: Math.max(1, Math.round(interval / 10)),
    fluids: [fluid(units, 'Grease, lithium complex EP2', kg, 'kg')],
    labourHours: 0.3,
    instructions: `${LOCK_OUT}${instructions}`,
    hazards,
  });
}

/** PTO clutch and brake check (tractors). */
export function ptoCheckTask(): TaskInput {
  return task({
    name: 'PTO clutch and brake check',
    intervalMeter: 1000,
    warnMeter: 100,
    warnDays: 14,
    labourHours: 1.5,
    instructions:
      'Check PTO engagement, slip and brake stopping time against the manual; inspect shaft guards and shields.',
    hazards: ['pto', 'stored_energy'],
  });
}

/** The calendar items: annual safety inspection, battery, fire extinguisher (as chosen). */
export function calendarTasks(opts: {
  inspection: string;
  battery?: boolean;
  extinguisher?: boolean;
}): TaskInput[] {
  const tasks = [
    task({
      name: 'Annual safety inspection',
      intervalDays: 365,
      warnDays: 30,
      labourHours: 2,
      instructions: opts.inspection,
    }),
  ];
  if (opts.battery !== false) {
    tasks.push(
      task({
        name: 'Battery check',
        intervalDays: 180,
        warnDays: 14,
        labourHours: 0.3,
        instructions:
          'Clean and tighten terminals, check the charge and the hold-down, look for cracks and swelling.',
        hazards: ['battery'],
      }),
    );
  }
  if (opts.extinguisher !== false) {
    tasks.push(
      task({
        name: 'Fire extinguisher check',
        intervalDays: 365,
        warnDays: 30,
        labourHours: 0.2,
        instructions:
          'Check the gauge, seal, hose and mounting; have it serviced as local rules require.',
      }),
    );
  }
  return tasks;
}
