// Loads the invented demo scenario in one transaction: three organizations, six people, two farm
// fleets with schedules, two-plus years of readings ending today, and last-done points that leave
// a few tasks overdue, a few due soon and most fine. Same data on every load (seeded), always current.
import { createHash } from 'node:crypto';
import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import {
  AuditEvent,
  Machine,
  MachineOperator,
  Membership,
  MeterReading,
  MeterReplacement,
  Organization,
  ScheduleTemplate,
  ServiceTask,
  User,
} from '../models';
import { todayIso } from '../../shared/domain';
import { hashPassword } from '../services/accounts';
import { recomputeDuePoints, refreshOrganizationForecasts } from '../services/forecast';
import { buildMachineReadings, type MachineReadings } from './demo-readings';
import {
  DEMO_DUE_SOON,
  DEMO_MACHINES,
  DEMO_OVERDUE,
  DUE_SOON_RANGE,
  METER_REPLACEMENT,
} from './demo-fleet';
import {
  DEMO_ORGANIZATIONS,
  DEMO_PASSWORD,
  DEMO_PEOPLE,
  type DemoOrganization,
} from './demo-people';
import { planLastDone } from './service-plan';
import { buildTemplates } from './templates';
import { writeServiceHistory, type DemoMachineWorld } from './demo-services';
import { writeWalkarounds } from './demo-walkarounds';
import { writeDealerLinks } from './demo-dealers';

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

const CHUNK = 1000;
const LOCK_KEY = 'hourstone-demo-load';

/** A stable id from a name, so the demo's records keep their ids (and links) across reloads. */
export function demoId(name: string): string {
  const h = createHash('sha256').update(`hourstone-demo:${name}`).digest('hex');
  const variant = ((parseInt(h[16], 16) & 0x3) | 0x8).toString(16);
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-8${h.slice(13, 16)}-${variant}${h.slice(17, 20)}-${h.slice(20, 32)}`;
}

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

async function inChunks<T>(rows: T[], write: (chunk: T[]) => Promise<unknown>) {
  for (let i = 0; i < rows.length; i += CHUNK) await write(rows.slice(i, i + CHUNK));
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
  const orgId = (key: DemoOrganization['key']) => demoId(`org/${key}`);
  const userId = (email: string) => demoId(`user/${email}`);
  const orgOf = (key: DemoOrganization['key']) => DEMO_ORGANIZATIONS.find((o) => o.key === key)!;

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

  const machineId = (m: { organization: string; fleetNumber: string }) =>
    demoId(`machine/${m.organization}/${m.fleetNumber}`);
  const staff = (key: DemoOrganization['key'], role: string) =>
    DEMO_PEOPLE.filter((p) => p.organization === key && p.role === role).map((p) =>
      userId(p.email),
    );

  // Readings first: the T-03 meter replacement goes into that machine's notes.
  const history = new Map<string, MachineReadings>();
  for (const m of DEMO_MACHINES) {
    const operators = (m.operators ?? []).map(userId);
    history.set(
      m.fleetNumber,
      buildMachineReadings(m, {
        today,
        timeZone: orgOf(m.organization).timeZone,
        enteredBy: [...operators, ...operators, ...staff(m.organization, 'manager')],
        technician: staff(m.organization, 'technician')[0] ?? null,
        replaceDaysAgo:
          m.fleetNumber === METER_REPLACEMENT.fleetNumber ? METER_REPLACEMENT.daysAgo : undefined,
      }),
    );
  }

  await Machine.bulkCreate(
    DEMO_MACHINES.map((m) => {
      const replacement = history.get(m.fleetNumber)!.replacement;
      return {
        id: machineId(m),
        organizationId: orgId(m.organization),
        fleetNumber: m.fleetNumber,
        name: m.name,
        category: m.category,
        make: m.make,
        model: m.model,
        serialNumber: m.serialNumber,
        year: m.year,
        // the demo's prices are whole dollars; the farms count in cents
        purchasePriceMinor: m.purchasePrice * 100,
        listPriceMinor: m.listPrice * 100,
        meterUnit: m.meterUnit,
        seasonMonths: m.season.months,
        photoKey: null,
        notes: replacement
          ? `Hour meter replaced ${todayIso(orgOf(m.organization).timeZone, replacement.replacedAt)}: the old meter stopped at ${replacement.oldFinalValue.toLocaleString('en-US')} h, the new one started at 0 h.`
          : '',
      };
    }),
    { transaction },
  );
  await MachineOperator.bulkCreate(
    DEMO_MACHINES.flatMap((m) =>
      (m.operators ?? []).map((email) => ({
        organizationId: orgId(m.organization),
        machineId: machineId(m),
        userId: userId(email),
      })),
    ),
    { transaction },
  );

  const replacements = DEMO_MACHINES.flatMap((m) => {
    const r = history.get(m.fleetNumber)!.replacement;
    return r ? [{ organizationId: orgId(m.organization), machineId: machineId(m), ...r }] : [];
  });
  await MeterReplacement.bulkCreate(replacements, { transaction });
  const readingRows = DEMO_MACHINES.flatMap((m) =>
    history.get(m.fleetNumber)!.readings.map((r) => ({
      organizationId: orgId(m.organization),
      machineId: machineId(m),
      importKey: null,
      updatedAt: r.createdAt,
      ...r,
    })),
  );
  await inChunks(readingRows, (chunk) =>
    MeterReading.bulkCreate(chunk, { transaction, returning: false }),
  );

  // Each machine gets its category's schedule, with last-done points planned per farm.
  const taskRows = farms.flatMap((farm) => {
    const fleet = DEMO_MACHINES.filter((m) => m.organization === farm.key);
    const byCategory = new Map(templates.get(farm.key)!.map((t) => [t.category, t.tasks]));
    const planned = planLastDone(
      fleet.map((m) => ({
        fleetNumber: m.fleetNumber,
        readings: history.get(m.fleetNumber)!.readings,
        tasks: byCategory.get(m.category) ?? [],
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
    readings: readingRows.length,
  };
}
