import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';
import { MachineOperator } from '../../server/models';
import { app, submission } from './walkarounds-fixture';
import { careYard } from './daily-care-fixture';

// The dashboard's daily care (issue 11) and the due list without it, on the hand-worked yard of
// daily-care-fixture.ts: T-01's grease round is 2 h over, its water separator not yet done today.

describe('daily care — the dashboard board and the due list', () => {
  beforeEach(resetDatabase);

  it('board — 401 signed out, 404 for another farm; the manager sees each machine with daily care, most overdue first, with its counts', async () => {
    const y = await careYard();
    expect((await request(app).get(`${y.base}/daily-care`)).status).toBe(401);
    const { user: stranger } = await createMember(await createOrganization(), 'manager');
    expect((await (await signedInAgent(app, stranger)).get(`${y.base}/daily-care`)).status).toBe(
      404,
    );
    const manager = await signedInAgent(app, y.manager);
    const res = await manager.get(`${y.base}/daily-care`);
    expect(res.status).toBe(200);
    expect(res.body.meta.asOf).toBe(y.today);
    expect(
      res.body.data.map((r: { machine: { fleetNumber: string } }) => r.machine.fleetNumber),
    ).toEqual(['T-01', 'T-02']);
    expect(res.body.data[0].counts).toEqual({ overdue: 1, not_today: 1, done_today: 0 });
    expect(res.body.data[0].tasks.map((t: { name: string }) => t.name)).toEqual([
      'Loader pivots and bucket pins',
      'Fuel water separator: let the water out',
    ]);

    // the operator greases T-01 in the walkaround: one done today, one still to do
    await y.opAgent
      .post(`${y.base}/walkarounds`)
      .send(submission(y.machine.id, { careDone: [y.grease.id] }));
    const after = await manager.get(`${y.base}/daily-care`);
    expect(after.body.data[0].counts).toEqual({ overdue: 0, not_today: 1, done_today: 1 });
  });

  it('board — an operator sees only the machines they may walk round', async () => {
    const y = await careYard();
    const { user: sam } = await createMember(y.org, 'operator');
    await MachineOperator.create({
      organizationId: y.org.id,
      machineId: y.other.id,
      userId: sam.id,
    });
    const res = await y.opAgent.get(`${y.base}/daily-care`);
    expect(res.status).toBe(200);
    expect(
      res.body.data.map((r: { machine: { fleetNumber: string } }) => r.machine.fleetNumber),
    ).toEqual(['T-01']);
  });

  it('due list — leaves daily care out of its rows and counts (2 h over, yet not an overdue row), and the fleet list’s worst due', async () => {
    const y = await careYard();
    const manager = await signedInAgent(app, y.manager);
    const due = await manager.get(`${y.base}/due`);
    expect(due.status).toBe(200);
    expect(due.body.data.map((r: { taskName: string }) => r.taskName)).toEqual([
      'Engine oil and filter',
    ]);
    expect(due.body.meta.counts.overdue).toBe(0);
    expect(due.body.meta.total).toBe(1);
    const fleet = await manager.get(`${y.base}/machines`);
    const t01 = fleet.body.data.find((m: { fleetNumber: string }) => m.fleetNumber === 'T-01');
    // the oil change, due at 2,150 h, is T-01's worst: not the overdue grease round
    expect(t01.dueStatus).toBe('ok');
    const page = await manager.get(`${y.base}/machines/${y.machine.id}`);
    expect(page.body.data.dueStatus).toBe('ok');
    // the machine's schedule still lists every task, daily care marked
    const tasks = await manager.get(`${y.base}/machines/${y.machine.id}/tasks`);
    expect(
      tasks.body.data.map((t: { name: string; dailyCare: boolean }) => [t.name, t.dailyCare]),
    ).toEqual([
      ['Loader pivots and bucket pins', true],
      ['Fuel water separator: let the water out', true],
      ['Engine oil and filter', false],
    ]);
  });
});
