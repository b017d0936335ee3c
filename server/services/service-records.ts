import { Op, QueryTypes, type Transaction } from 'sequelize';
import { TZDate } from '@date-fns/tz';
import { sequelize } from '../db';
import { AppError, invalid, notFound } from '../errors';
import {
  Defect,
  Membership,
  ServiceMeasurement,
  ServiceRecord,
  ServiceTask,
  type Machine,
} from '../models';
import type {
  MeasurementInput,
  ReassemblySetting,
  ServiceFluid,
  ServicePart,
  ServiceRecordCompleteInput,
  ServiceRecordCreateInput,
  ServiceRecordUpdateInput,
  ServiceHistoryQuery,
} from '../../shared/schemas/service-records';
import { localDayNumber, isoFromDayNumber, todayIso } from '../../shared/domain';
import type { OrgAccess } from '../policies/access';
import { canHandleDefects } from '../policies/defect';
import { loadMachine } from './machines';
import { writeAccompanyingReading } from './readings';
import { recomputeDuePoints } from './forecast';
import { closeDefects, DEALER_DEFECTS_REFUSAL } from './defects';
import { recordAudit } from '../infra/audit';

/** The record if it is in the caller's organization on a machine they may see; else 404. */
export async function loadRecord(access: OrgAccess, recordId: string, transaction?: Transaction) {
  const record = await ServiceRecord.findOne({
    where: { id: recordId, organizationId: access.organization.id },
    transaction,
    ...(transaction && { lock: transaction.LOCK.UPDATE }),
  });
  if (!record) throw notFound('Service record');
  const { machine } = await loadMachine(access, record.machineId, transaction).catch(() => {
    throw notFound('Service record');
  });
  return { record, machine };
}

const round = (n: number, places = 2) => Math.round(n * 10 ** places) / 10 ** places;

/** Parts and fluids the tasks' lists call for, summed by part number (and by fluid kind + unit). */
export function prefillLines(tasks: Pick<ServiceTask, 'parts' | 'fluids'>[]): {
  parts: ServicePart[];
  fluids: ServiceFluid[];
} {
  const parts = new Map<string, ServicePart>();
  const fluids = new Map<string, ServiceFluid>();
  for (const t of tasks) {
    for (const p of t.parts) {
      const key = p.partNumber.trim().toUpperCase();
      const line = parts.get(key);
      if (line) line.quantity = round(line.quantity + p.quantity, 3);
      else
        parts.set(key, {
          partNumber: p.partNumber,
          description: p.description,
          quantity: p.quantity,
          unitCostMinor: null,
        });
    }
    for (const f of t.fluids) {
      const key = `${f.kind.trim().toLowerCase()}|${f.unit}`;
      const line = fluids.get(key);
      if (line) line.volume = round(line.volume + f.volume, 2);
      else fluids.set(key, { kind: f.kind, volume: f.volume, unit: f.unit, unitCostMinor: null });
    }
  }
  return { parts: [...parts.values()], fluids: [...fluids.values()] };
}

/** The machine's tasks with these ids, in the order given; unknown ids named `taskIds.i`. */
export async function resolveTasks(
  access: OrgAccess,
  machine: Machine,
  taskIds: string[],
  transaction?: Transaction,
) {
  if (!taskIds.length) return [];
  const rows = await ServiceTask.findAll({
    where: {
      organizationId: access.organization.id,
      machineId: machine.id,
      id: { [Op.in]: taskIds },
    },
    transaction,
  });
  const byId = new Map(rows.map((t) => [t.id, t]));
  const errors: Record<string, string> = {};
  taskIds.forEach((id, i) => {
    if (!byId.has(id)) errors[`taskIds.${i}`] = `No such task on ${machine.fleetNumber}'s schedule`;
  });
  if (Object.keys(errors).length) throw invalid(errors);
  return [...new Set(taskIds)].map((id) => byId.get(id)!);
}

async function checkTechnicians(access: OrgAccess, ids: string[]) {
  if (!ids.length) return;
  const members = await Membership.findAll({
    where: { organizationId: access.organization.id, userId: { [Op.in]: ids } },
    attributes: ['userId'],
  });
  const known = new Set(members.map((m) => m.userId));
  const errors: Record<string, string> = {};
  ids.forEach((id, i) => {
    if (!known.has(id)) errors[`technicianIds.${i}`] = 'Not a member of this farm';
  });
  if (Object.keys(errors).length) throw invalid(errors);
}

