import { randomUUID } from 'node:crypto';
import { beforeEach, describe, expect, it } from 'vitest';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { AuditEvent, MeterReading, ServiceTask, TaskDuePoint } from '../../server/models';
import { addDaysIso, todayIso } from '../../shared/domain';
import { app, hoursAgo, submission } from './walkarounds-fixture';
import { careYard } from './daily-care-fixture';

// Daily care signed off in the walkaround (issue 11), on the hand-worked yard of
// daily-care-fixture.ts: a tick resets exactly that task to the walkaround's meter reading (on
// the lifetime scale) and local date, with an audit entry and no service record.

const signOffs = () => AuditEvent.count({ where: { action: 'task.daily_care_done' } });

describe('walkarounds — daily care', () => {
  beforeEach(resetDatabase);

  it('checklist — lists the machine’s daily care only, with the meter run since and where each stands today', async () => {
    const y = await careYard();
    const res = await y.opAgent.get(y.checklistUrl);
    expect(res.status).toBe(200);
    expect(res.body.data.dailyCare).toEqual([
      expect.objectContaining({
        taskId: y.grease.id,
        name: 'Loader pivots and bucket pins',
        intervalMeter: 10,
        lastDoneMeter: 1988,
        sinceMeter: 12, // 2,000 − 1,988
        state: 'overdue', // due at 1,998 h
      }),
      expect.objectContaining({
        taskId: y.separator.id,
        sinceMeter: 5, // 2,000 − 1,995
        state: 'not_today', // 5 h left, done yesterday
      }),
    ]);
  });

  it('sign-off — a tick resets exactly that task to the walkaround (2,004.5 h, today); the other daily care and the service task keep theirs; audited, no service record', async () => {
    const y = await careYard();
    const res = await y.opAgent
      .post(`${y.base}/walkarounds`)
      .send(submission(y.machine.id, { careDone: [y.grease.id] }));
    expect(res.status).toBe(201);
    expect(res.body.data.careDone).toEqual([
      { taskId: y.grease.id, name: 'Loader pivots and bucket pins', reset: true },
    ]);
    const grease = (await ServiceTask.findByPk(y.grease.id))!;
    expect(grease.lastDoneMeter).toBe(2004.5);
    expect(grease.lastDoneOn).toBe(y.today);
    const separator = (await ServiceTask.findByPk(y.separator.id))!;
    expect([separator.lastDoneMeter, separator.lastDoneOn]).toEqual([
      1995,
      addDaysIso(y.today, -1),
    ]);
    const oil = (await ServiceTask.findByPk(y.oil.id))!;
    expect(oil.lastDoneMeter).toBe(1900);
    expect(await countRows('service_records')).toBe(0);
    // the due point follows at once: 2,004.5 + 10 = 2,014.5 h, no longer overdue
    const due = (await TaskDuePoint.findByPk(y.grease.id))!;
    expect(due.due.dueMeter).toBe(2014.5);
    expect(due.status).not.toBe('overdue');
    const [audit] = await AuditEvent.findAll({ where: { action: 'task.daily_care_done' } });
    expect(audit).toMatchObject({
      actorUserId: y.op.id,
      entityType: 'service_task',
      entityId: y.grease.id,
      changes: {
        walkaroundId: res.body.data.id,
        reset: true,
        before: { lastDoneMeter: 1988, lastDoneOn: addDaysIso(y.today, -2) },
        after: { lastDoneMeter: 2004.5, lastDoneOn: y.today },
      },
    });
    expect(await signOffs()).toBe(1);
    const after = await y.opAgent.get(y.checklistUrl);
    expect(after.body.data.dailyCare[0]).toMatchObject({ state: 'done_today', sinceMeter: 0 });
  });

  it('sign-off — refused with 422 naming careDone.i, nothing written: another machine’s task, a service task, the same tick twice, another farm’s task', async () => {
    const y = await careYard();
    const elsewhere = await createOrganization();
    const foreign = await createTask(await createMachine(elsewhere), { dailyCare: true });
    const cases: [string[], string, RegExp][] = [
      [[y.otherGrease.id], 'careDone.0', /^No daily-care task of T-01 has this id$/],
      [[y.grease.id, y.oil.id], 'careDone.1', /"Engine oil and filter" is not daily care/],
      [[y.grease.id, y.grease.id], 'careDone.1', /ticked twice/],
      [[foreign.id], 'careDone.0', /^No daily-care task of T-01 has this id$/],
    ];
    for (const [careDone, field, message] of cases) {
      const res = await y.opAgent
        .post(`${y.base}/walkarounds`)
        .send(submission(y.machine.id, { careDone }));
      expect(res.status, field).toBe(422);
      expect(res.body.error.fields[field]).toMatch(message);
    }
    const bad = await y.opAgent
      .post(`${y.base}/walkarounds`)
      .send(submission(y.machine.id, { careDone: ['not-an-id'] }));
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['careDone.0']).toBeDefined();
    expect(await countRows('walkarounds')).toBe(0);
    expect(await MeterReading.count({ where: { source: 'walkaround' } })).toBe(0);
    expect((await ServiceTask.findByPk(y.grease.id))!.lastDoneMeter).toBe(1988);
    expect(await signOffs()).toBe(0);
  });

  it('sign-off — a resend of the same walkaround (its clientId) changes nothing and answers the same sign-off', async () => {
    const y = await careYard();
    const body = submission(y.machine.id, { careDone: [y.grease.id, y.separator.id] });
    const first = await y.opAgent.post(`${y.base}/walkarounds`).send(body);
    expect(first.status).toBe(201);
    const stamp = (await ServiceTask.findByPk(y.grease.id))!.updatedAt;
    const again = await y.opAgent.post(`${y.base}/walkarounds`).send(body);
    expect(again.status).toBe(200);
    expect(again.body.duplicate).toBe(true);
    expect(again.body.data.careDone).toEqual(first.body.data.careDone);
    expect((await ServiceTask.findByPk(y.grease.id))!.updatedAt).toEqual(stamp);
    expect(await signOffs()).toBe(2);
    expect(await countRows('walkarounds')).toBe(1);
  });

  it('sign-off — a walkaround that waited in the outbox, done before a later sign-off, leaves the task as the later one set it (audited as not reset)', async () => {
    const y = await careYard();
    await y.opAgent
      .post(`${y.base}/walkarounds`)
      .send(submission(y.machine.id, { careDone: [y.grease.id] }));
    // done three hours ago at 2,002 h, sent only now
    const late = await y.opAgent.post(`${y.base}/walkarounds`).send(
      submission(y.machine.id, {
        clientId: randomUUID(),
        meterValue: 2002,
        performedAt: hoursAgo(3),
        careDone: [y.grease.id],
      }),
    );
    expect(late.status).toBe(201);
    expect(late.body.data.careDone).toEqual([
      { taskId: y.grease.id, name: 'Loader pivots and bucket pins', reset: false },
    ]);
    expect((await ServiceTask.findByPk(y.grease.id))!.lastDoneMeter).toBe(2004.5);
    expect(await signOffs()).toBe(2);
  });

  it('sign-off — after a meter replacement the task is reset on the lifetime scale: old meter 3,012 h, new meter from 0, walkaround at 6 h → 3,018 h', async () => {
    const org = await createOrganization({ timeZone: 'America/Chicago' });
    const { user: op } = await createMember(org, 'operator');
    const { user: tech } = await createMember(org, 'technician');
    const machine = await createMachine(org, { fleetNumber: 'T-07', category: 'tractor' });
    await addReadings(machine, [
      { daysAgo: 5, value: 3000 },
      { daysAgo: 2, value: 3010 },
    ]);
    const grease = await createTask(machine, {
      name: 'Daily grease points',
      intervalMeter: 10,
      dailyCare: true,
      lastDoneMeter: 3000,
      lastDoneOn: addDaysIso(todayIso(org.timeZone), -5),
    });
    const base = `/api/v1/organizations/${org.id}`;
    const replaced = await (
      await signedInAgent(app, tech)
    )
      .post(`${base}/machines/${machine.id}/meter-replacements`)
      .send({ oldFinalValue: 3012, newStartValue: 0, replacedAt: hoursAgo(24) });
    expect(replaced.status).toBe(201);
    const res = await (
      await signedInAgent(app, op)
    )
      .post(`${base}/walkarounds`)
      .send(submission(machine.id, { meterValue: 6, careDone: [grease.id] }));
    expect(res.status).toBe(201);
    // lifetime = 6 + (3,012 − 0)
    expect((await ServiceTask.findByPk(grease.id))!.lastDoneMeter).toBe(3018);
  });
});
