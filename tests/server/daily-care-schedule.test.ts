import { beforeEach, describe, expect, it } from 'vitest';
import { countRows, resetDatabase } from '../support/db';
import { createMachine, signedInAgent } from '../support/factories';
import { ServiceTask } from '../../server/models';
import { serviceLibraryClass } from '../../shared/domain/service-library';
import { app, submission } from './walkarounds-fixture';
import { careYard } from './daily-care-fixture';

// Daily care on the schedule (issue 11): applying a library class copies each task's flag; the
// manager ticks it on a task of their own (PATCH changes that field only); a tick the schema
// refuses is named. Yard: daily-care-fixture.ts.

describe('daily care — on the schedule', () => {
  beforeEach(resetDatabase);

  it('apply class — the utility loader tractor’s tasks arrive with the library’s flag: grease rounds and daily items daily care, the rest not', async () => {
    const y = await careYard();
    const loader = await createMachine(y.org, { fleetNumber: 'L-01', category: 'tractor' });
    const manager = await signedInAgent(app, y.manager);
    const res = await manager
      .post(`${y.base}/machines/${loader.id}/apply-class`)
      .send({ machineClass: 'utility_loader_tractor' });
    expect(res.status).toBe(200);
    const expected = serviceLibraryClass('utility_loader_tractor').tasks;
    const stored = await ServiceTask.findAll({ where: { machineId: loader.id } });
    const flag = new Map(stored.map((t) => [t.name, t.dailyCare]));
    expect(flag.size).toBe(expected.length);
    for (const t of expected) expect(flag.get(t.name), t.name).toBe(t.dailyCare);
    expect(flag.get('Loader pivots and bucket pins')).toBe(true);
    expect(flag.get('Fuel water separator: let the water out')).toBe(true);
    expect(flag.get('Engine oil and filter')).toBe(false);
    expect([...flag.values()].filter(Boolean).length).toBeGreaterThanOrEqual(3);
  });

  it('task form — the manager makes a task daily care (only that field changes) and the operator can then tick it; a bad value is named', async () => {
    const y = await careYard();
    const manager = await signedInAgent(app, y.manager);
    const url = `${y.base}/tasks/${y.oil.id}`;
    const bad = await manager.patch(url).send({ dailyCare: 'yes' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.dailyCare).toBe('Daily care must be true or false');
    const res = await manager.patch(url).send({ dailyCare: true });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({
      dailyCare: true,
      intervalMeter: 250,
      lastDoneMeter: 1900,
    });
    const sent = await y.opAgent
      .post(`${y.base}/walkarounds`)
      .send(submission(y.machine.id, { careDone: [y.oil.id] }));
    expect(sent.status).toBe(201);
    expect((await ServiceTask.findByPk(y.oil.id))!.lastDoneMeter).toBe(2004.5);
    expect(await countRows('service_records')).toBe(0);
  });
});
