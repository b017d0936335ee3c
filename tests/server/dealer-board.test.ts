import { randomUUID } from 'node:crypto';
import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { parse } from 'csv-parse/sync';
import { AuditEvent, Notification } from '../../server/models';
import { countRows, resetDatabase } from '../support/db';
import { createTask, signedInAgent } from '../support/factories';
import { clearMail, deliveredMail } from '../support/mail';
import { api, app, dealerWorld } from './dealer-fixture';

interface Row {
  customer: { id: string; name: string };
  machine: { fleetNumber: string };
  taskId: string;
  taskName: string;
  due: { status: string; dueMeter: number; remainingMeter: number };
  lastReading: { value: number } | null;
  lastReadingAgeDays: number | null;
}
const names = (rows: Row[]) => rows.map((r) => `${r.machine.fleetNumber} ${r.taskName}`);

describe("the dealer's board", () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('board — due rows of every active customer (not the unlinked farm), overdue first, with the last reading age; filters and paging', async () => {
    const w = await dealerWorld();
    const res = await w.advisorAgent.get(api(w.dealer.id, '/board'));
    expect(res.status).toBe(200);
    const rows = res.body.data as Row[];
    // each farm: oil overdue (due 1,250 h, read 1,300 h), hydraulic filters at 1,400 h in ~8 days
    expect(names(rows)).toEqual([
      'A-01 Engine oil and filter',
      'B-01 Engine oil and filter',
      'A-01 Hydraulic filters',
      'B-01 Hydraulic filters',
    ]);
    expect(rows[0]).toMatchObject({
      customer: { id: w.serviced.org.id, name: 'Alder Farm', access: 'service' },
      due: { status: 'overdue', dueMeter: 1250, remainingMeter: -50 },
      lastReading: { value: 1300 },
      lastReadingAgeDays: 2,
    });
    expect(res.body.meta).toMatchObject({
      total: 4,
      page: 1,
      pageSize: 25,
      counts: { overdue: 2, due_soon: 0, history_unknown: 0, ok: 2, no_forecast: 0 },
      customers: [
        { id: w.serviced.org.id, name: 'Alder Farm', access: 'service' },
        { id: w.viewed.org.id, name: 'Birch Farm', access: 'view' },
      ],
    });
    const byCustomer = await w.advisorAgent.get(
      api(w.dealer.id, `/board?customerId=${w.viewed.org.id}`),
    );
    expect(names(byCustomer.body.data)).toEqual([
      'B-01 Engine oil and filter',
      'B-01 Hydraulic filters',
    ]);
    expect(byCustomer.body.meta.customers).toHaveLength(2);
    const byTask = await w.advisorAgent.get(api(w.dealer.id, '/board?task=hydraulic'));
    expect(names(byTask.body.data)).toEqual(['A-01 Hydraulic filters', 'B-01 Hydraulic filters']);
    const byStatus = await w.advisorAgent.get(api(w.dealer.id, '/board?status=overdue'));
    expect(byStatus.body.meta.total).toBe(2);
    const byCategory = await w.advisorAgent.get(api(w.dealer.id, '/board?category=combine'));
    expect(byCategory.body.data).toEqual([]);
    const page2 = await w.advisorAgent.get(api(w.dealer.id, '/board?pageSize=3&page=2'));
    expect(names(page2.body.data)).toEqual(['B-01 Hydraulic filters']);
    // the unlinked farm's customer id gives nothing, and the horizon limits the ok rows
    const unlinked = await w.advisorAgent.get(
      api(w.dealer.id, `/board?customerId=${w.unlinked.org.id}`),
    );
    expect(unlinked.body.data).toEqual([]);
    await createTask(w.serviced.machine, {
      name: 'Coolant',
      intervalMeter: 3000,
      lastDoneMeter: 1000,
      warnMeter: 300,
    });
    const week = await w.advisorAgent.get(api(w.dealer.id, '/board?horizon=7'));
    expect(names(week.body.data)).toEqual([
      'A-01 Engine oil and filter',
      'B-01 Engine oil and filter',
    ]);
    const year = await w.advisorAgent.get(api(w.dealer.id, '/board?horizon=90'));
    expect(names(year.body.data)).not.toContain('A-01 Coolant');
    // each board request reads each farm: audited in that farm's log
    const reads = await AuditEvent.findAll({
      where: { organizationId: w.viewed.org.id, action: 'dealer.read' },
    });
    expect(reads.length).toBeGreaterThan(0);
    expect(reads[0]).toMatchObject({ entityType: 'due', actorUserId: w.advisor.id });
  });

  it('board — stays correct when a customer logs a reading (the farm due list is the source)', async () => {
    const w = await dealerWorld();
    const board = async () =>
      (
        await w.advisorAgent.get(api(w.dealer.id, `/board?customerId=${w.serviced.org.id}`))
      ).body.data.find((r: Row) => r.taskName === 'Hydraulic filters') as Row;
    const before = await board();
    expect(before.due.remainingMeter).toBe(100);
    expect(before.lastReadingAgeDays).toBe(2);
    const tech = await signedInAgent(app, w.serviced.tech);
    const logged = await tech
      .post(api(w.serviced.org.id, `/machines/${w.serviced.machine.id}/readings`))
      .send({ value: 1330 });
    expect(logged.status).toBe(201);
    const after = await board();
    expect(after.due.remainingMeter).toBe(70);
    expect(after.lastReading).toMatchObject({ value: 1330 });
    expect(after.lastReadingAgeDays).toBe(0);
    // the same row as the farm's own due list
    const farmDue = await tech.get(api(w.serviced.org.id, '/due'));
    const farmRow = farmDue.body.data.find((r: Row) => r.taskName === 'Hydraulic filters');
    expect(after.due).toEqual(farmRow.due);
  });

  it('board — 401, 400 on bad filters, 404 for a farm id (member or dealer), CSV with the same filters as an attachment', async () => {
    const w = await dealerWorld();
    expect((await request(app).get(api(w.dealer.id, '/board'))).status).toBe(401);
    expect((await request(app).get(api(w.dealer.id, '/board.csv'))).status).toBe(401);
    for (const q of ['horizon=14', 'status=late', 'pageSize=500', 'customerId=nope']) {
      const res = await w.advisorAgent.get(api(w.dealer.id, `/board?${q}`));
      expect([q, res.status]).toEqual([q, 400]);
    }
    const manager = await signedInAgent(app, w.serviced.manager);
    expect((await manager.get(api(w.serviced.org.id, '/board'))).status).toBe(404);
    expect((await w.advisorAgent.get(api(w.serviced.org.id, '/board'))).status).toBe(404);
    expect((await manager.get(api(w.dealer.id, '/board'))).status).toBe(404);

    const csv = await w.advisorAgent.get(api(w.dealer.id, '/board.csv?task=oil'));
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    expect(csv.headers['content-disposition']).toMatch(
      /^attachment; filename="coming-due-\d{4}-\d{2}-\d{2}\.csv"$/,
    );
    const records = parse(csv.text, { columns: true }) as Record<string, string>[];
    expect(
      records.map((r) => [r.Customer, r['Fleet number'], r.Task, r.Status, r['Due meter']]),
    ).toEqual([
      ['Alder Farm', 'A-01', 'Engine oil and filter', 'Overdue', '1250'],
      ['Birch Farm', 'B-01', 'Engine oil and filter', 'Overdue', '1250'],
    ]);
    expect(records[0]['Days since reading']).toBe('2');
  });
});

