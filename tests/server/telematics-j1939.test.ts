// Readings from the machine (issue 13), beside telematics.test.ts: a machine's telematics id, and a
// SAE J1939 candump log posted with an API key. Check value from ../shared/CHECKS.md §4 (SAE
// J1939-71, SPN 247 in PGN 65253): bytes 72 60 00 00 are 1,234.5 h.
import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { MeterReading } from '../../server/models';
import { countRows, resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';
import { H, app, farm } from './telematics-fixture';

describe('telematics id of a machine', () => {
  beforeEach(resetDatabase);

  it('set and cleared through the API; unique per farm (422 naming telematicsId), free on another farm', async () => {
    const { org, agent, bySerial, byFeedId } = await farm();
    const url = (id: string) => `/api/v1/organizations/${org.id}/machines/${id}`;
    const set = await agent.patch(url(bySerial.id)).send({ telematicsId: 'feed-t02' });
    expect(set.status).toBe(200);
    expect(set.body.data.telematicsId).toBe('feed-t02');
    const taken = await agent.patch(url(bySerial.id)).send({ telematicsId: 'feed-c01' });
    expect(taken.status).toBe(422);
    expect(taken.body.error.fields.telematicsId).toMatch(/C-01/);
    expect((await byFeedId.reload()).telematicsId).toBe('feed-c01');
    const cleared = await agent.patch(url(bySerial.id)).send({ telematicsId: '' });
    expect(cleared.body.data.telematicsId).toBeNull();
    const other = await createOrganization();
    const { user } = await createMember(other, 'manager');
    const theirs = await signedInAgent(app, user);
    const made = await theirs
      .post(`/api/v1/organizations/${other.id}/machines`)
      .send({ fleetNumber: 'X-1', name: 'Theirs', category: 'tractor', telematicsId: 'feed-c01' });
    expect(made.status).toBe(201);
    expect(made.body.data.telematicsId).toBe('feed-c01');
  });
});

describe('SAE J1939 candump log', () => {
  beforeEach(resetDatabase);

  const postLog = (key: string, ref: string, text: string) =>
    request(app)
      .post(`/api/v1/telematics/machines/${encodeURIComponent(ref)}/j1939`)
      .set('Authorization', `Bearer ${key}`)
      .set('Content-Type', 'text/plain')
      .send(text);

  it('PGN 65253 frames — bytes 72 60 00 00 recorded as 1,234.5 h (CHECKS.md); last frame of each hour kept; other PGNs counted; error values refused by line', async () => {
    const { key, byFeedId } = await farm();
    const hour = Math.floor((Date.now() - 5 * H) / H) * H; // the start of a clock hour 5 h ago
    const t = (ms: number) => ((hour + ms) / 1000).toFixed(6);
    const log = [
      `(${t(60_000)}) can0 18FEE500#7060000000000000`, // 24,688 × 0.05 = 1,234.4 h, same hour
      `(${t(120_000)}) can0 18FEEE00#0102030405060708`, // engine temperature: skipped
      `(${t(1_800_000)}) can0 18FEE500#7260000000000000`, // 1,234.5 h: the hour's last frame
      '',
      `(${t(H + 60_000)})  can0  18FEE500   [8]  FF FF FF FF FF FF FF FF`, // not available
      `(${t(2 * H + 60_000)}) can0 0CFEE517#8660000000000000`, // 24,710 × 0.05 = 1,235.5 h
    ].join('\n');
    const res = await postLog(key, 'feed-c01', log);
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({
      machineId: byFeedId.id,
      lines: 5,
      engineHourFrames: 4,
      otherFrames: 1,
      kept: 2,
      recorded: 2,
      alreadyThere: 0,
    });
    expect(res.body.data.refused).toEqual([
      { line: 5, reason: expect.stringMatching(/not available/) },
    ]);
    const stored = await MeterReading.findAll({
      where: { machineId: byFeedId.id },
      order: [['takenAt', 'ASC']],
    });
    expect(stored.map((r) => r.value)).toEqual([1234.5, 1235.5]);
    expect(stored[0].takenAt.getTime()).toBe(hour + 1_800_000);
    expect(stored.every((r) => r.source === 'telematics')).toBe(true);
    // the same log again adds nothing
    const again = await postLog(key, byFeedId.id, log);
    expect(again.body.data).toMatchObject({ recorded: 0, alreadyThere: 2 });
    expect(await countRows('meter_readings')).toBe(2);
  });

  it('a line in neither candump form — 400 naming the line; nothing written', async () => {
    const { key } = await farm();
    const res = await postLog(
      key,
      'feed-c01',
      '(1764662400.0) can0 18FEE500#7260000000000000\nhello there',
    );
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty(['line 2']);
    expect(await countRows('meter_readings')).toBe(0);
  });

  it('a JSON body — 400 asking for text; an unknown machine — 404', async () => {
    const { key } = await farm();
    const json = await request(app)
      .post('/api/v1/telematics/machines/feed-c01/j1939')
      .set('Authorization', `Bearer ${key}`)
      .send({ log: 'x' });
    expect(json.status).toBe(400);
    expect(json.body.error.message).toMatch(/text\/plain/);
    expect(
      (await postLog(key, 'no-such-feed', '(1764662400.0) can0 18FEE500#7260000000000000')).status,
    ).toBe(404);
  });
});
