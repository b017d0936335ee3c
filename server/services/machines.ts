import { Op, QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { invalid } from '../errors';
import { Machine, MachineOperator, Membership } from '../models';
import { primaryForecastsOf } from './primary-forecast';
import type {
  MachineCreateInput,
  MachineListQuery,
  MachineUpdateInput,
} from '../../shared/schemas/machines';
import type { OrgAccess } from '../policies/access';
import { hasRole } from '../policies/access';
import { canViewMachine } from '../policies/machine';
import { recordAudit } from '../infra/audit';
import { recomputeDuePoints, refreshMachineForecast } from './forecast';
import { applyStatusEdit } from './machine-status';

export async function operatorIdsOf(
  machineIds: string[],
  organizationId: string,
  transaction?: Transaction,
) {
  const rows = await MachineOperator.findAll({
    where: { organizationId, machineId: { [Op.in]: machineIds } },
    transaction,
  });
  const map = new Map<string, string[]>();
  for (const r of rows) map.set(r.machineId, [...(map.get(r.machineId) ?? []), r.userId]);
  return map;
}

export { loadMachine } from './machine-load';

/** The machines among `ids` that the caller may see, by id, in two queries (no per-row lookups). */
export async function loadVisibleMachines(
  access: OrgAccess,
  ids: string[],
  transaction?: Transaction,
) {
  const unique = [...new Set(ids)];
  const [machines, operators] = await Promise.all([
    Machine.findAll({
      where: { organizationId: access.organization.id, id: { [Op.in]: unique } },
      transaction,
    }),
    operatorIdsOf(unique, access.organization.id, transaction),
  ]);
  return new Map(
    machines
      .filter((m) => canViewMachine(access, m, operators.get(m.id) ?? []))
      .map((m) => [m.id, m]),
  );
}

const SORT_SQL: Record<MachineListQuery['sort'], string> = {
  fleetNumber: 'lower(m.fleet_number)',
  name: 'lower(m.name)',
  category: 'm.category',
  status: 'm.status',
  nextDue: 'd.next_due',
};

const STATUS_RANK = `CASE t.status WHEN 'overdue' THEN 0 WHEN 'due_soon' THEN 1 WHEN 'history_unknown' THEN 2 WHEN 'no_forecast' THEN 3 ELSE 4 END`;

/** One page of the fleet, filtered and sorted in SQL (stays fast at thousands of machines). */
export async function listMachines(access: OrgAccess, query: MachineListQuery) {
  const where: string[] = ['m.organization_id = :org'];
  const replacements: Record<string, unknown> = {
    org: access.organization.id,
    user: access.userId,
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  };
  if (query.category) {
    where.push('m.category = :category');
    replacements.category = query.category;
  }
  if (query.status) {
    where.push('m.status = :status');
    replacements.status = query.status;
  }
  if (query.dueStatus) {
    where.push('d.worst = :dueStatus');
    replacements.dueStatus = query.dueStatus;
  }
  if (query.q) {
    where.push(
      '(m.fleet_number ILIKE :q OR m.name ILIKE :q OR m.make ILIKE :q OR m.model ILIKE :q)',
    );
    replacements.q = `%${query.q.replace(/[%_\\]/g, (c) => `\\${c}`)}%`;
  }
  if (hasRole(access, 'operator')) {
    where.push(`(NOT EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = m.organization_id AND o.machine_id = m.id)
      OR EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = m.organization_id AND o.machine_id = m.id AND o.user_id = :user))`);
  }
  const order = `${SORT_SQL[query.sort]} ${query.order === 'desc' ? 'DESC' : 'ASC'} NULLS LAST, lower(m.fleet_number) ASC`;
  const rows = await sequelize.query<{
    id: string;
    worst: string | null;
    next_due: string | null;
    total: string;
  }>(
    `SELECT m.id, d.worst, d.next_due, count(*) OVER () AS total
     FROM machines m
     LEFT JOIN LATERAL (
       SELECT min(t.sort_date) AS next_due, (array_agg(t.status ORDER BY ${STATUS_RANK}))[1] AS worst
       FROM task_due_points t WHERE t.organization_id = m.organization_id AND t.machine_id = m.id
         -- daily care is signed off in the walkaround; the fleet's due figures are its services
         AND NOT EXISTS (SELECT 1 FROM service_tasks s WHERE s.id = t.task_id AND s.daily_care)
     ) d ON true
     WHERE ${where.join(' AND ')}
     ORDER BY ${order}
     LIMIT :limit OFFSET :offset`,
    { replacements, type: QueryTypes.SELECT },
  );
  const ids = rows.map((r) => r.id);
  const [machines, forecasts, operators] = await Promise.all([
    Machine.findAll({ where: { organizationId: access.organization.id, id: { [Op.in]: ids } } }),
    primaryForecastsOf(access.organization.id, ids, {
      attributes: ['machineId', 'lastValue', 'lastRawValue', 'lastTakenAt'],
    }),
    operatorIdsOf(ids, access.organization.id),
  ]);
  const byId = new Map(machines.map((m) => [m.id, m]));
  const forecastOf = new Map(forecasts.map((f) => [f.machineId, f]));
  return {
    total: rows.length ? Number(rows[0].total) : 0,
    items: rows.map((r) => ({
      machine: byId.get(r.id)!,
      forecast: forecastOf.get(r.id) ?? null,
      operatorIds: operators.get(r.id) ?? [],
      dueStatus: r.worst,
      nextDueDate: r.next_due,
    })),
  };
}

async function checkOperators(access: OrgAccess, operatorIds: string[], transaction: Transaction) {
  if (!operatorIds.length) return;
  const members = await Membership.findAll({
    where: { organizationId: access.organization.id, userId: { [Op.in]: operatorIds } },
    transaction,
  });
  if (members.length !== new Set(operatorIds).size) {
    throw invalid({ operatorIds: 'Every assigned operator must be a member of this farm' });
  }
}

async function fleetNumberTaken(
  access: OrgAccess,
  fleetNumber: string,
  exceptId: string | null,
  transaction: Transaction,
) {
  const found = await Machine.findOne({
    where: {
      organizationId: access.organization.id,
      [Op.and]: [
        sequelize.where(
          sequelize.fn('lower', sequelize.col('fleet_number')),
          fleetNumber.toLowerCase(),
        ),
      ],
      ...(exceptId && { id: { [Op.ne]: exceptId } }),
    },
    transaction,
  });
  if (found)
    throw invalid({
      fleetNumber: `Fleet number ${fleetNumber} is used by ${found.name} already; fleet numbers are unique per farm`,
    });
}

/** A telematics id as stored: empty text means none; taken by another machine is a 422. */
async function telematicsIdFree(
  access: OrgAccess,
  telematicsId: string | null,
  exceptId: string | null,
  transaction: Transaction,
): Promise<string | null> {
  if (!telematicsId) return null;
  const found = await Machine.findOne({
    where: {
      organizationId: access.organization.id,
      telematicsId,
      ...(exceptId && { id: { [Op.ne]: exceptId } }),
    },
    transaction,
  });
  if (found)
    throw invalid({
      telematicsId: `Telematics id ${telematicsId} is mapped to ${found.fleetNumber} ${found.name} already; each feed id names one machine`,
    });
  return telematicsId;
}

async function setOperators(
  access: OrgAccess,
  machineId: string,
  operatorIds: string[],
  transaction: Transaction,
) {
  await MachineOperator.destroy({
    where: { organizationId: access.organization.id, machineId },
    transaction,
  });
  if (operatorIds.length) {
    await MachineOperator.bulkCreate(
      [...new Set(operatorIds)].map((userId) => ({
        organizationId: access.organization.id,
        machineId,
        userId,
      })),
      { transaction },
    );
  }
}

/** Runs fn in the caller's transaction when there is one (an import), else in its own. */
const inTransaction = <T>(outer: Transaction | undefined, fn: (t: Transaction) => Promise<T>) =>
  outer ? fn(outer) : sequelize.transaction(fn);

/** Adds a machine (in the caller's transaction, when given). */
export async function createMachine(
  access: OrgAccess,
  input: MachineCreateInput,
  outer?: Transaction,
) {
  return inTransaction(outer, async (transaction) => {
    await fleetNumberTaken(access, input.fleetNumber, null, transaction);
    await checkOperators(access, input.operatorIds, transaction);
    const { operatorIds, ...fields } = input;
    const telematicsId = await telematicsIdFree(access, fields.telematicsId, null, transaction);
    const machine = await Machine.create(
      { ...fields, telematicsId, organizationId: access.organization.id, photoKey: null },
      { transaction },
    );
    await setOperators(access, machine.id, operatorIds, transaction);
    await recordAudit(
      {
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: 'machine.create',
        entityType: 'machine',
        entityId: machine.id,
        changes: { fleetNumber: machine.fleetNumber, name: machine.name },
      },
      transaction,
    );
    await refreshMachineForecast(machine.id, access.organization.id, transaction);
    return machine;
  });
}

export async function updateMachine(
  access: OrgAccess,
  machine: Machine,
  input: MachineUpdateInput,
  outer?: Transaction,
) {
  return inTransaction(outer, async (transaction) => {
    if (input.fleetNumber !== undefined)
      await fleetNumberTaken(access, input.fleetNumber, machine.id, transaction);
    if (input.operatorIds !== undefined)
      await checkOperators(access, input.operatorIds, transaction);
    if (input.telematicsId !== undefined)
      input = {
        ...input,
        telematicsId: await telematicsIdFree(access, input.telematicsId, machine.id, transaction),
      };
    input = await applyStatusEdit(access, machine, input, transaction);
    const { operatorIds, ...fields } = input;
    const before = Object.fromEntries(
      Object.keys(fields).map((k) => [k, machine.get(k as keyof Machine)]),
    );
    await machine.update(fields, { transaction });
    // the season months date the machine's season services
    if (fields.seasonMonths !== undefined)
      await recomputeDuePoints(access.organization.id, [machine.id], {
        transaction,
        timeZone: access.organization.timeZone,
      });
    if (operatorIds !== undefined) await setOperators(access, machine.id, operatorIds, transaction);
    await recordAudit(
      {
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: 'machine.update',
        entityType: 'machine',
        entityId: machine.id,
        changes: { before, after: fields, ...(operatorIds && { operatorIds }) },
      },
      transaction,
    );
    return machine;
  });
}
