// The demo machines' spec sheets (issue 11), by farm and fleet number (figures in
// demo-spec-sheet-data.ts: Larkspur Flats counts in US gallons, psi and lbf·ft; Osier Creek in
// litres, bar or kPa and N·m). The loader tractors of the two farms differ, so their oil changes
// take different quantities. Every sheet goes through the API's own schema before it is written,
// and the machine's linked task lines are filled from it.
import type { Transaction } from 'sequelize';
import { MachineSpecSheet } from '../models';
import { specSheetUpdateSchema, type SpecSheetData } from '../../shared/schemas/spec-sheet';
import { applySheetToTasks } from '../services/spec-sheets';
import { demoMachineId, demoOrgId } from './demo-ids';
import { DEMO_SPEC_SHEETS } from './demo-spec-sheet-data';

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
  // the machines' library tasks take their oil quantities and filter numbers from the sheet
  for (const row of rows) await applySheetToTasks(row.organizationId, row.machineId, transaction);
  return rows.length;
}
