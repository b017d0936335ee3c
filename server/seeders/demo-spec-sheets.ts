// The demo machines' spec sheets (issue 11), by farm and fleet number (figures in
// demo-spec-sheet-data.ts: Larkspur Flats counts in US gallons, psi and lbf·ft; Osier Creek in
// litres, bar or kPa and N·m). The loader tractors of the two farms differ, so their oil changes
// take different quantities. Every sheet goes through the API's own schema before it is written,
// and the machine's linked task lines are filled from it.
import type { Transaction } from 'sequelize';
import { MachineSpecSheet, ServiceTask } from '../models';
import { sheetLinksOf } from '../../shared/domain/service-library/sheet-links';
import { specSheetUpdateSchema, type SpecSheetData } from '../../shared/schemas/spec-sheet';
import { applySheetToTasks } from '../services/spec-sheets';
import { demoMachineId, demoOrgId } from './demo-ids';
import { DEMO_SPEC_SHEETS } from './demo-spec-sheet-data';

/**
 * The demo's tasks come from its templates with lines of their own, which the sheet never
 * overwrites. So that the demo shows tasks following their sheet, a task the library links to
 * one compartment (or one filter) whose template gave it exactly one such line adopts that line
 * as linked; the sheet then gives it its figure. Demo only: a farm's own lines stay its own.
 */
async function adoptTemplateLines(
  machineId: string,
  sheet: Partial<SpecSheetData>,
  transaction: Transaction,
) {
  const tasks = await ServiceTask.findAll({ where: { machineId }, transaction });
  for (const task of tasks) {
    const links = sheetLinksOf(task.name);
    const own = task.fluids.filter((f) => !f.capacity);
    const ownParts = task.parts.filter((p) => !p.filterRole && !p.wearPart);
    const capacity = links.fluids.length === 1 ? links.fluids[0] : null;
    const role = links.parts.length === 1 ? links.parts[0].role : null;
    const fluids =
      capacity &&
      sheet.capacities?.[capacity]?.quantity &&
      own.length === 1 &&
      task.fluids.length === 1
        ? [{ ...own[0], capacity }]
        : task.fluids;
    const parts =
      role && sheet.filters?.[role] && ownParts.length === 1
        ? task.parts.map((p) => (p === ownParts[0] ? { ...p, filterRole: role } : p))
        : task.parts;
    if (fluids !== task.fluids || parts !== task.parts)
      await task.update({ fluids, parts }, { transaction });
  }
}

/** Writes the demo's spec sheets and fills the linked lines of those machines' tasks. */
export async function writeSpecSheets(transaction: Transaction, fleet: ReadonlySet<string>) {
  const rows = DEMO_SPEC_SHEETS.flatMap(({ organization, sheets }) =>
    Object.entries(sheets)
      // a fleet number the demo fleet no longer has is skipped, never invented
      .filter(([fleetNumber]) => fleet.has(`${organization}/${fleetNumber}`))
      .map(([fleetNumber, sheet]) => ({
        // the schema's own check; a demo sheet sends no null, so it is a stored sheet as it is
        ...(specSheetUpdateSchema.parse(sheet) as Partial<SpecSheetData>),
        machineId: demoMachineId({ organization, fleetNumber }),
        organizationId: demoOrgId(organization),
        updatedBy: null,
      })),
  );
  await MachineSpecSheet.bulkCreate(rows, { transaction });
  for (const row of rows) {
    await adoptTemplateLines(row.machineId, row, transaction);
    await applySheetToTasks(row.organizationId, row.machineId, transaction);
  }
  return rows.length;
}
