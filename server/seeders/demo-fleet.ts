// The invented demo scenario (see the project's SCENARIO notes): both farms' fleets and the due
// states the demo aims for. Names, farms and makes are made up.
import type { DemoMachine } from './demo-machine';
import { LARKSPUR_MACHINES } from './demo-fleet-larkspur';
import { OSIER_MACHINES } from './demo-fleet-osier';

export const DEMO_MACHINES: DemoMachine[] = [...LARKSPUR_MACHINES, ...OSIER_MACHINES];

/** The machine with the replaced hour meter, and how long ago (days) the meter was replaced. */
export const METER_REPLACEMENT = { fleetNumber: 'T-03', daysAgo: 426 } as const;

/**
 * Tasks the demo leaves overdue, "one interval behind" (fleet number, task name). Some overdue
 * and some due-soon tasks make the due list worth looking at; most tasks stay fine.
 */
export const DEMO_OVERDUE: [string, string][] = [
  ['T-02', 'Engine oil and filter'],
  ['T-03', 'Battery check'],
  ['S-01', 'Fuel filters and water separator'],
  ['TR-01', 'Annual safety inspection'],
  ['T-11', 'Hydraulic/transmission filters'],
  ['MW-01', 'Planetary gearbox oil'],
  ['TH-01', 'Fire extinguisher check'],
];

/** Tasks tried first when the demo needs more due-soon tasks. */
export const DEMO_DUE_SOON: [string, string][] = [
  ['T-01', 'Engine air filter'],
  ['C-01', 'Engine oil and filter'],
  ['B-01', 'Main gearbox oil'],
  ['T-02', 'Fuel filters and water separator'],
  ['T-11', 'Engine oil and filter'],
  ['TH-01', 'Engine air filter'],
  ['FH-01', 'Annual safety inspection'],
  ['BW-01', 'Drive chains, belts and rollers'],
];

/** How many due-soon tasks each farm shows (at least / at most). */
export const DUE_SOON_RANGE = { min: 4, max: 7 } as const;
