// Readings from the machine (issue 13): an ISO/TS 15143-3 snapshot and a SAE J1939 candump log
// posted with an API key. Field names of the snapshot as ../shared/CHECKS.md §4 gives them (from
// public samples; the standard's text was not read); J1939 check value from CHECKS.md §4 (SAE
// J1939-71, SPN 247): bytes 72 60 00 00 are 1,234.5 h.
import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { MachineMeter, MeterReading } from '../../server/models';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';

const app = createApp();
const SNAPSHOT = '/api/v1/telematics/iso15143-3';
const H = 3_600_000;
const ago = (ms: number) => new Date(Date.now() - ms).toISOString();

async function farm() {
  const org = await createOrganization({ timeZone: 'America/Chicago' });
  const { user } = await createMember(org, 'manager');
  const agent = await signedInAgent(app, user);
  const bySerial = await createMachine(org, { fleetNumber: 'T-02' });
  await bySerial.update({ serialNumber: 'TMS-RC210-19-4417' });
  const byPin = await createMachine(org, { fleetNumber: 'S-01' });
  await byPin.update({ serialNumber: 'TMS-SP-20-0001' });
  const byFeedId = await createMachine(org, { fleetNumber: 'C-01' });
  await byFeedId.update({ serialNumber: 'HRL-C-17-0003', telematicsId: 'feed-c01' });
  const made = await agent
    .post(`/api/v1/organizations/${org.id}/api-keys`)
    .send({ name: 'Yard feed' });
  return { org, agent, bySerial, byPin, byFeedId, key: made.body.data.secret as string };
}

const entry = (header: Record<string, string>, hour?: number, at = ago(H)) => ({
  EquipmentHeader: { OEMName: 'Tamsin', Model: 'RC 210', ...header },
  ...(hour !== undefined && { CumulativeOperatingHours: { datetime: at, Hour: hour } }),
  Location: { Latitude: 41.5, Longitude: -93.6 },
});
const send = (key: string, equipment: object[]) =>
  request(app)
    .post(SNAPSHOT)
    .set('Authorization', `Bearer ${key}`)
    .send({ Fleet: { version: '1', snapshotTime: ago(0), Links: [], Equipment: equipment } });

