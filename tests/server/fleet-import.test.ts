import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';
import { Machine, MeterReading, ScheduleTemplate, ServiceTask } from '../../server/models';
import { addDaysIso, todayIso } from '../../shared/domain';

const app = createApp();

async function farm(
  units: 'imperial' | 'metric' = 'imperial',
  role: 'manager' | 'technician' = 'manager',
) {
  const org = await createOrganization({
    timeZone: units === 'imperial' ? 'America/Chicago' : 'Europe/Dublin',
    units,
  });
  const { user } = await createMember(org, role);
  const agent = await signedInAgent(app, user);
  const base = `/api/v1/organizations/${org.id}/fleet-import`;
  const send = (step: 'preview' | 'commit', csv: string | Buffer) =>
    agent.post(`${base}/${step}`).attach('file', Buffer.from(csv), 'fleet.csv');
  return {
    org,
    agent,
    base,
    preview: (csv: string | Buffer) => send('preview', csv),
    commit: (csv: string | Buffer) => send('commit', csv),
  };
}

const daysAgo = (org: { timeZone: string }, n: number) => addDaysIso(todayIso(org.timeZone), -n);
type Row = {
  line: number;
  fleetNumber: string;
  name: string | null;
  outcome: string;
  errors: string[];
  changes: string[];
};