/**
 * A dealer's `service` link records services but never closes (nor books the closing of) a farm's
 * defects: any defect id from a dealer is refused before it is looked up, and the refusal names none.
 */
function refuseDealerDefects(access: OrgAccess, ids: string[] | undefined) {
  if (ids?.length && !canHandleDefects(access))
    throw new AppError(403, 'forbidden', DEALER_DEFECTS_REFUSAL, {
      closesDefectIds: DEALER_DEFECTS_REFUSAL,
    });
}

/** Defects a plan is to fix: each active on this machine. */
async function checkDefectsActive(access: OrgAccess, machine: Machine, ids: string[]) {
  if (!ids.length) return;
  const rows = await Defect.findAll({
    where: { organizationId: access.organization.id, id: { [Op.in]: ids } },
  });
  const byId = new Map(rows.map((d) => [d.id, d]));
  const errors: Record<string, string> = {};
  ids.forEach((id, i) => {
    const d = byId.get(id);
    if (!d || d.machineId !== machine.id)
      errors[`closesDefectIds.${i}`] = `No such defect on ${machine.fleetNumber}`;
    else if (d.status === 'fixed')
      errors[`closesDefectIds.${i}`] = `"${d.title}" is closed already`;
  });
  if (Object.keys(errors).length) throw invalid(errors);
}

/**
 * A record may not be completed while a reassembly setting is unticked, unless the technician
 * says why. Each unticked setting is named by `reassemblySettings.i.restored`.
 */
export function checkReassembly(settings: ReassemblySetting[], reason: string) {
  const unticked = settings.map((s, i) => ({ s, i })).filter(({ s }) => !s.restored);
  if (!unticked.length || reason.trim()) return;
  const fields: Record<string, string> = {};
  for (const { s, i } of unticked)
    fields[`reassemblySettings.${i}.restored`] =
      `"${s.what}: ${s.value}" is not ticked as restored: restore it, or say why in unrestoredReason`;
  const names = unticked.map(({ s }) => `"${s.what}: ${s.value}"`).join(', ');
  throw invalid(
    fields,
    `Not completed: reassembly setting ${names} ${unticked.length === 1 ? 'is' : 'are'} not ticked as restored. Tick ${unticked.length === 1 ? 'it' : 'them'} once restored, or give the reason (unrestoredReason).`,
  );
}

function checkPerformedOn(access: OrgAccess, performedOn: string) {
  const today = todayIso(access.organization.timeZone);
  if (performedOn > today)
    throw invalid({ performedOn: `The date may not be after today (${today})` });
}

/** When the service's meter value was read: as given, now when done today, else midday local time. */
function meterTime(access: OrgAccess, performedOn: string, meterReadAt?: string): Date {
  const tz = access.organization.timeZone;
  if (meterReadAt) {
    const at = new Date(meterReadAt);
    if (isoFromDayNumber(localDayNumber(at, tz)) !== performedOn)
      throw invalid({ meterReadAt: `Must fall on the performed date (${performedOn}, ${tz})` });
    return at;
  }
  if (performedOn === todayIso(tz)) return new Date();
  const [y, m, d] = performedOn.split('-').map(Number);
  return new Date(new TZDate(y, m - 1, d, 12, 0, 0, tz).getTime());
}

/** The service's meter reading, through the reading rules (errors on meterValue / performedOn). */
const serviceReading = (
  access: OrgAccess,
  machine: Machine,
  value: number,
  takenAt: Date,
  transaction: Transaction,
) =>
  writeAccompanyingReading(
    access,
    { machine, value, takenAt, source: 'service' },
    { value: 'meterValue', takenAt: 'performedOn' },
    transaction,
  );

export interface TaskReset {
  taskId: string;
  name: string;
  reset: boolean;
  lastDoneMeter: number | null;
  lastDoneOn: string | null;
  note: string;
}

/**
 * Resets each task the visit covered to its meter (lifetime scale) and date, then refreshes the
 * machine's due points. A task already done later than this visit keeps its newer point.
 */
