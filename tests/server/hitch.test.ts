// The hitch log's routes (issue 13): who may hitch, unhitch and correct; bad input named by field
// with nothing written; another farm's ids 404; one implement on one tractor at a time (409), a
// tractor pulling two implements at once; the log as each machine's page reads it.
import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { MachineOperator } from '../../server/models';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';
import { linkDealer } from './dealer-fixture';

const app = createApp();
const HOUR = 3_600_000;
const hoursAgo = (h: number) => new Date(Date.now() - h * HOUR).toISOString();

async function farm() {
  const org = await createOrganization();
  const { user: manager } = await createMember(org, 'manager');
  const tractor = await createMachine(org, { fleetNumber: 'T-02', category: 'tractor' });
  const front = await createMachine(org, { fleetNumber: 'T-03', category: 'tractor' });
  const mower = await createMachine(org, { fleetNumber: 'M-01', category: 'mower' });
  const rake = await createMachine(org, { fleetNumber: 'R-01', category: 'implement' });
  const agent = await signedInAgent(app, manager);
  const url = (rest = '') => `/api/v1/organizations/${org.id}${rest}`;
  const hitch = (body: object, as = agent) => as.post(url('/hitch-spans')).send(body);
  return { org, manager, tractor, front, mower, rake, agent, url, hitch };
}

