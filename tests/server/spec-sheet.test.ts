// A machine's spec sheet (GET/PATCH …/machines/:machineId/spec-sheet). Decisions: everyone who may
// see the machine reads it, a linked dealer of either access too (as it reads the machine); the
// farm's managers and technicians write it — as the schedule it fills; a dealer's `service` link
// edits no schedule, so the PATCH is not routed for dealers at all (404, as for a stranger).
// A PATCH changes only the sections sent: keyed sections only the keys sent (null clears one),
// lists whole. Schema refusals answer 400 naming the field (route()'s rule), nothing written.
import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { resetDatabase } from '../support/db';
import {
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';
import { linkDealer } from './dealer-fixture';
import { AuditEvent, MachineOperator, MachineSpecSheet } from '../../server/models';
import type { Role } from '../../shared/constants';

const app = createApp();
const sheetUrl = (orgId: string, machineId: string) =>
  `/api/v1/organizations/${orgId}/machines/${machineId}/spec-sheet`;

async function farm() {
  const org = await createOrganization();
  const machine = await createMachine(org, { fleetNumber: 'SP-01', name: 'Row-crop tractor' });
  const as = async (role: Role) => signedInAgent(app, (await createMember(org, role)).user);
  return { org, machine, as, url: sheetUrl(org.id, machine.id) };
}

const FULL = {
  capacities: {
    engineOil: { quantity: 17.5, unit: 'L', spec: 'SAE 15W-40, API CK-4' },
    hydraulicTransmission: { quantity: 110, unit: 'L', spec: 'UTTO' },
  },
  extraCapacities: [{ name: 'Front PTO gearbox', quantity: 1.2, unit: 'L', spec: 'SAE 80W-90' }],
  filters: { engineOil: 'BR-OF-118', airOuter: 'BR-AF-40' },
  extraFilters: [{ name: 'Hydraulic breather', partNumber: 'BR-HB-2' }],
  tyrePressures: { front: { value: 160, unit: 'kPa', note: '600/65R28, field' } },
  torques: [{ name: 'Wheel nuts', value: 650, unit: 'Nm', note: 'cross pattern' }],
  testPressures: [
    {
      name: 'PTO clutch pressure',
      min: 2000,
      max: 2200,
      unit: 'kPa',
      engineRpm: 2100,
      oilTemperature: { value: 50, unit: 'C' },
      conditions: 'PTO engaged',
    },
  ],
  notes: "From the operator's manual, section 9.",
};

describe('spec sheet — read and write', () => {
  beforeEach(resetDatabase);

  it('spec sheet — a machine with nothing entered — every section empty, updatedAt null', async () => {
    const w = await farm();
    const res = await (await w.as('manager')).get(w.url);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      data: {
        machineId: w.machine.id,
        capacities: {},
        extraCapacities: [],
        filters: {},
        extraFilters: [],
        tyrePressures: {},
        torques: [],
        testPressures: [],
        notes: '',
        updatedAt: null,
      },
      abilities: { update: true },
    });
  });

  it('spec sheet — a manager saves a full sheet — stored as sent, read back, audited', async () => {
    const w = await farm();
    const manager = await w.as('manager');
    const saved = await manager.patch(w.url).send(FULL);
    expect(saved.status).toBe(200);
    expect(saved.body.tasksUpdated).toBe(0);
    const read = await manager.get(w.url);
    expect(read.body.data).toMatchObject(FULL);
    expect(read.body.data.updatedAt).toEqual(expect.any(String));
    const audit = await AuditEvent.findOne({ where: { action: 'machine.spec_sheet_update' } });
    expect(audit?.entityId).toBe(w.machine.id);
  });

  it('spec sheet — PATCH — changes only what is sent: one key cleared by null, other sections kept', async () => {
    const w = await farm();
    const tech = await w.as('technician');
    expect((await tech.patch(w.url).send(FULL)).status).toBe(200);
    await tech.patch(w.url).send({ capacities: { engineOil: null } });
    await tech.patch(w.url).send({ filters: { cab: 'BR-CF-7' } });
    const after = (await tech.get(w.url)).body.data;
    expect(after.capacities).toEqual({
      hydraulicTransmission: FULL.capacities.hydraulicTransmission,
    });
    expect(after.filters).toEqual({ ...FULL.filters, cab: 'BR-CF-7' });
    for (const section of ['extraCapacities', 'tyrePressures', 'torques', 'testPressures', 'notes'])
      expect(after[section], section).toEqual(FULL[section as keyof typeof FULL]);
    // a list is replaced whole; a section sent as null is emptied
    await tech.patch(w.url).send({ torques: [], tyrePressures: null });
    const emptied = (await tech.get(w.url)).body.data;
    expect([emptied.torques, emptied.tyrePressures]).toEqual([[], {}]);
    expect(emptied.testPressures).toEqual(FULL.testPressures);
  });

  it.each([
    [
      { capacities: { engineOil: { quantity: -3, unit: 'L' } } },
      'capacities.engineOil.quantity',
      /greater than 0/,
    ],
    [
      { capacities: { engineOil: { quantity: 12, unit: 'pints' } } },
      'capacities.engineOil.unit',
      /L, gal/,
    ],
    [
      { capacities: { engineOill: { quantity: 12, unit: 'L' } } },
      'capacities.engineOill',
      /Not a field/,
    ],
    [
      { capacities: { coolant: { unit: 'L' } } },
      'capacities.coolant.quantity',
      /quantity or the fluid/,
    ],
    [{ filters: { engineOil: '' } }, 'filters.engineOil', /part number/],
    [
      { tyrePressures: { front: { value: 160, unit: 'atm' } } },
      'tyrePressures.front.unit',
      /kPa, psi, bar/,
    ],
    [
      { torques: [{ name: 'Wheel nuts', value: 650, unit: 'Nm', extra: 1 }] },
      'torques.0.extra',
      /Not a field/,
    ],
    [
      { testPressures: [{ name: 'PTO', min: 2200, max: 2000, unit: 'kPa' }] },
      'testPressures.0.max',
      /below the minimum/,
    ],
    [
      { testPressures: [{ name: 'PTO', unit: 'kPa' }] },
      'testPressures.0.min',
      /minimum, the maximum/,
    ],
    [
      {
        testPressures: [
          { name: 'PTO', min: 1, unit: 'kPa' },
          { name: 'pto', min: 2, unit: 'kPa' },
        ],
      },
      'testPressures.1.name',
      /on the sheet already/,
    ],
    [
      { testPressures: [{ name: 'PTO', min: 1, unit: 'kPa', engineRpm: 2100.5 }] },
      'testPressures.0.engineRpm',
      /whole number/,
    ],
    [
      { capacities: { engineOil: { quantity: 10, unit: 'L', spec: 'x'.repeat(51) } } },
      'capacities.engineOil.spec',
      /at most 50/,
    ],
    [{ colour: 'green' }, 'colour', /Not a field/],
  ])('spec sheet — bad body %j — 400 naming %s, nothing written', async (body, field, rule) => {
    const w = await farm();
    const res = await (await w.as('manager')).patch(w.url).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toMatch(rule);
    expect(await MachineSpecSheet.count()).toBe(0);
  });

  it('spec sheet — an operator reads the sheet of a machine they see, is refused the write (403), nothing written', async () => {
    const w = await farm();
    const op = await w.as('operator');
    expect((await op.get(w.url)).status).toBe(200);
    const res = await op.patch(w.url).send({ notes: 'mine' });
    expect(res.status).toBe(403);
    expect((await op.get(w.url)).body.abilities).toEqual({ update: false });
    expect(await MachineSpecSheet.count()).toBe(0);
  });

  it('spec sheet — a machine assigned to another operator — 404 to this operator', async () => {
    const w = await farm();
    const { user: other } = await createMember(w.org, 'operator');
    await MachineOperator.create({
      organizationId: w.org.id,
      machineId: w.machine.id,
      userId: other.id,
    });
    expect((await (await w.as('operator')).get(w.url)).status).toBe(404);
  });

  it("spec sheet — another farm's machine id — 404 on read and write, nothing written; signed out 401", async () => {
    const mine = await farm();
    const theirs = await farm();
    const manager = await mine.as('manager');
    const url = sheetUrl(mine.org.id, theirs.machine.id);
    expect((await manager.get(url)).status).toBe(404);
    expect((await manager.patch(url).send({ notes: 'x' })).status).toBe(404);
    expect(await MachineSpecSheet.count()).toBe(0);
    expect((await request(app).get(mine.url)).status).toBe(401);
  });

  it('spec sheet — a linked dealer — reads it (view or service link) without the update ability; its PATCH is not routed (404)', async () => {
    const w = await farm();
    await (await w.as('manager')).patch(w.url).send({ filters: { engineOil: 'BR-OF-118' } });
    for (const access of ['view', 'service'] as const) {
      const dealer = await createOrganization({ kind: 'dealer' });
      const { user } = await createMember(dealer, 'advisor');
      await linkDealer(dealer, w.org, access);
      const advisor = await signedInAgent(app, user);
      const read = await advisor.get(w.url);
      expect(read.status, access).toBe(200);
      expect(read.body.data.filters).toEqual({ engineOil: 'BR-OF-118' });
      expect(read.body.abilities).toEqual({ update: false });
      const write = await advisor.patch(w.url).send({ filters: { engineOil: 'X-1' } });
      expect(write.status, access).toBe(404);
    }
    const stored = await MachineSpecSheet.findOne();
    expect(stored?.filters).toEqual({ engineOil: 'BR-OF-118' });
  });
});