async function resetTasks(
  access: OrgAccess,
  machine: Machine,
  tasks: ServiceTask[],
  lifetime: number,
  performedOn: string,
  transaction: Transaction,
): Promise<TaskReset[]> {
  const out: TaskReset[] = [];
  for (const task of tasks) {
    if (task.lastDoneOn && task.lastDoneOn > performedOn) {
      out.push({
        taskId: task.id,
        name: task.name,
        reset: false,
        lastDoneMeter: task.lastDoneMeter,
        lastDoneOn: task.lastDoneOn,
        note: `Kept: last done ${task.lastDoneOn}, after this visit`,
      });
      continue;
    }
    await task.update({ lastDoneMeter: lifetime, lastDoneOn: performedOn }, { transaction });
    out.push({
      taskId: task.id,
      name: task.name,
      reset: true,
      lastDoneMeter: lifetime,
      lastDoneOn: performedOn,
      note: '',
    });
  }
  if (tasks.length)
    await recomputeDuePoints(access.organization.id, [machine.id], {
      transaction,
      timeZone: access.organization.timeZone,
    });
  return out;
}

async function replaceMeasurements(
  record: ServiceRecord,
  measurements: MeasurementInput[],
  transaction: Transaction,
) {
  await ServiceMeasurement.destroy({ where: { serviceRecordId: record.id }, transaction });
  if (!measurements.length) return;
  await ServiceMeasurement.bulkCreate(
    measurements.map((m, position) => ({
      organizationId: record.organizationId,
      machineId: record.machineId,
      serviceRecordId: record.id,
      position,
      ...m,
    })),
    { transaction },
  );
}

const audit = (
  access: OrgAccess,
  action: string,
  record: ServiceRecord,
  changes: Record<string, unknown>,
  transaction: Transaction,
) =>
  recordAudit(
    {
      organizationId: access.organization.id,
      actorUserId: access.userId,
      action,
      entityType: 'service_record',
      entityId: record.id,
      changes: { machineId: record.machineId, ...changes },
    },
    transaction,
  );

const snapshot = (tasks: ServiceTask[]) => tasks.map((t) => ({ taskId: t.id, name: t.name }));

/**
 * Records a visit: a plan (date + tasks), or a completed service in one transaction — the meter
 * reading, the task resets, parts, measurements and the defects it closes; all or nothing.
 */
export async function createRecord(
  access: OrgAccess,
  machine: Machine,
  input: ServiceRecordCreateInput,
): Promise<{ record: ServiceRecord; resets: TaskReset[] }> {
  refuseDealerDefects(access, input.closesDefectIds);
  const tasks = await resolveTasks(access, machine, input.taskIds);
  await checkTechnicians(access, input.technicianIds);
  const prefilled = prefillLines(tasks);
  const completed = input.status === 'completed';
  if (completed) {
    checkPerformedOn(access, input.performedOn!);
    checkReassembly(input.reassemblySettings, input.unrestoredReason);
  } else await checkDefectsActive(access, machine, input.closesDefectIds);
  const fields = {
    organizationId: access.organization.id,
    machineId: machine.id,
    plannedFor: input.plannedFor,
    tasks: snapshot(tasks),
    technicianIds:
      completed && !input.technicianIds.length
        ? [access.userId]
        : [...new Set(input.technicianIds)],
    labourHours: input.labourHours,
    parts: input.parts ?? prefilled.parts,
    fluids: input.fluids ?? prefilled.fluids,
    otherCosts: input.otherCosts,
    notes: input.notes,
    reassemblySettings: input.reassemblySettings,
    unrestoredReason: input.unrestoredReason,
    defectIds: [...new Set(input.closesDefectIds)],
    createdBy: access.userId,
  };
  return sequelize.transaction(async (transaction) => {
    if (!completed) {
      const record = await ServiceRecord.create(
        {
          ...fields,
          status: 'planned',
          performedOn: null,
          meterValue: null,
          meterLifetime: null,
          readingId: null,
          completedBy: null,
          completedAt: null,
        },
        { transaction },
      );
      await replaceMeasurements(record, input.measurements, transaction);
      await audit(access, 'service.plan', record, { plannedFor: record.plannedFor }, transaction);
      return { record, resets: [] };
    }
    const performedOn = input.performedOn!;
    const takenAt = meterTime(access, performedOn, input.meterReadAt);
    const reading = await serviceReading(access, machine, input.meterValue!, takenAt, transaction);
    const record = await ServiceRecord.create(
      {
        ...fields,
        status: 'completed',
        performedOn,
        meterValue: input.meterValue!,
        meterLifetime: reading.lifetimeValue,
        readingId: reading.id,
        completedBy: access.userId,
        completedAt: new Date(),
      },
      { transaction },
    );
    await replaceMeasurements(record, input.measurements, transaction);
    const resets = await resetTasks(
      access,
      machine,
      tasks,
      reading.lifetimeValue,
      performedOn,
      transaction,
    );
    await closeDefects(
      access,
      machine,
      input.closesDefectIds,
      { note: '', serviceRecordId: record.id },
      transaction,
      'closesDefectIds',
    );
    await audit(
      access,
      'service.complete',
      record,
      { performedOn, meterValue: record.meterValue, taskIds: tasks.map((t) => t.id) },
      transaction,
    );
    return { record, resets };
  });
}