describe('hitch log — starting and ending spans', () => {
  beforeEach(resetDatabase);

  it('hitch, list on both machines, unhitch — 201, the span on the implement and the tractor, then ended', async () => {
    const { tractor, mower, agent, url, hitch } = await farm();
    const res = await hitch({
      implementId: mower.id,
      tractorId: tractor.id,
      startedAt: hoursAgo(3),
    });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({
      implement: { fleetNumber: 'M-01' },
      tractor: { fleetNumber: 'T-02' },
      meterKind: 'engine_hours',
      endedAt: null,
    });
    const onTractor = await agent.get(url(`/machines/${tractor.id}/hitch-spans`));
    expect(onTractor.status).toBe(200);
    expect(onTractor.body.data.spans.map((s: { id: string }) => s.id)).toEqual([res.body.data.id]);
    const ended = await agent.post(url(`/hitch-spans/${res.body.data.id}/end`)).send({});
    expect(ended.status).toBe(200);
    expect(ended.body.data.endedAt).not.toBeNull();
    const again = await agent.post(url(`/hitch-spans/${res.body.data.id}/end`)).send({});
    expect(again.status).toBe(409);
  });

  it('one implement on one tractor at a time — a second open span, or one overlapping a closed span, 409 naming the tractor', async () => {
    const { tractor, front, mower, hitch } = await farm();
    expect(
      (
        await hitch({
          implementId: mower.id,
          tractorId: tractor.id,
          startedAt: hoursAgo(10),
          endedAt: hoursAgo(6),
        })
      ).status,
    ).toBe(201);
    const inside = await hitch({
      implementId: mower.id,
      tractorId: front.id,
      startedAt: hoursAgo(8),
      endedAt: hoursAgo(7),
    });
    expect(inside.status).toBe(409);
    expect(inside.body.error.message).toMatch(/M-01 is on T-02 from .* to .*one tractor at a time/);
    // touching spans are not overlapping: [10 h ago, 6 h ago) then from 6 h ago
    expect(
      (await hitch({ implementId: mower.id, tractorId: front.id, startedAt: hoursAgo(6) })).status,
    ).toBe(201);
    const second = await hitch({
      implementId: mower.id,
      tractorId: tractor.id,
      startedAt: hoursAgo(1),
    });
    expect(second.status).toBe(409);
    expect(second.body.error.message).toMatch(/M-01 is on T-03 .* still hitched/);
    expect(await countRows('hitch_spans')).toBe(2);
  });

  it('a tractor may pull two implements at once (front and rear) — both 201, both listed on the tractor', async () => {
    const { tractor, mower, rake, agent, url, hitch } = await farm();
    expect(
      (await hitch({ implementId: mower.id, tractorId: tractor.id, startedAt: hoursAgo(4) }))
        .status,
    ).toBe(201);
    expect(
      (await hitch({ implementId: rake.id, tractorId: tractor.id, startedAt: hoursAgo(3) })).status,
    ).toBe(201);
    const log = await agent.get(url(`/machines/${tractor.id}/hitch-spans`));
    expect(
      log.body.data.spans.map(
        (s: { implement: { fleetNumber: string } }) => s.implement.fleetNumber,
      ),
    ).toEqual(['R-01', 'M-01']);
  });

  it.each([
    [
      'an implement on itself',
      (f: Farm) => ({ implementId: f.mower.id, tractorId: f.mower.id }),
      'tractorId',
      /itself/,
    ],
    [
      'a tractor that is an implement',
      (f: Farm) => ({ implementId: f.mower.id, tractorId: f.rake.id }),
      'tractorId',
      /R-01 .* is not a tractor/,
    ],
    [
      'a tractor as the implement',
      (f: Farm) => ({ implementId: f.front.id, tractorId: f.tractor.id }),
      'implementId',
      /T-03 .* is not an implement/,
    ],
    [
      'a PTO meter the tractor has not',
      (f: Farm) => ({ implementId: f.mower.id, tractorId: f.tractor.id, meterKind: 'pto_hours' }),
      'meterKind',
      /no meter for the tractor's PTO hours/,
    ],
    [
      'an end before the start',
      (f: Farm) => ({
        implementId: f.mower.id,
        tractorId: f.tractor.id,
        startedAt: hoursAgo(2),
        endedAt: hoursAgo(3),
      }),
      'endedAt',
      /after Hitched at/,
    ],
    [
      'a start in the future',
      (f: Farm) => ({
        implementId: f.mower.id,
        tractorId: f.tractor.id,
        startedAt: new Date(Date.now() + 3 * HOUR).toISOString(),
      }),
      'startedAt',
      /future/,
    ],
    ['no implement id', (f: Farm) => ({ tractorId: f.tractor.id }), 'implementId', /./],
    [
      'an unknown field',
      (f: Farm) => ({ implementId: f.mower.id, tractorId: f.tractor.id, hours: 3 }),
      '',
      /hours/,
    ],
  ])(
    'bad input — %s — 400 naming the field and the rule, nothing written',
    async (_name, body, field, message) => {
      const f = await farm();
      const res = await f.hitch(body(f));
      expect(res.status).toBe(400);
      if (field) expect(res.body.error.fields[field]).toMatch(message);
      else expect(res.body.error.message).toMatch(message);
      expect(await countRows('hitch_spans')).toBe(0);
    },
  );

  it('another farm — its tractor, implement, span or machine log answer 404', async () => {
    const mine = await farm();
    const other = await farm();
    expect(
      (await mine.hitch({ implementId: mine.mower.id, tractorId: other.tractor.id })).status,
    ).toBe(404);
    expect(
      (await mine.hitch({ implementId: other.mower.id, tractorId: mine.tractor.id })).status,
    ).toBe(404);
    const theirs = await other.hitch({ implementId: other.mower.id, tractorId: other.tractor.id });
    const spanId = theirs.body.data.id;
    expect((await mine.agent.post(mine.url(`/hitch-spans/${spanId}/end`)).send({})).status).toBe(
      404,
    );
    expect(
      (await mine.agent.patch(mine.url(`/hitch-spans/${spanId}`)).send({ note: 'x' })).status,
    ).toBe(404);
    expect((await mine.agent.delete(mine.url(`/hitch-spans/${spanId}`))).status).toBe(404);
    expect((await mine.agent.get(mine.url(`/machines/${other.mower.id}/hitch-spans`))).status).toBe(
      404,
    );
    expect(
      (await request(app).get(mine.url(`/machines/${mine.mower.id}/hitch-spans`))).status,
    ).toBe(401);
  });
});

type Farm = Awaited<ReturnType<typeof farm>>;

