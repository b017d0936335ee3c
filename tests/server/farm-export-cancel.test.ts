import { randomBytes, randomUUID } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { sequelize } from '../../server/db';
import { resetDatabase } from '../support/db';
import {
  TEST_PASSWORD,
  createMachine,
  createMember,
  createOrganization,
} from '../support/factories';
import { ServiceAttachment, ServiceRecord } from '../../server/models';
import { putObject } from '../../server/infra/storage';

const app = createApp();

describe('farm export — a download cancelled half-way', () => {
  let server: http.Server;
  beforeAll(async () => {
    server = app.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
  });
  afterAll(() => new Promise((resolve) => server.close(resolve)));

  it('export — the client goes away after the first bytes — the transaction ends and its connection returns to the pool', async () => {
    await resetDatabase();
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const machine = await createMachine(org);
    const record = await ServiceRecord.create({
      organizationId: org.id,
      machineId: machine.id,
      status: 'planned',
      plannedFor: '2026-03-02',
      performedOn: null,
      meterValue: null,
      meterLifetime: null,
      readingId: null,
      labourHours: null,
      createdBy: null,
      completedBy: null,
      completedAt: null,
    });
    for (let i = 0; i < 4; i++) {
      const key = `org/${org.id}/service-records/${record.id}/${randomUUID()}`;
      const bytes = randomBytes(4 * 1024 * 1024); // incompressible: the archive outgrows socket buffers
      await putObject(`${key}.pdf`, bytes, 'application/pdf');
      await ServiceAttachment.create({
        organizationId: org.id,
        machineId: machine.id,
        serviceRecordId: record.id,
        kind: 'pdf',
        contentType: 'application/pdf',
        fileName: `big-${i}.pdf`,
        sizeBytes: bytes.length,
        objectKey: key,
        uploadedBy: null,
      });
    }
    const { port } = server.address() as AddressInfo;
    const signedIn = await fetch(`http://127.0.0.1:${port}/api/v1/auth/sign-in`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: user.email, password: TEST_PASSWORD }),
    });
    expect(signedIn.status).toBe(200);
    const cookie = signedIn.headers
      .getSetCookie()
      .map((c) => c.split(';')[0])
      .join('; ');
    const pool = (sequelize.connectionManager as unknown as { pool: { using: number } }).pool;
    await new Promise<void>((resolve, reject) => {
      const req = http.get(
        {
          host: '127.0.0.1',
          port,
          path: `/api/v1/organizations/${org.id}/export`,
          headers: { cookie: String(cookie) },
        },
        (res) => {
          expect(res.statusCode).toBe(200);
          res.once('data', () => {
            res.destroy();
            req.destroy();
            resolve();
          });
        },
      );
      req.on('error', () => undefined);
      setTimeout(() => reject(new Error('no bytes')), 10_000).unref();
    });
    const deadline = Date.now() + 10_000;
    while (pool.using > 0 && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
    expect(pool.using).toBe(0);
  });
});
