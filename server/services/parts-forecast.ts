import { Op } from 'sequelize';
import { addDaysIso, todayIso } from '../../shared/domain';
import type { PartsForecastQuery } from '../../shared/schemas/dealers';
import { ServiceTask } from '../models';
import type { OrgAccess } from '../policies/access';
import { boardRows, type BoardRow } from './dealer-board';
import { sumPartsForecast, type ForecastService } from './parts-sum';

/**
 * When a board row's parts are first needed: today for an overdue service, else the date it
 * falls due; null when it falls outside the horizon or has no forecast (it cannot be dated).
 */
function neededOn(row: BoardRow, horizon: number, now: Date): string | null {
  const today = todayIso(row.customer.timeZone, now);
  if (row.due.status === 'no_forecast') return null;
  if (row.due.status === 'overdue') return today;
  const date = row.due.effectiveDate ?? row.due.projectedDate ?? row.due.dueDate;
  if (!date || date > addDaysIso(today, horizon)) return null;
  return date < today ? today : date;
}

/**
 * The parts and fluids the dealer's customers' due services call for inside the horizon, summed
 * by part number (fluids by kind, in the dealer's stock units) per customer and in total, and the
 * wear parts those services inspect. The services come from the board (the farms' own due
 * lists); the lists from each task's schedule line.
 */
export async function partsForecast(
  access: OrgAccess,
  query: PartsForecastQuery,
  path: string,
  now = new Date(),
) {
  const board = await boardRows(
    access,
    { horizon: query.horizon, customerId: query.customerId },
    path,
    now,
  );
  const dated = board.rows.flatMap((row) => {
    const on = neededOn(row, query.horizon, now);
    return on ? [{ row, on }] : [];
  });
  const byFarm = new Map<string, string[]>();
  for (const { row } of dated)
    byFarm.set(row.customer.id, [...(byFarm.get(row.customer.id) ?? []), row.taskId]);
  const tasks = new Map<string, ServiceTask>();
  for (const [farmId, ids] of byFarm) {
    const found = await ServiceTask.findAll({
      where: { organizationId: farmId, id: { [Op.in]: ids } },
      attributes: ['id', 'parts', 'fluids'],
    });
    for (const t of found) tasks.set(t.id, t);
  }
  const services: ForecastService[] = dated.map(({ row, on }) => ({
    customer: { id: row.customer.id, name: row.customer.name },
    machine: { id: row.machine.id, fleetNumber: row.machine.fleetNumber, name: row.machine.name },
    neededOn: on,
    parts: tasks.get(row.taskId)?.parts ?? [],
    fluids: tasks.get(row.taskId)?.fluids ?? [],
  }));
  // the dealer's own units decide the stock units: one counter, one way of counting
  const units = access.organization.units;
  const summary = sumPartsForecast(services, units);
  return {
    asOf: board.asOf,
    horizon: query.horizon,
    units,
    services: services.length,
    /** due rows left out because they cannot be dated (no forecast) */
    undated: board.rows.filter(
      (r) => r.due.status === 'no_forecast' || r.due.status === 'history_unknown',
    ).length,
    customers: board.customers,
    parts: summary.parts,
    fluids: summary.fluids,
    wearParts: summary.wearParts,
    byCustomer: summary.customers,
  };
}