describe('hitch log — roles', () => {
  beforeEach(resetDatabase);

  it('operators — assigned to the tractor or the implement may hitch and unhitch; not correct; others 403', async () => {
    const f = await farm();
    const { user: driver } = await createMember(f.org, 'operator');
    const { user: stranger } = await createMember(f.org, 'operator');
    await MachineOperator.create({
      organizationId: f.org.id,
      machineId: f.tractor.id,
      userId: driver.id,
    });
    const asDriver = await signedInAgent(app, driver);
    const asStranger = await signedInAgent(app, stranger);
    const body = { implementId: f.mower.id, tractorId: f.front.id };
    // the stranger sees both (nobody is assigned to them) but is assigned to neither
    expect((await f.hitch(body, asStranger)).status).toBe(403);
    expect((await f.hitch(body, asDriver)).status).toBe(403); // assigned to T-02, not T-03
    const made = await f.hitch({ implementId: f.mower.id, tractorId: f.tractor.id }, asDriver);
    expect(made.status).toBe(201);
    const spanUrl = f.url(`/hitch-spans/${made.body.data.id}`);
    expect((await asDriver.patch(spanUrl).send({ note: 'rear' })).status).toBe(403);
    expect((await asDriver.delete(spanUrl)).status).toBe(403);
    expect((await asDriver.post(`${spanUrl}/end`).send({})).status).toBe(200);
  });

  it('technician — hitches and corrects (a PATCH changes only the fields sent); deleting removes the span', async () => {
    const f = await farm();
    const { user: tech } = await createMember(f.org, 'technician');
    const asTech = await signedInAgent(app, tech);
    const made = await f.hitch(
      { implementId: f.mower.id, tractorId: f.tractor.id, startedAt: hoursAgo(5), note: 'rear' },
      asTech,
    );
    expect(made.status).toBe(201);
    const spanUrl = f.url(`/hitch-spans/${made.body.data.id}`);
    const moved = await asTech.patch(spanUrl).send({ tractorId: f.front.id });
    expect(moved.status).toBe(200);
    expect(moved.body.data).toMatchObject({
      tractor: { fleetNumber: 'T-03' },
      note: 'rear',
      startedAt: made.body.data.startedAt,
      endedAt: null,
    });
    expect(
      (await asTech.patch(spanUrl).send({ endedAt: hoursAgo(6) })).body.error.fields.endedAt,
    ).toMatch(/after/);
    // a past span stays correctable after its tractor is reclassed: only what is sent is checked
    await f.front.update({ category: 'loader' });
    const noted = await asTech.patch(spanUrl).send({ note: 'rear, PTO shaft guard checked' });
    expect(noted.status, JSON.stringify(noted.body)).toBe(200);
    expect(noted.body.data.note).toBe('rear, PTO shaft guard checked');
    expect((await asTech.patch(spanUrl).send({ tractorId: f.front.id })).status).toBe(400);
    expect((await asTech.delete(spanUrl)).status).toBe(204);
    expect(await countRows('hitch_spans')).toBe(0);
  });

  it('dealer — reads the log through a view link; may not hitch (404: the write is not a dealer route)', async () => {
    const f = await farm();
    const dealer = await createOrganization({ kind: 'dealer' });
    const { user: advisor } = await createMember(dealer, 'advisor');
    await linkDealer(dealer, f.org, 'view');
    const asAdvisor = await signedInAgent(app, advisor);
    await addReadings(f.tractor, [{ daysAgo: 1, value: 100 }]);
    expect((await f.hitch({ implementId: f.mower.id, tractorId: f.tractor.id })).status).toBe(201);
    const log = await asAdvisor.get(f.url(`/machines/${f.mower.id}/hitch-spans`));
    expect(log.status).toBe(200);
    expect(log.body.data.abilities).toEqual({ start: false, correct: false });
    expect(
      (await f.hitch({ implementId: f.rake.id, tractorId: f.tractor.id }, asAdvisor)).status,
    ).toBe(404);
  });
});
