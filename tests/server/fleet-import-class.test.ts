// The fleet import's "machine class" column: a class name of the service library gives the
// machine that class and the class's tasks (as POST …/apply-class does), on a farm with no
// schedule templates at all — a new farm's first step.
import { beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';
import { Machine, ServiceTask } from '../../server/models';
import { addDaysIso, todayIso } from '../../shared/domain';
import { serviceLibraryClass } from '../../shared/domain/service-library';

const app = createApp();

async function newFarm() {
  const org = await createOrganization({ timeZone: 'America/Chicago', units: 'imperial' });
  const { user } = await createMember(org, 'manager');
  const agent = await signedInAgent(app, user);
  const base = `/api/v1/organizations/${org.id}/fleet-import`;
  const send = (step: 'preview' | 'commit', csv: string) =>
    agent.post(`${base}/${step}`).attach('file', Buffer.from(csv), 'fleet.csv');
  const day = (n: number) => addDaysIso(todayIso(org.timeZone), -n);
  return {
    org,
    agent,
    base,
    day,
    preview: (c: string) => send('preview', c),
    commit: (c: string) => send('commit', c),
  };
}

describe('fleet import — machine class', () => {
  beforeEach(resetDatabase);

  it('fleet import — a used mixer wagon with class "Mixer wagon" and one last service: the class and its tasks, the rest history unknown; again unchanged', async () => {
    const f = await newFarm();
    const csv = [
      'fleet number,name,category,meter reading,reading date,machine class,Auger knives and flighting last done,Auger knives and flighting last meter',
      `MX-01,Feed mixer,implement,1200,${f.day(2)},Mixer wagon,${f.day(20)},1150`,
    ].join('\n');
    const res = await f.commit(csv);
    expect(res.status).toBe(201);
    const expected = serviceLibraryClass('mixer_wagon').tasks;
    expect(res.body.data).toMatchObject({ created: 1, historyUnknown: expected.length - 1 });
    const machine = await Machine.findOne({ where: { fleetNumber: 'MX-01' } });
    expect(machine!.machineClass).toBe('mixer_wagon');
    expect(machine!.category).toBe('implement');
    const tasks = await ServiceTask.findAll({ where: { machineId: machine!.id } });
    expect(tasks).toHaveLength(expected.length);
    expect(tasks.find((t) => t.name === 'Auger knives and flighting')!.lastDoneMeter).toBe(1150);
    const again = await f.preview(csv);
    expect(again.body.data.rows[0]).toMatchObject({ outcome: 'unchanged', changes: [] });
  });

  it('fleet import — an unknown class, or a km class on an hour meter, is an error by line naming the machine class', async () => {
    const f = await newFarm();
    const res = await f.preview(
      [
        'fleet number,name,category,class',
        'A-1,Rake,implement,Harvester',
        'A-2,Truck,truck,Grain truck',
      ].join('\n'),
    );
    const [unknown, km] = res.body.data.rows;
    expect(unknown.errors[0]).toMatch(
      /^Line 2, machine class: "Harvester" is not a machine class; use one of 2WD\/MFWD row-crop tractor/,
    );
    expect(km.errors[0]).toMatch(/^Line 3, machine class: .*counts in km.*counts in hours/);
    expect(await ServiceTask.count()).toBe(0);
  });
  it('fleet import — a new farm’s example file gives its machines classes of the library, and one task’s last service, and imports them', async () => {
    const f = await newFarm();
    const example = await f.agent.get(`${f.base}/example`);
    expect(example.status).toBe(200);
    const [header, first, , , baler] = example.text.replace('\uFEFF', '').split('\r\n');
    expect(header.split(',').slice(10, 13)).toEqual([
      'machine class',
      'Engine oil and filter last done',
      'Engine oil and filter last meter',
    ]);
    expect(first.split(',')[10]).toBe('4WD articulated tractor');
    expect(baler.split(',')[10]).toBe('Round baler'); // it counts bales: the class's bales variant
    const res = await f.commit(example.text);
    expect(res.status).toBe(201);
    const classes = await Machine.findAll({
      attributes: ['fleetNumber', 'machineClass'],
      order: [['fleetNumber', 'ASC']],
    });
    expect(classes.map((m) => [m.fleetNumber, m.machineClass])).toEqual([
      ['B-03', 'round_baler'],
      ['L-02', 'utility_loader_tractor'],
      ['T-11', 'articulated_tractor'],
      ['TR-04', 'grain_truck'],
    ]);
  });
});
