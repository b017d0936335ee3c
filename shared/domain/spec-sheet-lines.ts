// A task's parts and fluids from its machine's spec sheet, so two tractors of one class change
// different quantities and filters. A line linked to the sheet (a fluid naming a capacity, a part
// naming a filter role) shows what the sheet says: its volume, unit and fluid, or its part
// number; when the sheet no longer gives the figure the line goes (no figure, no line). A line
// typed by hand (no link) is never touched. A library task (sheet-links.ts) gets its linked lines
// added once the sheet has their figures — unless the task lists fluids (or parts) of its own,
// which then stand for them and are never doubled.
import type { StoredTaskPart, TaskFluid } from '../schemas/schedule';
import type { SpecSheetData } from '../schemas/spec-sheet';
import {
  CAPACITY_FLUID_NAMES,
  FILTER_ROLE_LABELS,
  type CapacityKey,
  type FilterRole,
} from '../schemas/spec-keys';
import { sheetLinksOf } from './service-library/sheet-links';

export interface TaskLines {
  name: string;
  parts: StoredTaskPart[];
  fluids: TaskFluid[];
}

type Sheet = Pick<SpecSheetData, 'capacities' | 'filters'>;

/** "Engine oil, SAE 15W-40 API CK-4": the compartment's fluid, with the sheet's specification. */
export function sheetFluidKind(capacity: CapacityKey, spec: string): string {
  const name = CAPACITY_FLUID_NAMES[capacity];
  return spec ? `${name}, ${spec}` : name;
}

/** The fluid line the sheet gives for a compartment, or null while it has no quantity. */
function fluidFromSheet(capacity: CapacityKey, sheet: Sheet): TaskFluid | null {
  const c = sheet.capacities[capacity];
  if (!c || c.quantity === null) return null;
  return { kind: sheetFluidKind(capacity, c.spec), volume: c.quantity, unit: c.unit, capacity };
}

function syncFluids(task: TaskLines, sheet: Sheet): TaskFluid[] {
  const ownLines = task.fluids.some((f) => !f.capacity);
  const out: TaskFluid[] = [];
  for (const f of task.fluids) {
    if (!f.capacity) out.push(f);
    else {
      const line = fluidFromSheet(f.capacity, sheet);
      if (line) out.push(line);
    }
  }
  if (ownLines) return out;
  for (const capacity of sheetLinksOf(task.name).fluids) {
    if (out.some((f) => f.capacity === capacity)) continue;
    const line = fluidFromSheet(capacity, sheet);
    if (line) out.push(line);
  }
  return out;
}

function syncParts(task: TaskLines, sheet: Sheet): StoredTaskPart[] {
  // wear parts are inspected, not replaced each time: they do not stand for the filters
  const ownLines = task.parts.some((p) => !p.filterRole && !p.wearPart);
  const numberOf = (role: FilterRole) => sheet.filters[role] ?? null;
  const out: StoredTaskPart[] = [];
  for (const p of task.parts) {
    if (!p.filterRole) out.push(p);
    else {
      const partNumber = numberOf(p.filterRole);
      if (partNumber) out.push({ ...p, partNumber });
    }
  }
  if (ownLines) return out;
  for (const { role, quantity } of sheetLinksOf(task.name).parts) {
    const partNumber = numberOf(role);
    if (!partNumber || out.some((p) => p.filterRole === role)) continue;
    out.push({
      partNumber,
      description: FILTER_ROLE_LABELS[role],
      quantity,
      wearPart: false,
      filterRole: role,
    });
  }
  return out;
}

/** Lines compared by their keys and values: JSONB keeps an object's keys in its own order. */
const canonical = (lines: object[]) =>
  JSON.stringify(
    lines.map((line) =>
      Object.entries(line)
        .filter(([, v]) => v !== undefined)
        .sort(([a], [b]) => a.localeCompare(b)),
    ),
  );

/** The task's parts and fluids as the sheet makes them, and whether they differ from now. */
export function taskLinesFromSheet(
  task: TaskLines,
  sheet: Sheet,
): { parts: StoredTaskPart[]; fluids: TaskFluid[]; changed: boolean } {
  const parts = syncParts(task, sheet);
  const fluids = syncFluids(task, sheet);
  const changed =
    canonical(parts) !== canonical(task.parts) || canonical(fluids) !== canonical(task.fluids);
  return { parts, fluids, changed };
}
