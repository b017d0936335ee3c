import { randomUUID } from 'node:crypto';
import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { unzipSync, strFromU8 } from 'fflate';
import { parse } from 'csv-parse/sync';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import {
  Defect,
  MeterReading,
  ServiceAttachment,
  MachineSpecSheet,
  ServiceMeasurement,
  ServiceRecord,
  Walkaround,
  WalkaroundPhoto,
  type Organization,
} from '../../server/models';
import { putObject } from '../../server/infra/storage';
import { EXPORT_TABLES } from '../../server/services/farm-export-tables';
import { EXPORT_PAGE_ROWS } from '../../server/services/farm-export';
import { linkDealer } from './dealer-fixture';

const app = createApp();
const exportUrl = (orgId: string) => `/api/v1/organizations/${orgId}/export`;

/** Collects the body as bytes (supertest parses only text and JSON by itself). */
const binary = (res: unknown, done: (err: Error | null, body: Buffer) => void) => {
  // superagent hands the parser the response stream itself (typed as its Response object)
  const stream = res as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (chunk: Buffer) => chunks.push(chunk));
  stream.on('end', () => done(null, Buffer.concat(chunks)));
};

const csvRows = (files: Record<string, Uint8Array>, name: string) =>
  parse(strFromU8(files[name]), { columns: true }) as Record<string, string>[];

/** A farm with one machine and one of every kind of record, and two stored files. */
async function farmWithRecords(name: string, fleetNumber: string) {
  const org = await createOrganization({ name });
  const { user: manager } = await createMember(org, 'manager');
  const machine = await createMachine(org, { fleetNumber, name: `${name} loader` });
  await addReadings(machine, [
    { daysAgo: 20, value: 100 },
    { daysAgo: 10, value: 150 },
    { daysAgo: 1, value: 190 },
  ]);
  await createTask(machine, { name: 'Engine oil', intervalMeter: 250, lastDoneMeter: 0 });
  const record = await ServiceRecord.create({
    organizationId: org.id,
    machineId: machine.id,
    status: 'completed',
    plannedFor: null,
    performedOn: '2026-03-02',
    meterValue: 150,
    meterLifetime: 150,
    readingId: null,
    labourHours: 1.5,
    parts: [{ partNumber: 'OF-1', description: 'Oil filter', quantity: 1, unitCostMinor: 1250 }],
    notes: '=SUM(A1:A9) is how the invoice adds up',
    createdBy: manager.id,
    completedBy: manager.id,
    completedAt: new Date(),
  });
  await ServiceMeasurement.create({
    organizationId: org.id,
    machineId: machine.id,
    serviceRecordId: record.id,
    position: 0,
    name: 'Front wheel toe-in',
    value: -1.5,
    unit: 'mm',
    specMin: -3,
    specMax: 0,
  });
  await MachineSpecSheet.create({
    organizationId: org.id,
    machineId: machine.id,
    capacities: { engineOil: { quantity: 14, unit: 'L', spec: 'SAE 15W-40' } },
    updatedBy: manager.id,
  });
  const key = `org/${org.id}/service-records/${record.id}/${randomUUID()}`;
  const invoice = Buffer.from(`%PDF-1.4 invoice of ${name}`);
  await putObject(`${key}.pdf`, invoice, 'application/pdf');
  await ServiceAttachment.create({
    organizationId: org.id,
    machineId: machine.id,
    serviceRecordId: record.id,
    kind: 'pdf',
    contentType: 'application/pdf',
    fileName: 'invoice.pdf',
    sizeBytes: invoice.length,
    objectKey: key,
    uploadedBy: manager.id,
  });
  const walkaround = await Walkaround.create({
    organizationId: org.id,
    machineId: machine.id,
    operatorId: manager.id,
    clientId: randomUUID(),
    purpose: 'use',
    performedAt: new Date(),
    meterValue: 190,
    readingId: null,
    templateId: null,
    items: [],
    result: 'attention',
  });
  // A photo whose file the store lost: listed in missing-files.txt, the export still completes.
  const photo = await WalkaroundPhoto.create({
    organizationId: org.id,
    machineId: machine.id,
    walkaroundId: walkaround.id,
    objectKey: `org/${org.id}/walkarounds/${machine.id}/${randomUUID()}`,
    uploadedBy: manager.id,
  });
  await Defect.create({
    organizationId: org.id,
    machineId: machine.id,
    title: 'Cracked mirror',
    severity: 'minor',
    walkaroundId: walkaround.id,
    reportedBy: manager.id,
  });
  return { org, manager, machine, record, invoice, photo };
}

async function download(org: Organization, manager: Awaited<ReturnType<typeof signedInAgent>>) {
  const res = await manager.get(exportUrl(org.id)).buffer(true).parse(binary);
  return { res, files: res.status === 200 ? unzipSync(new Uint8Array(res.body)) : {} };
}