describe('reminders to a customer', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it("reminder — a prefilled draft; sent to the farm's managers through the outbox; a double click sends once", async () => {
    const w = await dealerWorld();
    const { org, oil, hydraulic, manager } = w.serviced;
    const draft = await w.advisorAgent.get(
      api(w.dealer.id, `/customers/${org.id}/reminder-draft?taskIds=${oil.id},${hydraulic.id}`),
    );
    expect(draft.status).toBe(200);
    expect(draft.body.data.subject).toBe('Service coming due: A-01 at Alder Farm');
    expect(draft.body.data.body).toContain(
      '- A-01 Alder Farm tractor: Engine oil and filter (overdue; due at 1,250 h',
    );
    expect(draft.body.data.recipients).toEqual([{ name: manager.name }]);
    const input = {
      taskIds: [oil.id, hydraulic.id],
      subject: 'Oil change due on A-01',
      body: 'Your A-01 is past its oil change. Shall we book it in on Friday?',
      requestId: randomUUID(),
    };
    const path = api(w.dealer.id, `/customers/${org.id}/reminders`);
    const [first, second] = await Promise.all([
      w.advisorAgent.post(path).send(input),
      w.advisorAgent.post(path).send(input),
    ]);
    expect([first.status, second.status]).toEqual([201, 201]);
    expect(first.body.data.queued + second.body.data.queued).toBe(1);
    const rows = await Notification.findAll({ where: { kind: 'dealer_reminder' } });
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ recipient: manager.email, subject: 'Oil change due on A-01' });
    const mail = (await deliveredMail()).filter((m) => m.subject === 'Oil change due on A-01');
    expect(mail).toHaveLength(1);
    expect(mail[0].text).toContain('Shall we book it in on Friday?');
    expect(mail[0].headers['reply-to']).toContain(w.advisor.email);
    const audit = await AuditEvent.findOne({ where: { action: 'dealer.reminder' } });
    expect(audit).toMatchObject({ organizationId: org.id, actorUserId: w.advisor.id });
  });

  it('reminder — 401; 400/422 with nothing queued (bad body, a task of another farm, an unlinked customer); 404 from a farm', async () => {
    const w = await dealerWorld();
    const { org, oil } = w.serviced;
    const path = api(w.dealer.id, `/customers/${org.id}/reminders`);
    const good = { taskIds: [oil.id], subject: 'S', body: 'B', requestId: randomUUID() };
    expect((await request(app).post(path).send(good)).status).toBe(401);
    const empty = await w.advisorAgent.post(path).send({ ...good, subject: '  ', taskIds: [] });
    expect(empty.status).toBe(400);
    expect(Object.keys(empty.body.error.fields).sort()).toEqual(['subject', 'taskIds']);
    const foreign = await w.advisorAgent
      .post(path)
      .send({ ...good, taskIds: [oil.id, w.unlinked.oil.id] });
    expect(foreign.status).toBe(422);
    expect(foreign.body.error.fields).toEqual({ 'taskIds.1': 'Not a due service of Alder Farm' });
    const unlinked = await w.advisorAgent
      .post(api(w.dealer.id, `/customers/${w.unlinked.org.id}/reminders`))
      .send({ ...good, taskIds: [w.unlinked.oil.id] });
    expect(unlinked.status).toBe(422);
    expect(unlinked.body.error.fields).toEqual({ customerId: 'Not one of your linked customers' });
    const manager = await signedInAgent(app, w.serviced.manager);
    expect(
      (await manager.post(api(org.id, `/customers/${org.id}/reminders`)).send(good)).status,
    ).toBe(404);
    expect(await countRows('notifications')).toBe(0);
  });
});
