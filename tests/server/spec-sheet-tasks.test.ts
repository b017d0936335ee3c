// Task quantities from the machine's spec sheet, through the API: two row-crop tractors of one
// class with two sheets get different oil quantities and filter numbers; the order of sheet and
// class does not matter; lines typed by hand are never touched. Figures invented for the test,
// worked by hand in the comments (links: shared/domain/service-library/sheet-links.ts).
import { beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { resetDatabase } from '../support/db';
import {
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { ServiceTask } from '../../server/models';

const app = createApp();

async function shop() {
  const org = await createOrganization();
  const { user } = await createMember(org, 'manager');
  const agent = await signedInAgent(app, user);
  const machine = async (fleetNumber: string) => {
    const m = await createMachine(org, { fleetNumber });
    const base = `/api/v1/organizations/${org.id}/machines/${m.id}`;
    return {
      machine: m,
      applyClass: () =>
        agent.post(`${base}/apply-class`).send({ machineClass: 'row_crop_tractor' }),
      saveSheet: (body: object) => agent.patch(`${base}/spec-sheet`).send(body),
      task: (name: string) => ServiceTask.findOne({ where: { machineId: m.id, name } }),
    };
  };
  return { org, machine };
}

const metric = {
  capacities: { engineOil: { quantity: 17.5, unit: 'L', spec: 'SAE 15W-40' } },
  filters: { engineOil: 'BR-OF-118', fuelPrimary: 'BR-FP-20', fuelSecondary: 'BR-FS-21' },
};
const usGallons = {
  capacities: { engineOil: { quantity: 4.5, unit: 'gal', spec: '' } },
  filters: { engineOil: 'TM-77' },
};

describe('spec sheet — task quantities', () => {
  beforeEach(resetDatabase);

  it('two tractors of one class, two sheets — each oil change takes its own quantity and filter', async () => {
    const w = await shop();
    const a = await w.machine('SP-11');
    const b = await w.machine('SP-12');
    for (const m of [a, b]) expect((await m.applyClass()).status).toBe(200);
    // A's sheet fills two tasks: engine oil (oil + filter) and the fuel filters (two numbers)
    const savedA = await a.saveSheet(metric);
    expect(savedA.body.tasksUpdated).toBe(2);
    // B's fills one: its engine oil task
    expect((await b.saveSheet(usGallons)).body.tasksUpdated).toBe(1);

    const oilA = (await a.task('Engine oil and filter'))!;
    expect(oilA.fluids).toEqual([
      { kind: 'Engine oil, SAE 15W-40', volume: 17.5, unit: 'L', capacity: 'engineOil' },
    ]);
    expect(oilA.parts.map((p) => [p.partNumber, p.quantity, p.filterRole])).toEqual([
      ['BR-OF-118', 1, 'engineOil'],
    ]);
    const oilB = (await b.task('Engine oil and filter'))!;
    expect(oilB.fluids).toEqual([
      { kind: 'Engine oil', volume: 4.5, unit: 'gal', capacity: 'engineOil' },
    ]);
    expect(oilB.parts.map((p) => p.partNumber)).toEqual(['TM-77']);
    const fuelA = (await a.task('Fuel filters and water separator'))!;
    expect(fuelA.parts.map((p) => p.partNumber)).toEqual(['BR-FP-20', 'BR-FS-21']);
    expect((await b.task('Fuel filters and water separator'))!.parts).toEqual([]);
  });

  it('the sheet first, the class after — the added tasks come with the figures', async () => {
    const w = await shop();
    const a = await w.machine('SP-13');
    expect((await a.saveSheet(metric)).body.tasksUpdated).toBe(0);
    const applied = await a.applyClass();
    const oil = applied.body.data.added.find(
      (t: { name: string }) => t.name === 'Engine oil and filter',
    );
    expect(oil.fluids).toEqual([
      { kind: 'Engine oil, SAE 15W-40', volume: 17.5, unit: 'L', capacity: 'engineOil' },
    ]);
    expect(oil.parts[0]).toMatchObject({ partNumber: 'BR-OF-118', filterRole: 'engineOil' });
  });

  it('a new figure — the linked line follows; cleared — the line goes; a hand-typed line stays as typed', async () => {
    const w = await shop();
    const a = await w.machine('SP-14');
    // tasks of the farm's own with the library's names: one bare, one with its own oil line
    await createTask(a.machine, { name: 'Engine oil and filter' });
    const own = await createTask(a.machine, {
      name: 'Hydraulic/transmission oil',
      fluids: [{ kind: 'UTTO, own blend', volume: 95, unit: 'L' }],
    });
    const first = await a.saveSheet({
      capacities: { ...metric.capacities, hydraulicTransmission: { quantity: 110, unit: 'L' } },
    });
    expect(first.body.tasksUpdated).toBe(1); // the bare oil task; the own line stands
    await a.saveSheet({
      capacities: { engineOil: { quantity: 18, unit: 'L', spec: 'SAE 10W-30' } },
    });
    expect((await a.task('Engine oil and filter'))!.fluids).toEqual([
      { kind: 'Engine oil, SAE 10W-30', volume: 18, unit: 'L', capacity: 'engineOil' },
    ]);
    await own.reload();
    expect(own.fluids).toEqual([{ kind: 'UTTO, own blend', volume: 95, unit: 'L' }]);
    const cleared = await a.saveSheet({ capacities: { engineOil: null } });
    expect(cleared.body.tasksUpdated).toBe(1);
    expect((await a.task('Engine oil and filter'))!.fluids).toEqual([]);
  });
});