/**
 * Completes a planned record in one transaction, with any changes given on the way. Defects the
 * plan named that were closed meanwhile are skipped; defects named here must still be open. A
 * dealer completing a farm's plan closes none of its defects: they stay open for the farm's shop
 * (and the record names none), and the machine's status never changes here.
 */
export async function completeRecord(
  access: OrgAccess,
  recordId: string,
  input: ServiceRecordCompleteInput,
): Promise<{ record: ServiceRecord; machine: Machine; resets: TaskReset[] }> {
  const { record: current, machine } = await loadRecord(access, recordId);
  if (current.status !== 'planned')
    throw new AppError(
      409,
      'not_planned',
      `This record is ${current.status}; only a plan can be completed`,
    );
  refuseDealerDefects(access, input.closesDefectIds);
  const taskIds = input.taskIds ?? current.tasks.map((t) => t.taskId);
  const tasks = await resolveTasks(access, machine, taskIds);
  if (input.technicianIds) await checkTechnicians(access, input.technicianIds);
  checkPerformedOn(access, input.performedOn);
  const settings = input.reassemblySettings ?? current.reassemblySettings;
  const reason = input.unrestoredReason ?? current.unrestoredReason;
  checkReassembly(settings, reason);
  return sequelize.transaction(async (transaction) => {
    const { record } = await loadRecord(access, recordId, transaction);
    if (record.status !== 'planned')
      throw new AppError(409, 'not_planned', `This record is ${record.status} already`);
    let defectIds = input.closesDefectIds;
    if (!canHandleDefects(access)) defectIds = [];
    else if (!defectIds) {
      const stillOpen = await Defect.findAll({
        where: {
          organizationId: access.organization.id,
          id: { [Op.in]: record.defectIds },
          status: { [Op.ne]: 'fixed' },
        },
        attributes: ['id'],
        transaction,
      });
      const open = new Set(stillOpen.map((d) => d.id));
      defectIds = record.defectIds.filter((id) => open.has(id));
    }
    const takenAt = meterTime(access, input.performedOn, input.meterReadAt);
    const reading = await serviceReading(access, machine, input.meterValue, takenAt, transaction);
    const changedTasks = input.taskIds !== undefined;
    const prefilled = changedTasks ? prefillLines(tasks) : null;
    const technicianIds = input.technicianIds ?? record.technicianIds;
    await record.update(
      {
        status: 'completed',
        performedOn: input.performedOn,
        meterValue: input.meterValue,
        meterLifetime: reading.lifetimeValue,
        readingId: reading.id,
        tasks: snapshot(tasks),
        technicianIds: technicianIds.length ? [...new Set(technicianIds)] : [access.userId],
        labourHours: input.labourHours !== undefined ? input.labourHours : record.labourHours,
        parts: input.parts ?? prefilled?.parts ?? record.parts,
        fluids: input.fluids ?? prefilled?.fluids ?? record.fluids,
        otherCosts: input.otherCosts ?? record.otherCosts,
        notes: input.notes ?? record.notes,
        reassemblySettings: settings,
        unrestoredReason: reason,
        defectIds,
        completedBy: access.userId,
        completedAt: new Date(),
      },
      { transaction },
    );
    if (input.measurements) await replaceMeasurements(record, input.measurements, transaction);
    const resets = await resetTasks(
      access,
      machine,
      tasks,
      reading.lifetimeValue,
      input.performedOn,
      transaction,
    );
    await closeDefects(
      access,
      machine,
      defectIds,
      { note: '', serviceRecordId: record.id },
      transaction,
      'closesDefectIds',
    );
    await audit(
      access,
      'service.complete',
      record,
      {
        performedOn: input.performedOn,
        meterValue: input.meterValue,
        taskIds: tasks.map((t) => t.id),
      },
      transaction,
    );
    return { record, machine, resets };
  });
}

