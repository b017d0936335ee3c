// Writes the demo farms' schedule templates and each machine's tasks, with last-done points
// planned so a few tasks are overdue, a few due soon and most fine (service-plan.ts).
import type { Transaction } from 'sequelize';
import { ScheduleTemplate, ServiceTask } from '../models';
import type { MachineReadings } from './demo-readings';
import { DEMO_DUE_SOON, DEMO_MACHINES, DEMO_OVERDUE, DUE_SOON_RANGE } from './demo-fleet';
import type { DemoOrganization } from './demo-people';
import { planLastDone } from './service-plan';
import { serviceLibraryClass } from '../../shared/domain/service-library';
import { buildTemplates } from './templates';
import { demoId, demoMachineId as machineId, demoOrgId as orgId } from './demo-ids';
import { inChunks } from './demo-machines';

/** Writes each farm's templates (one per category); returns them by farm key. */
export async function writeTemplates(farms: DemoOrganization[], transaction: Transaction) {
  const templates = new Map(farms.map((f) => [f.key, buildTemplates(f.units)]));
  await ScheduleTemplate.bulkCreate(
    farms.flatMap((f) =>
      templates.get(f.key)!.map((t) => ({
        id: demoId(`template/${f.key}/${t.category}`),
        organizationId: orgId(f.key),
        category: t.category,
        name: t.name,
        description: t.description,
        tasks: t.tasks,
      })),
    ),
    { transaction },
  );

  return templates;
}

/** Writes every machine's tasks from its class in the service library; returns the rows written. */
export async function writeTasks(
  farms: DemoOrganization[],
  history: Map<string, MachineReadings>,
  today: Date,
  transaction: Transaction,
) {
  // Each machine gets its class's schedule from the service library, in its own meter unit (as
  // "Apply machine class" gives it), with last-done points planned per farm.
  const taskRows = farms.flatMap((farm) => {
    const fleet = DEMO_MACHINES.filter((m) => m.organization === farm.key);
    const planned = planLastDone(
      fleet.map((m) => ({
        fleetNumber: m.fleetNumber,
        readings: history.get(m.fleetNumber)!.readings,
        tasks: serviceLibraryClass(m.machineClass, m.meterUnit).tasks,
        seasonMonths: m.season.months,
      })),
      {
        timeZone: farm.timeZone,
        today,
        overdue: DEMO_OVERDUE,
        dueSoonFirst: DEMO_DUE_SOON,
        dueSoonRange: DUE_SOON_RANGE,
      },
    );
    return planned.map((p) => ({
      id: demoId(`task/${farm.key}/${p.fleetNumber}/${p.task.name}`),
      organizationId: orgId(farm.key),
      machineId: machineId({ organization: farm.key, fleetNumber: p.fleetNumber }),
      ...p.task,
      ...p.lastDone,
      position: p.position,
    }));
  });
  await inChunks(taskRows, (chunk) =>
    ServiceTask.bulkCreate(chunk, { transaction, returning: false }),
  );

  return taskRows;
}