describe('fleet import', () => {
  beforeEach(resetDatabase);

  it('fleet import — 401 without sign-in, 403 for a technician, 404 for another farm; nothing written', async () => {
    const csv = 'fleet number,name,category\nT-01,Tractor,tractor\n';
    const f = await farm('imperial', 'technician');
    const anon = await request(app)
      .post(`${f.base}/preview`)
      .attach('file', Buffer.from(csv), 'fleet.csv');
    expect(anon.status).toBe(401);
    const refused = await f.commit(csv);
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/Only a manager/);
    expect((await f.agent.get(`${f.base}/example`)).status).toBe(403);
    const other = await farm();
    const across = await other.agent
      .post(`${f.base}/commit`)
      .attach('file', Buffer.from(csv), 'fleet.csv');
    expect(across.status).toBe(404);
    expect(await countRows('machines')).toBe(0);
  });

  it('fleet import — preview gives every row its outcome and each bad line its errors by line number; writes nothing', async () => {
    const f = await farm();
    const existing = await createMachine(f.org, { fleetNumber: 'T-02', name: 'Old name' });
    const csv = [
      'Fleet number,Name,Category,Year,Meter reading,Reading date,Colour',
      `T-01,Brindle 4WD,Tractor,2015,4210.5,${daysAgo(f.org, 3)},red`,
      `T-02,New name,tractor,,,,blue`,
      `T-03,Mystery,harvester,20x5,lots,${daysAgo(f.org, 3)},`,
      `T-04,,tractor,,,,`,
      `t-01,Twice,tractor,,,,`,
      `T-02,,,,,,`,
    ].join('\n');
    const res = await f.preview(csv);
    expect(res.status).toBe(200);
    const rows = res.body.data.rows as Row[];
    expect(rows.map((r) => [r.line, r.fleetNumber, r.outcome])).toEqual([
      [2, 'T-01', 'create'],
      [3, 'T-02', 'update'],
      [4, 'T-03', 'error'],
      [5, 'T-04', 'error'],
      [6, 't-01', 'error'],
      [7, 'T-02', 'error'],
    ]);
    expect(rows[0].changes).toEqual(['new machine', expect.stringMatching(/^reading 4210.5 on/)]);
    expect(rows[1].changes).toEqual(['name']);
    expect(rows[2].name).toBe('Mystery');
    expect(rows[2].errors).toEqual([
      'Line 4, category: "harvester" is not a category; use one of tractor, combine, sprayer, baler, loader, mower, truck, implement, other',
      'Line 4, year: "20x5" must be a year like 2016',
      'Line 4, meter reading: "lots" must be a number like 1234.5',
    ]);
    expect(rows[3].errors).toEqual(['Line 5, name: name is empty; a new machine needs a name']);
    expect(rows[4].errors[0]).toMatch(/Line 6: fleet number t-01 is already on line 2/);
    expect(rows[5].errors[0]).toMatch(/already on line 3/);
    expect(res.body.data.summary).toEqual({
      total: 6,
      create: 1,
      update: 1,
      unchanged: 0,
      errors: 4,
    });
    expect(res.body.data.columns.ignored).toEqual(['Colour']);
    expect(await countRows('machines')).toBe(1);
    expect((await existing.reload()).name).toBe('Old name');
  });

  it('fleet import — a commit with one bad line is refused (422 naming the line) and nothing is written', async () => {
    const f = await farm();
    const res = await f.commit(
      `fleet number,name,category\nT-01,Good,tractor\nT-02,Bad,spaceship\n`,
    );
    expect(res.status).toBe(422);
    expect(res.body.error.message).toBe('1 row cannot be imported; nothing was written');
    expect(res.body.error.fields['line 3']).toMatch(/"spaceship" is not a category/);
    expect(await countRows('machines')).toBe(0);
    expect(await countRows('audit_events')).toBe(0);
  });

  it('fleet import — commit creates the machines with their readings; importing the same file again adds nothing', async () => {
    const f = await farm();
    const csv = [
      'fleet number,name,category,make,model,serial,year,meter unit,meter reading,reading date',
      `T-01,Brindle 4WD tractor,tractor,Brindle,BX 420,BR4-1,2015,hours,"4,210.5",${daysAgo(f.org, 7)}`,
      `TR-04,Grain truck,truck,Harl,H 300,HL-7,2011,km,212480,${daysAgo(f.org, 7)}`,
    ].join('\n');
    const first = await f.commit(csv);
    expect(first.status).toBe(201);
    expect(first.body.data).toEqual({
      created: 2,
      updated: 0,
      unchanged: 0,
      total: 2,
      historyUnknown: 0,
    });
    const t01 = await Machine.findOne({ where: { organizationId: f.org.id, fleetNumber: 'T-01' } });
    expect(t01).toMatchObject({ make: 'Brindle', model: 'BX 420', year: 2015, meterUnit: 'h' });
    const reading = await MeterReading.findOne({ where: { machineId: t01!.id } });
    expect(reading).toMatchObject({ value: 4210.5, source: 'import' });
    const again = await f.commit(csv);
    expect(again.status).toBe(201);
    expect(again.body.data).toMatchObject({ created: 0, updated: 0, unchanged: 2 });
    expect(await countRows('machines')).toBe(2);
    expect(await countRows('meter_readings')).toBe(2);
  });

  it('fleet import — semicolons with decimal comma, BOM and CRLF, DD/MM/YYYY dates on a metric farm', async () => {
    const f = await farm('metric');
    const [y, m, d] = daysAgo(f.org, 5).split('-');
    const csv =
      '\uFEFFfleet number;name;category;meter reading;reading date\r\n' +
      `M-01;Mower-conditioner;mower;1210,5;${d}/${m}/${y}\r\n`;
    const res = await f.commit(csv);
    expect(res.status).toBe(201);
    const machine = await Machine.findOne({ where: { fleetNumber: 'M-01' } });
    expect(machine!.category).toBe('mower');
    const reading = await MeterReading.findOne({ where: { machineId: machine!.id } });
    expect(reading!.value).toBe(1210.5);
  });

  it('fleet import — an existing fleet number changes only the columns given; blank cells and absent columns leave values as they are', async () => {
    const f = await farm();
    const machine = await createMachine(f.org, { fleetNumber: 'T-01', name: 'Keep me' });
    await machine.update({ make: 'Corvid', model: 'Old', serialNumber: 'S-1', year: 2016 });
    const res = await f.commit('fleet number,model,year,name\nT-01,CL 95,,\n');
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ updated: 1, created: 0 });
    await machine.reload();
    expect(machine).toMatchObject({
      name: 'Keep me',
      make: 'Corvid',
      model: 'CL 95',
      serialNumber: 'S-1',
      year: 2016,
    });
  });

  it('fleet import — a reading that breaks the reading rules is refused by line with the rule, nothing written', async () => {
    const f = await farm();
    const machine = await createMachine(f.org, { fleetNumber: 'T-01' });
    await addReadings(machine, [{ daysAgo: 10, value: 5000 }]);
    const res = await f.commit(
      `fleet number,meter reading,reading date\nT-01,4000,${daysAgo(f.org, 2)}\n`,
    );
    expect(res.status).toBe(422);
    expect(res.body.error.fields['line 2']).toMatch(/Line 2, meter reading: .*5,000/);
    expect(await countRows('meter_readings')).toBe(1);
  });

  it('fleet import — a schedule with one last service given: that task counts from it, the others are history unknown', async () => {
    const f = await farm();
    await ScheduleTemplate.create({
      organizationId: f.org.id,
      category: 'tractor',
      name: 'Tractor basics',
      tasks: ['Engine oil', 'Air filter', 'Coolant'].map((name, i) => ({
        name,
        intervalMeter: [500, 250, 3000][i],
        intervalDays: null,
        firstServiceMeter: null,
        warnMeter: null,
        warnDays: null,
        parts: [],
        fluids: [],
        labourHours: null,
        instructions: '',
        safetyNotes: '',
        hazards: [],
      })),
    });
    const csv = [
      'fleet number,name,category,meter reading,reading date,schedule,Engine oil last done,Engine oil last meter',
      `T-01,Brindle,tractor,4210,${daysAgo(f.org, 3)},tractor basics,${daysAgo(f.org, 60)},3990`,
    ].join('\n');
    const res = await f.commit(csv);
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ created: 1, historyUnknown: 2 });
    const tasks = await ServiceTask.findAll({ order: [['position', 'ASC']] });
    expect(tasks.map((t) => [t.name, t.lastDoneMeter])).toEqual([
      ['Engine oil', 3990],
      ['Air filter', null],
      ['Coolant', null],
    ]);
    const again = await f.preview(csv);
    expect(again.body.data.rows[0]).toMatchObject({ outcome: 'unchanged', changes: [] });
  });

  it('fleet import — a last-service column for a task the machine lacks, or only half of it, is an error by line', async () => {
    const f = await farm();
    await createMachine(f.org, { fleetNumber: 'T-01' });
    const res = await f.preview(
      `fleet number,Engine oil last done,Engine oil last meter,Coolant last done\nT-01,2025-01-01,100,\nT-01b,,,2025-01-01\n`,
    );
    const rows = res.body.data.rows as Row[];
    expect(rows[0].errors).toEqual([
      'Line 2, Engine oil last done: T-01 has no task "Engine oil"; give a schedule that has it',
    ]);
    expect(rows[1].errors).toContain(
      'Line 3, Coolant last done: give both the date (last done) and the meter (last meter) of that service',
    );
    expect(res.body.data.columns.tasks).toEqual(['Engine oil', 'Coolant']);
  });

  it('fleet import — the example file downloads as CSV in the farm format and imports without an error', async () => {
    const f = await farm('metric');
    const example = await f.agent.get(`${f.base}/example`);
    expect(example.status).toBe(200);
    expect(example.headers['content-type']).toMatch(/text\/csv/);
    expect(example.text.startsWith('\uFEFFfleet number;name;category')).toBe(true);
    const res = await f.preview(example.text);
    expect(res.body.data.summary).toMatchObject({ total: 4, create: 4, errors: 0 });
  });

  it('fleet import — a file without a fleet number column is refused on the file field', async () => {
    const f = await farm();
    const res = await f.preview('name,category\nX,tractor\n');
    expect(res.status).toBe(422);
    expect(res.body.error.fields.file).toMatch(/fleet number column/);
  });
});
