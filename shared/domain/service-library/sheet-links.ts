// Which of the service library's tasks take their fluid volumes and filter numbers from the
// machine's spec sheet, by task name (as the library applies tasks: by name, case aside). Kept
// apart from the task definitions so a task's line is only written once the sheet has a figure
// for it: a library line never carries a made-up quantity. The quantities of parts are the usual
// count per change (common practice); the sheet gives the numbers, the farm edits the counts.
import type { CapacityKey, FilterRole } from '../../schemas/spec-keys';

export interface SheetLinks {
  /** compartments whose change quantity (the manual's refill figure) the task uses */
  fluids: CapacityKey[];
  /** filters the task replaces, with how many */
  parts: { role: FilterRole; quantity: number }[];
}

const one = (...roles: FilterRole[]) => roles.map((role) => ({ role, quantity: 1 }));

/** By library task name. The inner air element is changed every third outer one: not linked. */
const LINKS: Record<string, SheetLinks> = {
  'Engine oil and filter': { fluids: ['engineOil'], parts: one('engineOil') },
  'Fuel filters and water separator': { fluids: [], parts: one('fuelPrimary', 'fuelSecondary') },
  'Engine air filter': { fluids: [], parts: one('airOuter') },
  'Hydraulic/transmission filters': { fluids: [], parts: one('hydraulic', 'transmission') },
  'Hydraulic/transmission oil': { fluids: ['hydraulicTransmission'], parts: [] },
  'Coolant change': { fluids: ['coolant'], parts: [] },
  'DEF filter': { fluids: [], parts: one('def') },
  'Cab air filter': { fluids: [], parts: one('cab') },
  'Cab charcoal filter': { fluids: [], parts: one('cab') },
  'Front axle and planetary hub oil': { fluids: ['frontAxle'], parts: [] },
  'Front and rear axle planetary oil': { fluids: ['frontAxle', 'rearAxle'], parts: [] },
  'Final drive and planetary oil': { fluids: ['rearAxle'], parts: [] },
  'Axle and hub oil': { fluids: ['frontAxle', 'rearAxle'], parts: [] },
  'Transmission and axle oil': { fluids: ['hydraulicTransmission', 'rearAxle'], parts: [] },
};

const BY_NAME = new Map(Object.entries(LINKS).map(([name, links]) => [name.toLowerCase(), links]));
const NONE: SheetLinks = { fluids: [], parts: [] };

/** The library task names that take lines from the sheet (for the test that they exist). */
export const SHEET_LINKED_TASK_NAMES = Object.keys(LINKS);

/** What a task of this name takes from the sheet; nothing for a name the library does not link. */
export const sheetLinksOf = (taskName: string): SheetLinks =>
  BY_NAME.get(taskName.trim().toLowerCase()) ?? NONE;
