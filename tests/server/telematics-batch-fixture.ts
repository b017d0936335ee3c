// Twin farms for the set-based snapshot test (telematics-batch.test.ts): the same machines (fleet
// numbers, serial numbers), readings and tasks on two organizations, written in bulk, so one can
// take a whole snapshot at once and the other the same readings one by one. The rows of each are
// read back keyed by fleet number (ids differ between the twins), for comparison.
import { QueryTypes } from 'sequelize';
import { sequelize } from '../../server/db';
import { Machine, MeterReading, ServiceTask } from '../../server/models';
import type { OrgAccess } from '../../server/policies/context';
import { refreshOrganizationForecasts } from '../../server/services/forecast';
import { createMember, createOrganization } from '../support/factories';

const DAY = 86_400_000;
const fleetNumber = (i: number) => `F-${String(i).padStart(3, '0')}`;
export const serialOf = (i: number) => `BTC-${String(i).padStart(4, '0')}`;
/** the last stored value of machine i (its readings 20, 10 and 2 days before `now`) */
export const lastValueOf = (i: number) => 1000 + i * 3 + 40;

/** A farm of `count` machines, each with three readings and two tasks, forecasts built. */
export async function twinFarm(count: number, now: Date) {
  const organization = await createOrganization({ timeZone: 'America/Chicago' });
  const { user } = await createMember(organization, 'manager');
  const access: OrgAccess = { organization, userId: user.id, role: 'manager', via: 'member' };
  const machines = await Machine.bulkCreate(
    Array.from({ length: count }, (_, i) => ({
      organizationId: organization.id,
      fleetNumber: fleetNumber(i),
      name: `Tractor ${i}`,
      category: 'tractor' as const,
      year: 2020,
      purchasePriceMinor: null,
      listPriceMinor: null,
      photoKey: null,
      serialNumber: serialOf(i),
    })),
  );
  await MeterReading.bulkCreate(
    machines.flatMap((m, i) =>
      [
        [20, 1000 + i * 3],
        [10, 1000 + i * 3 + 25],
        [2, lastValueOf(i)],
      ].map(([daysAgo, value]) => ({
        organizationId: organization.id,
        machineId: m.id,
        value,
        lifetimeValue: value,
        takenAt: new Date(now.getTime() - daysAgo * DAY),
        source: 'manual' as const,
        enteredBy: null,
        importKey: null,
      })),
    ),
  );
  await ServiceTask.bulkCreate(
    machines.flatMap((m, i) =>
      [
        {
          name: 'Engine oil and filter',
          intervalMeter: 250,
          warnMeter: 25,
          lastDoneMeter: 900 + i,
        },
        { name: 'Hydraulic filter', intervalMeter: 500, intervalDays: 365, warnMeter: 50 },
      ].map((task) => ({
        organizationId: organization.id,
        machineId: m.id,
        intervalDays: null,
        firstServiceMeter: null,
        warnDays: null,
        labourHours: 1,
        lastDoneMeter: null,
        lastDoneOn: null,
        ...task,
      })),
    ),
  );
  await refreshOrganizationForecasts(organization.id, { timeZone: organization.timeZone });
  return { organization, user, access, machines };
}

const rowsOf = (sql: string, organizationId: string) =>
  sequelize.query<Record<string, unknown>>(sql, {
    replacements: { org: organizationId },
    type: QueryTypes.SELECT,
  });

/** A farm's readings, forecast rows and due points, by fleet number (no ids, no write times). */
export async function farmRows(organizationId: string) {
  const [readings, forecasts, duePoints] = await Promise.all([
    rowsOf(
      `SELECT m.fleet_number, r.value::float8, r.lifetime_value::float8, r.taken_at
       FROM meter_readings r JOIN machines m ON m.id = r.machine_id
       WHERE r.organization_id = :org ORDER BY m.fleet_number, r.taken_at`,
      organizationId,
    ),
    rowsOf(
      `SELECT m.fleet_number, f.daily, f.reading_count, f.last_value::float8,
              f.last_raw_value::float8, f.last_taken_at, f.first_taken_at, f.first_value::float8,
              f.usage, f.computed_on
       FROM machine_forecasts f JOIN machines m ON m.id = f.machine_id
       WHERE f.organization_id = :org ORDER BY m.fleet_number`,
      organizationId,
    ),
    rowsOf(
      `SELECT m.fleet_number, t.name, d.status, d.sort_date, d.due, d.computed_on
       FROM task_due_points d JOIN machines m ON m.id = d.machine_id
       JOIN service_tasks t ON t.id = d.task_id
       WHERE d.organization_id = :org ORDER BY m.fleet_number, t.name`,
      organizationId,
    ),
  ]);
  return { readings, forecasts, duePoints };
}