describe('farm data export — GET /organizations/:orgId/export', () => {
  let farm: Awaited<ReturnType<typeof farmWithRecords>>;
  let other: Awaited<ReturnType<typeof farmWithRecords>>;
  beforeEach(async () => {
    await resetDatabase();
    farm = await farmWithRecords('Larkspur Farm', 'L-01');
    other = await farmWithRecords('Other Farm', 'O-99');
  });

  it('export — 401 without sign-in; 404 for another farm’s manager; 403 for technician and operator, nothing audited', async () => {
    expect((await request(app).get(exportUrl(farm.org.id))).status).toBe(401);
    const stranger = await signedInAgent(app, other.manager);
    const foreign = await stranger.get(exportUrl(farm.org.id));
    expect(foreign.status).toBe(404);
    expect(foreign.body.error.code).toBe('not_found');
    for (const role of ['technician', 'operator'] as const) {
      const { user } = await createMember(farm.org, role);
      const res = await (await signedInAgent(app, user)).get(exportUrl(farm.org.id));
      expect(res.status).toBe(403);
      expect(res.body.error.message).toMatch(/manager/);
    }
    expect(await countRows('audit_events')).toBe(0);
  });

  it('export — a dealer’s advisor, even with a service link, gets 404', async () => {
    const dealer = await createOrganization({ name: 'Test Dealer', kind: 'dealer' });
    const { user: advisor } = await createMember(dealer, 'advisor');
    await linkDealer(dealer, farm.org, 'service');
    const res = await (await signedInAgent(app, advisor)).get(exportUrl(farm.org.id));
    expect(res.status).toBe(404);
  });

  it('export — manager gets one zip: every CSV with its rows, the files, README of the columns; no row of another farm', async () => {
    const { res, files } = await download(farm.org, await signedInAgent(app, farm.manager));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/zip');
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="hourstone-larkspur-farm-\d{4}-\d{2}-\d{2}\.zip"$/,
    );

    for (const table of EXPORT_TABLES) expect(Object.keys(files)).toContain(table.file);
    const counts = Object.fromEntries(
      EXPORT_TABLES.map((t) => [t.file, csvRows(files, t.file).length]),
    );
    expect(counts).toMatchObject({
      'members.csv': 1,
      'machines.csv': 1,
      'readings.csv': 3,
      'tasks.csv': 1,
      'service-records.csv': 1,
      'service-parts.csv': 1,
      'service-measurements.csv': 1,
      'service-attachments.csv': 1,
      'walkarounds.csv': 1,
      'walkaround-photos.csv': 1,
      'defects.csv': 1,
      'spec-sheets.csv': 1,
    });

    // Nothing of the other farm anywhere in the archive.
    const everything = Object.values(files)
      .map((bytes) => strFromU8(bytes))
      .join('\n');
    for (const foreign of [other.org.id, other.machine.id, other.record.id, 'O-99', 'Other Farm'])
      expect(everything).not.toContain(foreign);

    const [reading] = csvRows(files, 'readings.csv');
    expect(reading).toMatchObject({
      machine_id: farm.machine.id,
      fleet_number: 'L-01',
      value: '100.00', // numeric(…, 2) as stored
    });
    expect(reading.taken_at).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/);
    const [part] = csvRows(files, 'service-parts.csv');
    expect(part).toMatchObject({
      part_number: 'OF-1',
      quantity: '1',
      unit_cost_minor: '1250',
      line: '1',
    });
    const [measurement] = csvRows(files, 'service-measurements.csv');
    expect(measurement).toMatchObject({
      name: 'Front wheel toe-in',
      value: '-1.5000',
      spec_min: '-3.0000',
    });
    const [record] = csvRows(files, 'service-records.csv');
    expect(JSON.parse(record.parts)[0].partNumber).toBe('OF-1');
    expect(record.notes).toBe("'=SUM(A1:A9) is how the invoice adds up"); // not run as a formula
    const [attachment] = csvRows(files, 'service-attachments.csv');
    expect(Buffer.from(files[attachment.archive_path]).equals(farm.invoice)).toBe(true);
    const [photo] = csvRows(files, 'walkaround-photos.csv');
    expect(strFromU8(files['missing-files.txt'])).toBe(`${photo.archive_path}\n`);

    const readme = strFromU8(files['README.txt']);
    for (const table of EXPORT_TABLES)
      for (const [column] of table.columns) expect(readme).toContain(`  ${column}: `);
    const about = JSON.parse(strFromU8(files['organization.json']));
    expect(about).toMatchObject({
      id: farm.org.id,
      name: 'Larkspur Farm',
      timeZone: 'America/Chicago',
    });
    expect(await countRows('audit_events')).toBe(1);
  });

  it('export — readings past one page are each written once, oldest first', async () => {
    const total = EXPORT_PAGE_ROWS * 2 + 1;
    const start = Date.parse('2020-01-01T00:00:00Z');
    await MeterReading.bulkCreate(
      Array.from({ length: total }, (_, i) => ({
        organizationId: other.org.id,
        machineId: other.machine.id,
        value: 1000 + i,
        lifetimeValue: 1000 + i,
        takenAt: new Date(start + i * 3_600_000),
        source: 'import' as const,
        enteredBy: null,
        importKey: null,
      })),
    );
    const { files } = await download(other.org, await signedInAgent(app, other.manager));
    const readings = csvRows(files, 'readings.csv');
    expect(readings).toHaveLength(total + 3);
    expect(new Set(readings.map((r) => r.id)).size).toBe(total + 3);
    const values = readings.slice(0, total).map((r) => Number(r.value));
    expect(values).toEqual(Array.from({ length: total }, (_, i) => 1000 + i));
  });
});
