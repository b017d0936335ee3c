// Loads the invented demo scenario in one transaction: three organizations, six people, two farm
// fleets with schedules, two-plus years of readings ending today, and last-done points that leave
// a few tasks overdue, a few due soon and most fine. Same data on every load (seeded), always current.
import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { AuditEvent, Membership, Organization, User } from '../models';
import { hashPassword } from '../services/accounts';
import { recomputeDuePoints, refreshOrganizationForecasts } from '../services/forecast';
import { DEMO_MACHINES } from './demo-fleet';
import { DEMO_ORGANIZATIONS, DEMO_PASSWORD, DEMO_PEOPLE } from './demo-people';
import {
  demoId,
  demoMachineId as machineId,
  demoOrganization as orgOf,
  demoOrgId as orgId,
  demoStaff as staff,
  demoUserId as userId,
} from './demo-ids';
import { writeMachines } from './demo-machines';
import { writeTasks, writeTemplates } from './demo-schedules';
import { writeServiceHistory } from './demo-services';
import type { DemoMachineWorld } from './demo-service-visits';
import { writeWalkarounds } from './demo-walkarounds';
import { writeDealerLinks } from './demo-dealers';
import { writeSpecSheets } from './demo-spec-sheets';

export interface DemoSummary {
  organizations: number;
  users: number;
  machines: number;
  readings: number;
}

export interface LoadDemoOptions {
  /** the demo's "today": the history ends here (default: now) */
  today?: Date;
  /** wipe every tenant table first */
  reset?: boolean;
  /** load only into an empty database; returns null when there is data */
  ifEmpty?: boolean;
}

const LOCK_KEY = 'hourstone-demo-load';

async function truncateAll(transaction: Transaction) {
  const tables = await sequelize.query<{ tablename: string }>(
    `SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'schema_migrations'`,
    { type: QueryTypes.SELECT, transaction },
  );
  if (!tables.length) return;
  await sequelize.query(
    `TRUNCATE ${tables.map((t) => `"${t.tablename}"`).join(', ')} RESTART IDENTITY CASCADE`,
    {
      transaction,
    },
  );
}

/**
 * Loads the demo scenario in one transaction, then refreshes each farm's forecasts. Throws when
 * the database has data and neither reset nor ifEmpty is given.
 */
export async function loadDemo(options: LoadDemoOptions = {}): Promise<DemoSummary | null> {
  const today = options.today ?? new Date();
  // The usual start-up case (data present) answers before spending time on the password hash.
  if (options.ifEmpty && !options.reset && (await Organization.count()) > 0) return null;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const summary = await sequelize.transaction(async (transaction) => {
    // Two copies starting at once (several API instances) load the demo once.
    await sequelize.query('SELECT pg_advisory_xact_lock(hashtext(:key))', {
      replacements: { key: LOCK_KEY },
      transaction,
    });
    if (options.reset) await truncateAll(transaction);
    else if ((await Organization.count({ transaction })) > 0) {
      if (options.ifEmpty) return null;
      throw new Error('The database has data already: load the demo with reset to replace it.');
    }
    return writeScenario(today, passwordHash, transaction);
  });
  if (!summary) return null;

  for (const org of DEMO_ORGANIZATIONS.filter((o) => o.kind === 'farm')) {
    const id = demoId(`org/${org.key}`);
    await refreshOrganizationForecasts(id);
    // The forecast service dates due points by the clock; a demo loaded "as of" another day follows it.
    if (Math.abs(today.getTime() - Date.now()) > 60_000)
      await recomputeDuePoints(id, undefined, { now: today });
  }
  return summary;
}

async function writeScenario(
  today: Date,
  passwordHash: string,
  transaction: Transaction,
): Promise<DemoSummary> {
  await Organization.bulkCreate(
    DEMO_ORGANIZATIONS.map((o) => ({
      id: orgId(o.key),
      name: o.name,
      kind: o.kind,
      timeZone: o.timeZone,
      units: o.units,
    })),
    { transaction },
  );
  await User.bulkCreate(
    DEMO_PEOPLE.map((p) => ({ id: userId(p.email), email: p.email, name: p.name, passwordHash })),
    { transaction },
  );
  await Membership.bulkCreate(
    DEMO_PEOPLE.map((p) => ({
      id: demoId(`membership/${p.email}`),
      organizationId: orgId(p.organization),
      userId: userId(p.email),
      role: p.role,
    })),
    { transaction },
  );

  const farms = DEMO_ORGANIZATIONS.filter((o) => o.kind === 'farm');
  // the farms keep category templates of their own to start from; machines get their class's tasks
  await writeTemplates(farms, transaction);

  const { history, readingCount } = await writeMachines(today, transaction);

  const taskRows = await writeTasks(farms, history, today, transaction);
  // spec sheets after the tasks: the tasks' lines linked to a sheet take its figures
  await writeSpecSheets(
    transaction,
    new Set(DEMO_MACHINES.map((m) => `${m.organization}/${m.fleetNumber}`)),
  );

  // Service history and plans, checklists, walkarounds and defects, on the last-done points above.
  const worlds: DemoMachineWorld[] = DEMO_MACHINES.map((m) => {
    const org = orgOf(m.organization);
    const id = machineId(m);
    return {
      organizationKey: m.organization,
      organizationId: orgId(m.organization),
      id,
      fleetNumber: m.fleetNumber,
      category: m.category,
      machineClass: m.machineClass,
      timeZone: org.timeZone,
      units: org.units,
      readings: history.get(m.fleetNumber)!.readings,
      operatorIds: (m.operators ?? []).map(userId),
      shopPersonId:
        staff(m.organization, 'technician')[0] ?? staff(m.organization, 'manager')[0] ?? null,
      tasks: taskRows.filter((t) => t.machineId === id),
    };
  });
  await writeServiceHistory(worlds, today, demoId, transaction);
  await writeWalkarounds(
    farms.map((f) => ({ key: f.key, id: orgId(f.key) })),
    worlds,
    today,
    demoId,
    transaction,
  );

  await writeDealerLinks(
    {
      today,
      orgId,
      userId,
      machineId,
      demoId,
      timeZoneOf: (key) => orgOf(key).timeZone,
      machineName: (fleetNumber) => DEMO_MACHINES.find((m) => m.fleetNumber === fleetNumber)!.name,
      tasks: taskRows,
    },
    transaction,
  );

  await AuditEvent.bulkCreate(
    farms.map((f) => ({
      organizationId: orgId(f.key),
      actorUserId: null,
      action: 'demo.load',
      entityType: 'organization',
      entityId: orgId(f.key),
      changes: { today: today.toISOString() },
    })),
    { transaction },
  );

  return {
    organizations: DEMO_ORGANIZATIONS.length,
    users: DEMO_PEOPLE.length,
    machines: DEMO_MACHINES.length,
    readings: readingCount,
  };
}
