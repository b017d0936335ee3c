// Fleet import: a spreadsheet of machines saved as CSV. Every row is checked, then the whole file
// is written in one transaction: committed when asked and no row failed, else rolled back — so the
// preview shows exactly what the import does. Re-importing the same file changes nothing.
import { Op, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { AppError, invalid } from '../errors';
import { Machine, ScheduleTemplate, ServiceTask, TaskDuePoint } from '../models';
import { primaryForecastOf } from './primary-forecast';
import { todayIso } from '../../shared/domain';
import type {
  FleetImportPreview,
  FleetImportResult,
  FleetImportRow,
} from '../../shared/schemas/fleet-import';
import type { OrgAccess } from '../policies/access';
import { localDateOrder, readCsvSheet, usesDecimalComma } from '../infra/csv-sheet';
import { mapFleetColumns } from './fleet-import-columns';
import { planRow, type PlanContext, type RowPlan } from './fleet-import-plan';
import { recomputeDuePoints } from './forecast';
import { createMachine, updateMachine } from './machines';
import { writeReadings } from './readings';
import { addTasks, lastDoneProblems, recordLastDone } from './schedules';
import { applyMachineClassIn } from './machine-class';
import { MACHINE_CLASS_LABELS } from '../../shared/domain/service-library';

export const FLEET_IMPORT_MAX_ROWS = 2000;

const grouped = (n: number) => n.toLocaleString('en-US', { maximumFractionDigits: 2 });

async function loadContext(
  access: OrgAccess,
  buffer: Buffer,
): Promise<PlanContext & { rows: { record: string[]; line: number }[] }> {
  const sheet = readCsvSheet(buffer, 'machine', FLEET_IMPORT_MAX_ROWS);
  const columns = mapFleetColumns(sheet.header, sheet.headerText);
  const org = access.organization.id;
  const fleetNumbers = sheet.rows.map((r) =>
    (r.record[columns.machine.fleetNumber!] ?? '').trim().toLowerCase(),
  );
  const [machines, templates] = await Promise.all([
    Machine.findAll({
      where: {
        organizationId: org,
        [Op.and]: [
          sequelize.where(sequelize.fn('lower', sequelize.col('fleet_number')), {
            [Op.in]: [...new Set(fleetNumbers)],
          }),
        ],
      },
    }),
    ScheduleTemplate.findAll({ where: { organizationId: org }, order: [['name', 'ASC']] }),
  ]);
  const tasks = await ServiceTask.findAll({
    where: { organizationId: org, machineId: { [Op.in]: machines.map((m) => m.id) } },
    attributes: ['machineId', 'name'],
  });
  return {
    rows: sheet.rows,
    columns,
    timeZone: access.organization.timeZone,
    order: localDateOrder(access),
    decimalComma: usesDecimalComma(access, sheet.delimiter),
    templates,
    machines: new Map(
      machines.map((m) => [
        m.fleetNumber.toLowerCase(),
        { machine: m, taskNames: tasks.filter((t) => t.machineId === m.id).map((t) => t.name) },
      ]),
    ),
  };
}

/** Writes one checked row in the import's transaction; returns what changed, in words. */
async function writeRow(access: OrgAccess, plan: RowPlan, transaction: Transaction) {
  const changes: string[] = [];
  let machine = plan.existing;
  if (!machine) {
    machine = await createMachine(access, plan.create!, transaction);
    changes.push('new machine');
  } else if (Object.keys(plan.update).length) {
    await updateMachine(access, machine, plan.update, transaction);
    changes.push(
      ...Object.keys(plan.update).map((k) => k.replace(/[A-Z]/g, (c) => ` ${c.toLowerCase()}`)),
    );
  }
  if (plan.reading) {
    try {
      const [outcome] = await writeReadings(
        access,
        [{ machine, value: plan.reading.value, takenAt: plan.reading.takenAt, source: 'import' }],
        transaction,
      );
      if (outcome.status === 'added') changes.push(`reading ${plan.reading.text}`);
    } catch (err) {
      if (!(err instanceof AppError) || !err.fields) throw err;
      return {
        machine,
        changes,
        errors: Object.values(err.fields).map((m) => `Line ${plan.line}, meter reading: ${m}`),
      };
    }
  }
  let tasks = await ServiceTask.findAll({
    where: { organizationId: access.organization.id, machineId: machine.id },
    transaction,
  });
  if (plan.template) {
    const have = new Set(tasks.map((t) => t.name.toLowerCase()));
    const missing = plan.template.tasks.filter((t) => !have.has(t.name.toLowerCase()));
    if (missing.length) {
      tasks = [
        ...tasks,
        ...(await addTasks(access, machine, missing, 'task.create_from_template', transaction)),
      ];
      changes.push(
        `schedule ${plan.template.name} (${missing.length} ${missing.length === 1 ? 'task' : 'tasks'})`,
      );
    }
  }
  if (plan.machineClass) {
    const before = machine.machineClass ?? null;
    const { added } = await applyMachineClassIn(access, machine, plan.machineClass, transaction);
    if (before !== plan.machineClass || added.length) {
      tasks = [...tasks, ...added];
      changes.push(
        `class ${MACHINE_CLASS_LABELS[plan.machineClass]} (${added.length} ${added.length === 1 ? 'task' : 'tasks'})`,
      );
    }
  }
  const errors: string[] = [];
  if (plan.lastDone.length) {
    const forecast = await primaryForecastOf(machine, transaction);
    const today = todayIso(access.organization.timeZone);
    for (const { taskName, input } of plan.lastDone) {
      const task = tasks.find((t) => t.name.toLowerCase() === taskName.toLowerCase())!;
      if (task.lastDoneMeter === input.lastDoneMeter && task.lastDoneOn === input.lastDoneOn)
        continue;
      const problems = lastDoneProblems(input, today, forecast?.lastValue ?? null);
      if (Object.keys(problems).length) {
        errors.push(
          ...Object.values(problems).map((m) => `Line ${plan.line}, ${taskName} last done: ${m}`),
        );
        continue;
      }
      await recordLastDone(access, task, input, transaction);
      changes.push(`${task.name} last done ${input.lastDoneOn} at ${grouped(input.lastDoneMeter)}`);
    }
    await recomputeDuePoints(access.organization.id, [machine.id], {
      transaction,
      timeZone: access.organization.timeZone,
    });
  }
  return { machine, changes, errors };
}

/** Checks (and with commit, writes) a fleet file; all or nothing. */
async function runFleetImport(access: OrgAccess, buffer: Buffer, commit: boolean) {
  const ctx = await loadContext(access, buffer);
  const seen = new Map<string, number>();
  const plans = ctx.rows.map((r) => planRow(ctx, r.record, r.line, seen));
  const rows: FleetImportRow[] = [];
  const touched: string[] = [];
  const transaction = await sequelize.transaction();
  let committed = false;
  try {
    for (const plan of plans) {
      const row: FleetImportRow = {
        line: plan.line,
        fleetNumber: plan.fleetNumber,
        name: plan.create?.name ?? plan.update.name ?? plan.name,
        machineId: plan.existing?.id ?? null,
        outcome: 'error',
        changes: [],
        errors: plan.errors,
      };
      rows.push(row);
      if (plan.errors.length) continue;
      const written = await writeRow(access, plan, transaction);
      touched.push(written.machine.id);
      row.changes = written.changes;
      row.errors = written.errors;
      row.outcome = row.errors.length
        ? 'error'
        : !plan.existing
          ? 'create'
          : row.changes.length
            ? 'update'
            : 'unchanged';
    }
    const failed = rows.filter((r) => r.outcome === 'error');
    const historyUnknown = await TaskDuePoint.count({
      where: {
        organizationId: access.organization.id,
        machineId: { [Op.in]: touched },
        status: 'history_unknown',
      },
      transaction,
    });
    if (commit && !failed.length) {
      await transaction.commit();
      committed = true;
    }
    return { rows, failed, historyUnknown, ignored: ctx.columns.ignored, ctx };
  } finally {
    if (!committed) await transaction.rollback();
  }
}

const count = (rows: FleetImportRow[], outcome: FleetImportRow['outcome']) =>
  rows.filter((r) => r.outcome === outcome).length;

/** Every row's outcome and errors by line; writes nothing. */
export async function previewFleetImport(
  access: OrgAccess,
  buffer: Buffer,
): Promise<FleetImportPreview> {
  const { rows, ctx } = await runFleetImport(access, buffer, false);
  return {
    rows,
    summary: {
      total: rows.length,
      create: count(rows, 'create'),
      update: count(rows, 'update'),
      unchanged: count(rows, 'unchanged'),
      errors: count(rows, 'error'),
    },
    columns: {
      machine: ctx.columns.machineText,
      tasks: ctx.columns.tasks.map((t) => t.name),
      ignored: ctx.columns.ignored,
    },
  };
}

/** Writes the whole file in one transaction, or nothing (422 naming each bad line). */
export async function commitFleetImport(
  access: OrgAccess,
  buffer: Buffer,
): Promise<FleetImportResult> {
  const { rows, failed, historyUnknown } = await runFleetImport(access, buffer, true);
  if (failed.length)
    throw invalid(
      Object.fromEntries(failed.map((r) => [`line ${r.line}`, r.errors.join('; ')])),
      `${failed.length} row${failed.length === 1 ? '' : 's'} cannot be imported; nothing was written`,
    );
  return {
    created: count(rows, 'create'),
    updated: count(rows, 'update'),
    unchanged: count(rows, 'unchanged'),
    total: rows.length,
    historyUnknown,
  };
}
