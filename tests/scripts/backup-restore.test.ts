import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GetObjectCommand } from '@aws-sdk/client-s3';
import { resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
} from '../support/factories';
import { putObject } from '../../server/infra/storage';
import { makeBackup } from '../../scripts/backup';
import { RestoreRefused, restoreBackup } from '../../scripts/restore';
import { fingerprint, s3Client, storeFromEnv } from '../../scripts/backup-common';
import { startPostgres } from '../../scripts/lib/postgres.mjs';

const sourceUrl = process.env.DATABASE_URL!;
const slot = Number(process.env.HOURSTONE_TEST_SLOT ?? 0);
// A scratch database of the test cluster needs the cluster's superuser: only for the cluster
// npm test starts itself, not for a TEST_DATABASE_URL given from outside.
const ownCluster = !process.env.TEST_DATABASE_URL;
const SCRATCH = 'hourstone_restore_check';
const scratchUrl = (() => {
  const url = new URL(sourceUrl);
  url.pathname = `/${SCRATCH}`;
  return url.toString();
})();

describe.skipIf(!ownCluster)('backup and restore — npm run backup / npm run restore FOLDER', () => {
  let parent: string;
  let recreateScratch: () => void;
  const store = storeFromEnv();
  const photo = Buffer.from('webp bytes of a tractor photo');

  beforeAll(async () => {
    parent = await mkdtemp(path.join(os.tmpdir(), 'hourstone-backup-'));
    const cluster = await startPostgres({
      name: slot ? `test-${slot}` : 'test',
      port: new URL(sourceUrl).port,
    });
    recreateScratch = () => cluster.recreateDatabase(SCRATCH);
    await resetDatabase();
    const org = await createOrganization({ name: 'Larkspur Farm' });
    await createMember(org, 'manager');
    const machine = await createMachine(org, { fleetNumber: 'L-01' });
    await addReadings(machine, [
      { daysAgo: 30, value: 1000.25 },
      { daysAgo: 10, value: 1100.5 },
      { daysAgo: 1, value: 1190.75 },
    ]);
    await createTask(machine, { name: 'Engine oil', intervalMeter: 250, lastDoneMeter: 1000 });
    await putObject(`org/${org.id}/machines/${machine.id}/photo.webp`, photo, 'image/webp');
  });
  afterAll(async () => {
    await rm(parent, { recursive: true, force: true });
  });

  it('round trip — every table’s row count and the readings’ checksum match; the files come back', async () => {
    const { dir, manifest } = await makeBackup({ databaseUrl: sourceUrl, store, parent });
    expect(path.basename(dir)).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}-\d{2}-\d{2}Z$/);
    const source = await fingerprint(sourceUrl);
    expect(manifest.database.tables).toEqual(source.tables);
    expect(manifest.database.tables.meter_readings).toBe(3);
    expect(manifest.database.readingsMd5).toMatch(/^[0-9a-f]{32}$/);

    recreateScratch();
    const bucket = `restore-check-${Date.now()}`;
    const { restored } = await restoreBackup({
      dir,
      databaseUrl: scratchUrl,
      store: { ...store, bucket },
    });
    expect(restored).toEqual(source);
    expect(await fingerprint(scratchUrl)).toEqual(source);

    const s3 = s3Client(store);
    const key = manifest.objects.find((o) => o.key.endsWith('/photo.webp'))!.key;
    const got = await s3.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
    expect(Buffer.from(await got.Body!.transformToByteArray()).equals(photo)).toBe(true);
    expect(got.ContentType).toBe('image/webp');
    s3.destroy();
  });

  it('restore — a database with tables, or a store with files, is refused and nothing is written', async () => {
    const { dir } = await makeBackup({ databaseUrl: sourceUrl, store, parent, now: new Date(0) });

    // Into the source itself: it holds the tables already.
    const before = await fingerprint(sourceUrl);
    await expect(
      restoreBackup({ dir, databaseUrl: sourceUrl, store: { ...store, bucket: 'never-made' } }),
    ).rejects.toThrow(/database hourstone_test .* is not empty .* Nothing was written/);
    expect(await fingerprint(sourceUrl)).toEqual(before);

    // An empty database but the store still holding files.
    recreateScratch();
    const refused = restoreBackup({ dir, databaseUrl: scratchUrl, store });
    await expect(refused).rejects.toBeInstanceOf(RestoreRefused);
    await expect(refused).rejects.toThrow(/bucket hourstone .* is not empty/);
    expect((await fingerprint(scratchUrl)).tables).toEqual({});
  });
});
