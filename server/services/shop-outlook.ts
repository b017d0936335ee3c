import { Op } from 'sequelize';
import { addDaysIso, daysBetweenIso, todayIso } from '../../shared/domain';
import type { DueRow } from '../../shared/schemas/due';
import type { OrgRef } from '../../shared/schemas/refs';
import type {
  DealerOutlookQuery,
  OutlookPlan,
  ShopOutlookQuery,
} from '../../shared/schemas/shop-outlook';
import { notFound } from '../errors';
import { Machine, ServiceBooking, ServiceRecord, ServiceTask } from '../models';
import type { OrgAccess } from '../policies/access';
import { boardRows } from './dealer-board';
import { dueRows } from './due-list';
import { mondayOf } from './shop-week';
import { outlookWeeks, type OutlookInput } from './shop-outlook-weeks';

const round2 = (n: number) => Math.round(n * 100) / 100;

/** The outlook's span: from this week's Monday (the caller's local date) for `weeks` weeks. */
function spanOf(timeZone: string, weeks: number, now: Date) {
  const asOf = todayIso(timeZone, now);
  const start = mondayOf(asOf);
  const end = addDaysIso(start, weeks * 7 - 1);
  return { asOf, start, end, horizon: daysBetweenIso(asOf, end) };
}

/** The farms' open plans, soonest first, with their machines and their tasks' labour. */
async function openPlans(farms: OrgRef[], end: string) {
  const farmIds = farms.map((f) => f.id);
  if (!farmIds.length) return { all: [] as ServiceRecord[], dated: [] as OutlookPlan[] };
  const all = await ServiceRecord.findAll({
    where: { organizationId: { [Op.in]: farmIds }, status: 'planned' },
    attributes: ['id', 'organizationId', 'machineId', 'plannedFor', 'tasks', 'createdAt'],
    order: [
      ['plannedFor', 'ASC'],
      ['createdAt', 'ASC'],
    ],
  });
  const inSpan = all.filter((r) => r.plannedFor !== null && r.plannedFor <= end);
  const [machines, tasks] = await Promise.all([
    Machine.findAll({
      where: {
        organizationId: { [Op.in]: farmIds },
        id: { [Op.in]: [...new Set(inSpan.map((r) => r.machineId))] },
      },
      attributes: ['id', 'fleetNumber', 'name'],
    }),
    ServiceTask.findAll({
      where: {
        organizationId: { [Op.in]: farmIds },
        id: { [Op.in]: [...new Set(inSpan.flatMap((r) => r.tasks.map((t) => t.taskId)))] },
      },
      attributes: ['id', 'labourHours'],
    }),
  ]);
  const machineOf = new Map(machines.map((m) => [m.id, m]));
  const labourOf = new Map(tasks.map((t) => [t.id, t.labourHours]));
  const dated = inSpan.flatMap((r): OutlookPlan[] => {
    const machine = machineOf.get(r.machineId);
    if (!machine) return [];
    // a task removed from the schedule since has no estimate left: counted as unknown
    const labour = r.tasks.map((t) => labourOf.get(t.taskId) ?? null);
    return [
      {
        id: r.id,
        plannedFor: r.plannedFor!,
        machine: { id: machine.id, fleetNumber: machine.fleetNumber, name: machine.name },
        customer: null,
        tasks: r.tasks.length,
        labourHours: round2(labour.reduce<number>((n, h) => n + (h ?? 0), 0)),
        labourUnknown: labour.filter((h) => h === null).length,
      },
    ];
  });
  return { all, dated };
}

/**
 * Bookings a dealer proposed for a date inside the span that the farm has not decided yet, one
 * entry per machine, labour from the tasks' estimates. `where` picks the farm's or the dealer's.
 */
async function proposedBookings(
  where: { organizationId: string | string[]; dealerOrganizationId?: string },
  span: { start: string; end: string },
  customerOf: (farmId: string) => OrgRef | null,
): Promise<OutlookPlan[]> {
  const farmIds = ([] as string[]).concat(where.organizationId);
  if (!farmIds.length) return [];
  const bookings = await ServiceBooking.findAll({
    where: {
      organizationId: { [Op.in]: farmIds },
      ...(where.dealerOrganizationId && { dealerOrganizationId: where.dealerOrganizationId }),
      status: 'proposed',
      proposedFor: { [Op.between]: [span.start, span.end] },
    },
    order: [
      ['proposedFor', 'ASC'],
      ['createdAt', 'ASC'],
    ],
  });
  const taskIds = bookings.flatMap((b) => b.items.flatMap((i) => i.tasks.map((t) => t.taskId)));
  const tasks = taskIds.length
    ? await ServiceTask.findAll({
        where: { organizationId: { [Op.in]: farmIds }, id: { [Op.in]: [...new Set(taskIds)] } },
        attributes: ['id', 'labourHours'],
      })
    : [];
  const labourOf = new Map(tasks.map((t) => [t.id, t.labourHours]));
  return bookings.flatMap((b) =>
    b.items.map((item) => {
      const labour = item.tasks.map((t) => labourOf.get(t.taskId) ?? null);
      return {
        id: b.id,
        plannedFor: b.proposedFor,
        machine: { id: item.machineId, fleetNumber: item.fleetNumber, name: item.machineName },
        customer: customerOf(b.organizationId),
        tasks: item.tasks.length,
        labourHours: round2(labour.reduce<number>((n, h) => n + (h ?? 0), 0)),
        labourUnknown: labour.filter((h) => h === null).length,
      };
    }),
  );
}