const FIXED_AFTER_COMPLETION = {
  taskIds: "A completed record's tasks cannot change: they have reset the schedule",
  closesDefectIds: "A completed record's defects cannot change: close others from the defect list",
  plannedFor: "A completed record's booking date cannot change",
} as const;

const sameSet = (a: string[], b: string[]) =>
  new Set(a).size === new Set(b).size && a.every((x) => b.includes(x));

/** Edits a plan freely; a completed record's costs, notes, measurements and settings only. */
export async function updateRecord(
  access: OrgAccess,
  recordId: string,
  input: ServiceRecordUpdateInput,
) {
  refuseDealerDefects(access, input.closesDefectIds);
  if (input.closesDefectIds && !canHandleDefects(access)) {
    // a dealer's form sends the (empty) list it was given: that changes nothing
    const { closesDefectIds: _none, ...rest } = input;
    input = rest;
  }
  const { record: found, machine } = await loadRecord(access, recordId);
  if (found.status === 'cancelled')
    throw new AppError(409, 'cancelled', 'This record is cancelled; it cannot change');
  if (found.status === 'completed') {
    // A form sent back whole repeats these unchanged; only a change is refused.
    const changed = {
      taskIds:
        input.taskIds !== undefined &&
        !sameSet(
          input.taskIds,
          found.tasks.map((t) => t.taskId),
        ),
      closesDefectIds:
        input.closesDefectIds !== undefined && !sameSet(input.closesDefectIds, found.defectIds),
      plannedFor: input.plannedFor !== undefined && input.plannedFor !== found.plannedFor,
    };
    const fields: Record<string, string> = {};
    for (const [k, message] of Object.entries(FIXED_AFTER_COMPLETION))
      if (changed[k as keyof typeof changed]) fields[k] = message;
    if (Object.keys(fields).length) throw invalid(fields);
    checkReassembly(
      input.reassemblySettings ?? found.reassemblySettings,
      input.unrestoredReason ?? found.unrestoredReason,
    );
    const { taskIds: _t, closesDefectIds: _d, plannedFor: _p, ...editable } = input;
    input = editable;
  }
  if (input.plannedFor === null) throw invalid({ plannedFor: 'A plan needs its booking date' });
  const tasks = input.taskIds ? await resolveTasks(access, machine, input.taskIds) : null;
  if (input.technicianIds) await checkTechnicians(access, input.technicianIds);
  if (input.closesDefectIds) await checkDefectsActive(access, machine, input.closesDefectIds);
  // A PATCH writes only what it names: new tasks do not rewrite parts or fluids (a new record
  // prefills them; an edit sends its own lines).
  const { measurements, closesDefectIds, taskIds: _taskIds, ...rest } = input;
  const record = found;
  return sequelize.transaction(async (transaction) => {
    await record.update(
      {
        ...rest,
        ...(rest.technicianIds && { technicianIds: [...new Set(rest.technicianIds)] }),
        ...(tasks && { tasks: snapshot(tasks) }),
        ...(closesDefectIds && { defectIds: [...new Set(closesDefectIds)] }),
      },
      { transaction },
    );
    if (measurements) await replaceMeasurements(record, measurements, transaction);
    await audit(access, 'service.update', record, { fields: Object.keys(input) }, transaction);
    return { record, machine };
  });
}

export async function cancelRecord(access: OrgAccess, recordId: string) {
  return sequelize.transaction(async (transaction) => {
    const { record, machine } = await loadRecord(access, recordId, transaction);
    if (record.status !== 'planned')
      throw new AppError(
        409,
        'not_planned',
        `This record is ${record.status}; only a plan can be cancelled`,
      );
    await record.update({ status: 'cancelled' }, { transaction });
    await audit(access, 'service.cancel', record, {}, transaction);
    return { record, machine };
  });
}

const likeOf = (q: string) => `%${q.replace(/[%_\\]/g, (c) => `\\${c}`)}%`;

