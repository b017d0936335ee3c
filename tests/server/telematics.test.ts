// Readings from the machine (issue 13): an ISO/TS 15143-3 snapshot and a SAE J1939 candump log
// posted with an API key. Field names of the snapshot as ../shared/CHECKS.md §4 gives them (from
// public samples; the standard's text was not read); J1939 check value from CHECKS.md §4 (SAE
// J1939-71, SPN 247): bytes 72 60 00 00 are 1,234.5 h.
import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { MachineMeter, MeterReading } from '../../server/models';
import { countRows, resetDatabase } from '../support/db';
import { addReadings, createMachine } from '../support/factories';
import { H, SNAPSHOT, ago, app, entry, farm, send } from './telematics-fixture';

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
