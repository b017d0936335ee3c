// A machine's spec sheet: read, and saved section by section. Saving also fills the lines of the
// machine's tasks that are linked to the sheet (shared/domain/spec-sheet-lines.ts), in the same
// transaction, so a task's quantities and part numbers never disagree with the sheet they came
// from. Audited as machine edits are.
import type { Transaction } from 'sequelize';
import { sequelize } from '../db';
import { Machine, MachineSpecSheet, ServiceTask } from '../models';
import type { OrgAccess } from '../policies/access';
import { recordAudit } from '../infra/audit';
import type { SpecSheetData, SpecSheetUpdateInput } from '../../shared/schemas/spec-sheet';
import { taskLinesFromSheet } from '../../shared/domain/spec-sheet-lines';

/** A machine without a sheet has every section empty. */
export const EMPTY_SHEET: SpecSheetData = {
  capacities: {},
  extraCapacities: [],
  filters: {},
  extraFilters: [],
  tyrePressures: {},
  torques: [],
  testPressures: [],
  notes: '',
};

const SECTIONS = Object.keys(EMPTY_SHEET) as (keyof SpecSheetData)[];
const KEYED = ['capacities', 'filters', 'tyrePressures'] as const;
type KeyedSection = (typeof KEYED)[number];

export const sheetDataOf = (row: MachineSpecSheet | null): SpecSheetData =>
  row
    ? (Object.fromEntries(SECTIONS.map((s) => [s, row.get(s)])) as unknown as SpecSheetData)
    : EMPTY_SHEET;

/** The machine's sheet row, or null when nothing has been entered. */
export const findSpecSheet = (
  organizationId: string,
  machineId: string,
  transaction?: Transaction,
) => MachineSpecSheet.findOne({ where: { organizationId, machineId }, transaction });

/** A keyed section after the PATCH: sent keys set, `null` keys cleared, `null` section emptied. */
function mergeKeyed(current: Record<string, unknown>, sent: Record<string, unknown> | null) {
  if (sent === null) return {};
  const next = { ...current };
  for (const [key, value] of Object.entries(sent)) {
    if (value === null) delete next[key];
    else if (value !== undefined) next[key] = value;
  }
  return next;
}

/** The sections the PATCH names, merged into the current ones; the others are left out. */
function changedSections(current: SpecSheetData, input: SpecSheetUpdateInput) {
  const after: Partial<SpecSheetData> = {};
  for (const section of SECTIONS) {
    const sent = input[section];
    if (sent === undefined) continue;
    const merged = (KEYED as readonly string[]).includes(section)
      ? mergeKeyed(current[section as KeyedSection], sent as Record<string, unknown> | null)
      : sent;
    Object.assign(after, { [section]: merged });
  }
  return after;
}

/**
 * Fills the lines of the machine's tasks from its sheet (in the caller's transaction); tasks whose
 * lines come out the same are not written. Returns how many changed.
 */
export async function applySheetToTasks(
  organizationId: string,
  machineId: string,
  transaction: Transaction,
  sheet?: SpecSheetData,
): Promise<number> {
  const data = sheet ?? sheetDataOf(await findSpecSheet(organizationId, machineId, transaction));
  const tasks = await ServiceTask.findAll({
    where: { organizationId, machineId },
    order: [['position', 'ASC']],
    transaction,
  });
  let changed = 0;
  for (const task of tasks) {
    const next = taskLinesFromSheet(task, data);
    if (!next.changed) continue;
    await task.update({ parts: next.parts, fluids: next.fluids }, { transaction });
    changed += 1;
  }
  return changed;
}

/** Saves the sections sent and fills the linked task lines; answers the sheet and the count. */
export async function saveSpecSheet(
  access: OrgAccess,
  machine: Machine,
  input: SpecSheetUpdateInput,
) {
  const organizationId = access.organization.id;
  return sequelize.transaction(async (transaction) => {
    // one writer per machine at a time: a save and a class being applied take the same lock
    await Machine.findOne({
      where: { id: machine.id, organizationId },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    const row = await findSpecSheet(organizationId, machine.id, transaction);
    const current = sheetDataOf(row);
    const after = changedSections(current, input);
    const before = Object.fromEntries(
      Object.keys(after).map((s) => [s, current[s as keyof SpecSheetData]]),
    );
    const saved = row
      ? await row.update({ ...after, updatedBy: access.userId }, { transaction })
      : await MachineSpecSheet.create(
          { ...after, machineId: machine.id, organizationId, updatedBy: access.userId },
          { transaction },
        );
    const sheet = sheetDataOf(saved);
    const tasksUpdated = await applySheetToTasks(organizationId, machine.id, transaction, sheet);
    await recordAudit(
      {
        organizationId,
        actorUserId: access.userId,
        action: 'machine.spec_sheet_update',
        entityType: 'machine',
        entityId: machine.id,
        changes: { before, after, tasksUpdated },
      },
      transaction,
    );
    return { row: saved, tasksUpdated };
  });
}