/** A machine's records, newest first (by the date done, or booked); q searches notes, task names and parts. */
export async function machineHistory(
  access: OrgAccess,
  machine: Machine,
  query: ServiceHistoryQuery,
) {
  const where = ['r.organization_id = :org', 'r.machine_id = :machine'];
  const replacements: Record<string, unknown> = {
    org: access.organization.id,
    machine: machine.id,
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  };
  if (query.status) {
    where.push('r.status = :status');
    replacements.status = query.status;
  }
  if (query.q) {
    where.push(`(r.notes ILIKE :q
      OR EXISTS (SELECT 1 FROM jsonb_array_elements(r.tasks) t WHERE t->>'name' ILIKE :q)
      OR EXISTS (SELECT 1 FROM jsonb_array_elements(r.parts) p
                 WHERE p->>'partNumber' ILIKE :q OR p->>'description' ILIKE :q))`);
    replacements.q = likeOf(query.q);
  }
  const rows = await sequelize.query<{ id: string; total: string }>(
    `SELECT r.id, count(*) OVER () AS total FROM service_records r
     WHERE ${where.join(' AND ')}
     ORDER BY coalesce(r.performed_on, r.planned_for) DESC, r.created_at DESC, r.id
     LIMIT :limit OFFSET :offset`,
    { replacements, type: QueryTypes.SELECT },
  );
  const records = await ServiceRecord.findAll({
    where: { organizationId: access.organization.id, id: { [Op.in]: rows.map((r) => r.id) } },
  });
  const byId = new Map(records.map((r) => [r.id, r]));
  return {
    total: rows.length ? Number(rows[0].total) : 0,
    records: rows.map((r) => byId.get(r.id)!),
  };
}

/** The measurement names a machine's completed records carry, for a chart's picker. */
export async function measurementNames(access: OrgAccess, machine: Machine) {
  const rows = await sequelize.query<{
    name: string;
    unit: string;
    n: number;
    last_on: string;
    last_value: number;
  }>(
    `SELECT (array_agg(m.name ORDER BY r.performed_on DESC))[1] AS name,
            (array_agg(m.unit ORDER BY r.performed_on DESC))[1] AS unit,
            count(*)::int AS n, max(r.performed_on) AS last_on,
            (array_agg(m.value ORDER BY r.performed_on DESC, r.created_at DESC))[1] AS last_value
     FROM service_measurements m
     JOIN service_records r ON r.id = m.service_record_id AND r.organization_id = m.organization_id
     WHERE m.organization_id = :org AND m.machine_id = :machine AND r.status = 'completed'
     GROUP BY lower(m.name) ORDER BY lower(m.name)`,
    {
      replacements: { org: access.organization.id, machine: machine.id },
      type: QueryTypes.SELECT,
    },
  );
  return rows.map((r) => ({
    name: r.name,
    unit: r.unit,
    count: r.n,
    lastOn: r.last_on,
    lastValue: Number(r.last_value),
  }));
}

/** One measurement over time on a machine (completed visits, oldest first), for a chart. */
export async function measurementSeries(access: OrgAccess, machine: Machine, name: string) {
  const rows = await sequelize.query<{
    record_id: string;
    performed_on: string;
    meter_value: number | null;
    name: string;
    value: number;
    unit: string;
    spec_min: number | null;
    spec_max: number | null;
  }>(
    `SELECT r.id AS record_id, r.performed_on, r.meter_value, m.name, m.value, m.unit, m.spec_min, m.spec_max
     FROM service_measurements m
     JOIN service_records r ON r.id = m.service_record_id AND r.organization_id = m.organization_id
     WHERE m.organization_id = :org AND m.machine_id = :machine AND lower(m.name) = lower(:name)
       AND r.status = 'completed'
     ORDER BY r.performed_on, r.created_at, m.position`,
    {
      replacements: { org: access.organization.id, machine: machine.id, name },
      type: QueryTypes.SELECT,
    },
  );
  return rows.map((r) => ({
    recordId: r.record_id,
    performedOn: r.performed_on,
    meterValue: r.meter_value === null ? null : Number(r.meter_value),
    value: Number(r.value),
    unit: r.unit,
    specMin: r.spec_min === null ? null : Number(r.spec_min),
    specMax: r.spec_max === null ? null : Number(r.spec_max),
  }));
}