/** The due rows as the outlook's services, with each task's parts and fluids. */
async function servicesOf(
  rows: (DueRow & { customer?: OrgRef })[],
  farmIds: string[],
  plans: ServiceRecord[],
): Promise<OutlookInput[]> {
  // A task already on an open plan (any date) says so: the earliest plan covering it.
  const plannedOn = new Map<string, string>();
  for (const r of plans)
    for (const t of r.tasks)
      if (r.plannedFor && !plannedOn.has(t.taskId)) plannedOn.set(t.taskId, r.plannedFor);
  const tasks = rows.length
    ? await ServiceTask.findAll({
        where: {
          organizationId: { [Op.in]: farmIds },
          id: { [Op.in]: rows.map((r) => r.taskId) },
        },
        attributes: ['id', 'parts', 'fluids'],
      })
    : [];
  const taskOf = new Map(tasks.map((t) => [t.id, t]));
  return rows.map((row) => ({
    service: {
      taskId: row.taskId,
      taskName: row.taskName,
      machine: { id: row.machine.id, fleetNumber: row.machine.fleetNumber, name: row.machine.name },
      customer: row.customer ? { id: row.customer.id, name: row.customer.name } : null,
      status: row.due.status,
      dueOn: row.due.effectiveDate,
      labourHours: row.labourHours,
      plannedOn: plannedOn.get(row.taskId) ?? null,
    },
    parts: taskOf.get(row.taskId)?.parts ?? [],
    fluids: taskOf.get(row.taskId)?.fluids ?? [],
  }));
}

const undatedOf = (rows: DueRow[]) =>
  rows.filter((r) => r.due.status === 'no_forecast' || r.due.status === 'history_unknown').length;

/**
 * The farm shop's next weeks from this Monday (the farm's time zone): per week the services its
 * due list brings due (overdue in the first week), their labour, parts and fluids, beside the
 * open plans dated in it (accepted bookings are plans) and the dealers' proposals awaiting it.
 */
export async function shopOutlook(access: OrgAccess, query: ShopOutlookQuery, now = new Date()) {
  const org = access.organization;
  const span = spanOf(org.timeZone, query.weeks, now);
  const [{ rows }, plans, proposed] = await Promise.all([
    dueRows(access, { horizon: span.horizon }, now),
    openPlans([{ id: org.id, name: org.name }], span.end),
    proposedBookings({ organizationId: org.id }, span, () => null),
  ]);
  const inputs = await servicesOf(rows, [org.id], plans.all);
  return {
    asOf: span.asOf,
    start: span.start,
    end: span.end,
    units: org.units,
    undated: undatedOf(rows),
    weeks: outlookWeeks(span.start, query.weeks, inputs, plans.dated, org.units, proposed),
  };
}

/**
 * The dealer's next weeks across its linked customers (or one, `customerId`; one not linked is
 * 404): the customers' due rows as the board reads them (each farm's own list, its reads
 * audited), and the plans of the customers whose link gives `service` access (service history is
 * not shown through a view link), and its own proposals not yet decided. Weeks start on the
 * dealer's Monday; fluids in its units.
 */
export async function dealerOutlook(
  access: OrgAccess,
  query: DealerOutlookQuery,
  path: string,
  now = new Date(),
) {
  const org = access.organization;
  const span = spanOf(org.timeZone, query.weeks, now);
  const board = await boardRows(
    access,
    { horizon: span.horizon, customerId: query.customerId },
    path,
    now,
  );
  if (query.customerId && !board.customers.some((c) => c.id === query.customerId))
    throw notFound('Customer');
  const shown = board.customers.filter((c) => !query.customerId || c.id === query.customerId);
  const serviced = shown.filter((c) => c.access === 'service');
  const customerOf = new Map(shown.map((c) => [c.id, { id: c.id, name: c.name }]));
  const [plans, proposed] = await Promise.all([
    openPlans(serviced, span.end),
    // the dealer's own proposals, whatever the link's access: it made them
    proposedBookings(
      { organizationId: shown.map((c) => c.id), dealerOrganizationId: org.id },
      span,
      (farmId) => customerOf.get(farmId) ?? null,
    ),
  ]);
  const farmOfPlan = new Map(plans.all.map((r) => [r.id, r.organizationId]));
  const dated = plans.dated.map((p) => ({
    ...p,
    customer: customerOf.get(farmOfPlan.get(p.id)!) ?? null,
  }));
  const inputs = await servicesOf(
    board.rows,
    shown.map((c) => c.id),
    plans.all,
  );
  return {
    asOf: span.asOf,
    start: span.start,
    end: span.end,
    units: org.units,
    undated: undatedOf(board.rows),
    customers: board.customers,
    weeks: outlookWeeks(span.start, query.weeks, inputs, dated, org.units, proposed),
  };
}