describe('ISO/TS 15143-3 snapshot', () => {
  beforeEach(resetDatabase);

  it('matches by serial number, PIN and telematics id; unknown equipment is reported, never created', async () => {
    const { key, org, agent, bySerial, byPin, byFeedId } = await farm();
    const machinesBefore = await countRows('machines');
    const res = await send(key, [
      entry({ SerialNumber: 'tms-rc210-19-4417' }, 3120.5),
      entry({ PIN: 'TMS-SP-20-0001', SerialNumber: 'not-ours' }, 1450.25),
      entry({ EquipmentID: 'feed-c01', SerialNumber: 'whatever' }, 2600),
      entry({ SerialNumber: 'NOBODY-1', EquipmentID: 'nobody' }, 10),
      entry({ SerialNumber: 'TMS-RC210-19-4417' }),
    ]);
    expect(res.status).toBe(200);
    const items = res.body.data.items;
    expect(items.map((i: { status: string }) => i.status)).toEqual([
      'recorded',
      'recorded',
      'recorded',
      'unknown_equipment',
      'no_hours',
    ]);
    expect(items[0]).toMatchObject({ machineId: bySerial.id, fleetNumber: 'T-02' });
    expect(items[1]).toMatchObject({ machineId: byPin.id, fleetNumber: 'S-01' });
    expect(items[2]).toMatchObject({ machineId: byFeedId.id, fleetNumber: 'C-01' });
    expect(items[3].reason).toMatch(/No machine of this farm/);
    expect(res.body.data.counts).toEqual({
      recorded: 3,
      alreadyThere: 0,
      refused: 0,
      unknownEquipment: 1,
      noHours: 1,
    });
    expect(await countRows('machines')).toBe(machinesBefore);
    const stored = await MeterReading.findOne({ where: { machineId: byPin.id } });
    expect(stored).toMatchObject({ value: 1450.25, source: 'telematics' });
    expect(stored!.importKey).toMatch(/^api-key:[a-z0-9]{8}:Yard feed$/);
    // the machine's history says where each reading came from: the key's name
    const history = await agent.get(
      `/api/v1/organizations/${org.id}/machines/${byPin.id}/readings`,
    );
    expect(history.body.data).toEqual([
      expect.objectContaining({ value: 1450.25, source: 'telematics', sourceName: 'Yard feed' }),
    ]);
  });

  it('a resend adds nothing — every item already there', async () => {
    const { key } = await farm();
    const at = ago(2 * H);
    const body = [entry({ SerialNumber: 'TMS-RC210-19-4417' }, 3120.5, at)];
    expect((await send(key, body)).body.data.counts.recorded).toBe(1);
    const again = await send(key, body);
    expect(again.status).toBe(200);
    expect(again.body.data.items[0].status).toBe('already_there');
    expect(await countRows('meter_readings')).toBe(1);
  });

  it("a reading the rules refuse — that item refused with the rule's reason; the others recorded", async () => {
    const { key, bySerial } = await farm();
    await addReadings(bySerial, [{ daysAgo: 1, value: 3200 }]);
    const res = await send(key, [
      entry({ SerialNumber: 'TMS-RC210-19-4417' }, 3100),
      entry({ EquipmentID: 'feed-c01' }, 2600),
    ]);
    expect(res.status).toBe(200);
    expect(res.body.data.items[0].status).toBe('refused');
    expect(res.body.data.items[0].reason).toMatch(/3,?200/);
    expect(res.body.data.items[1].status).toBe('recorded');
    expect(await MeterReading.count({ where: { machineId: bySerial.id } })).toBe(1);
  });

  it('a sold machine and one counting km — refused, saying why', async () => {
    const { key, org } = await farm();
    const sold = await createMachine(org, { fleetNumber: 'T-09', status: 'sold' });
    await sold.update({ serialNumber: 'SOLD-1' });
    const truck = await createMachine(org, { fleetNumber: 'TR-01', meterUnit: 'km' });
    await truck.update({ serialNumber: 'TRUCK-1' });
    const res = await send(key, [
      entry({ SerialNumber: 'SOLD-1' }, 10),
      entry({ SerialNumber: 'TRUCK-1' }, 10),
    ]);
    expect(res.body.data.items[0]).toMatchObject({ status: 'refused' });
    expect(res.body.data.items[0].reason).toMatch(/sold/);
    expect(res.body.data.items[1].reason).toMatch(/counts km/);
    expect(await countRows('meter_readings')).toBe(0);
  });

  it("hours go on the machine's engine-hours meter when it has one, else on its primary", async () => {
    const { key, org, bySerial } = await farm();
    // a truck counting km on its primary meter, with an engine-hours meter beside it
    const truck = await createMachine(org, { fleetNumber: 'TR-02', meterUnit: 'km' });
    await truck.update({ serialNumber: 'TRUCK-2' });
    const engine = await MachineMeter.create({
      organizationId: org.id,
      machineId: truck.id,
      kind: 'engine_hours',
      unit: 'h',
      position: 1,
    });
    const res = await send(key, [
      entry({ SerialNumber: 'TRUCK-2' }, 5210.5),
      entry({ SerialNumber: 'TMS-RC210-19-4417' }, 3120.5),
    ]);
    expect(res.body.data.counts.recorded).toBe(2);
    const onTruck = await MeterReading.findOne({ where: { machineId: truck.id } });
    expect(onTruck).toMatchObject({ meterId: engine.id, value: 5210.5 });
    const primary = await MachineMeter.findOne({
      where: { machineId: bySerial.id, isPrimary: true },
    });
    const onTractor = await MeterReading.findOne({ where: { machineId: bySerial.id } });
    expect(onTractor!.meterId).toBe(primary!.id);
  });

  it('a serial number on two machines — names neither, asks for a telematics id', async () => {
    const { key, org } = await farm();
    for (const fleetNumber of ['L-01', 'L-02']) {
      const m = await createMachine(org, { fleetNumber });
      await m.update({ serialNumber: 'TWIN-1' });
    }
    const res = await send(key, [entry({ SerialNumber: 'TWIN-1' }, 10)]);
    expect(res.body.data.items[0].status).toBe('unknown_equipment');
    expect(res.body.data.items[0].reason).toMatch(/L-01.*L-02.*telematics id/);
  });

  it.each([
    [{ Fleet: {} }, 'Fleet.Equipment'],
    [{ Fleet: { Equipment: [] } }, 'Fleet.Equipment'],
    [
      { Fleet: { Equipment: [{ EquipmentHeader: { OEMName: 'x' } }] } },
      'Fleet.Equipment.0.EquipmentHeader',
    ],
    [
      { Fleet: { Equipment: [entry({ SerialNumber: 'a' }, -1)] } },
      'Fleet.Equipment.0.CumulativeOperatingHours.Hour',
    ],
    [
      {
        Fleet: {
          Equipment: [
            {
              ...entry({ SerialNumber: 'a' }),
              CumulativeOperatingHours: { datetime: 'yesterday', Hour: 1 },
            },
          ],
        },
      },
      'Fleet.Equipment.0.CumulativeOperatingHours.datetime',
    ],
    [
      {
        Fleet: {
          Equipment: [
            {
              ...entry({ SerialNumber: 'a' }),
              CumulativeOperatingHours: { datetime: ago(0), Hour: '12.5' },
            },
          ],
        },
      },
      'Fleet.Equipment.0.CumulativeOperatingHours.Hour',
    ],
  ])('bad snapshot %j — 400 naming %s; nothing written', async (body, path) => {
    const { key } = await farm();
    const res = await request(app).post(SNAPSHOT).set('Authorization', `Bearer ${key}`).send(body);
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain(path);
    expect(await countRows('meter_readings')).toBe(0);
  });
});

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
