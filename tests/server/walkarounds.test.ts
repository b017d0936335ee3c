import { randomUUID } from 'node:crypto';
import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import sharp from 'sharp';
import QRCode from 'qrcode';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { Defect, Machine, MachineOperator, MeterReading, Walkaround } from '../../server/models';
import { defaultChecklist } from '../../server/services/checklist-defaults';

const app = createApp();
const DEFER = "Follow the operator's manual, local regulations and qualified service practice.";
const TAGGED_OUT = 'T-01 is tagged out: do not use it until a technician or manager clears it';

const png = () =>
  sharp({ create: { width: 400, height: 300, channels: 3, background: { r: 120, g: 30, b: 30 } } })
    .jpeg()
    .toBuffer();

/** A farm with an operator assigned to T-01 (a tractor with readings up to 2,000 h). */
async function yard() {
  const org = await createOrganization({ timeZone: 'America/Chicago' });
  const { user: op } = await createMember(org, 'operator');
  const { user: tech } = await createMember(org, 'technician');
  const { user: manager } = await createMember(org, 'manager');
  const machine = await createMachine(org, { fleetNumber: 'T-01', category: 'tractor' });
  await MachineOperator.create({ organizationId: org.id, machineId: machine.id, userId: op.id });
  await addReadings(machine, [
    { daysAgo: 10, value: 1950 },
    { daysAgo: 1, value: 2000 },
  ]);
  const base = `/api/v1/organizations/${org.id}`;
  return {
    org,
    op,
    tech,
    manager,
    machine,
    base,
    opAgent: await signedInAgent(app, op),
    checklistUrl: `${base}/machines/${machine.id}/checklist`,
  };
}

const tractorItems = defaultChecklist('tractor').items;

/** Answers for every item of the built-in tractor list: ok unless named. */
function answers(
  overrides: Record<string, { result: string; note?: string; photoId?: string }> = {},
) {
  return tractorItems.map((i) => ({ itemId: i.id, ...(overrides[i.id] ?? { result: 'ok' }) }));
}

const hoursAgo = (h: number) => new Date(Date.now() - h * 3600_000).toISOString();

const submission = (machineId: string, extra: Record<string, unknown> = {}) => ({
  machineId,
  clientId: randomUUID(),
  meterValue: 2004.5,
  items: answers(),
  ...extra,
});

describe('walkarounds — checklist', () => {
  beforeEach(resetDatabase);

  it('checklist — the built-in tractor list follows the published daily items (CHECKS.md §5) with cautions (§6)', async () => {
    const y = await yard();
    expect((await request(app).get(y.checklistUrl)).status).toBe(401);
    const res = await y.opAgent.get(y.checklistUrl);
    expect(res.status).toBe(200);
    const { template, items, machine } = res.body.data;
    expect(machine).toMatchObject({
      fleetNumber: 'T-01',
      status: 'in_service',
      lastReading: { value: 2000 },
    });
    expect(template).toMatchObject({ id: null, source: 'built_in' });
    // Michigan State University EHS, "Tractor Daily Inspection Checklist"; OSHA 29 CFR 1928.57 and 1928.51
    expect(template.description).toMatch(
      /Michigan State University EHS, "Tractor Daily Inspection Checklist"/,
    );
    expect(template.description).toMatch(/OSHA 29 CFR 1928\.57/);
    expect(template.description).toMatch(/1928\.51/);
    const labels = items.map((i: { label: string }) => i.label);
    for (const published of [
      'Engine oil level',
      'Coolant level',
      'Fuel level',
      'Hydraulic oil level',
      'Leaks under the machine',
      'Cuts in treads and sidewalls',
      'Wheel nuts',
      'Battery hold-down and connections',
      'Cracked or broken parts',
      'All shields and guards in place',
      'PTO master shield in place',
      'Loose or missing bolts',
      'Slow-moving-vehicle emblem',
      'Steps and platform clean',
      'Rollover protective structure and seatbelt',
      'Oil pressure after start',
      'Lights and flashers',
    ])
      expect(labels).toContain(published);
    const byId = Object.fromEntries(items.map((i: { id: string }) => [i.id, i]));
    // the cautions are the one hazard table's (shared/domain/hazards.ts), label first
    expect(byId['pto-master-shield']).toMatchObject({ critical: true, hazards: ['pto'] });
    expect(byId['pto-master-shield'].caution).toMatch(
      /^PTO shaft: Stop the engine, take the key and wait for the shaft to stop/,
    );
    expect(byId['pto-master-shield'].caution).toMatch(/540 rpm shaft turns 9 times a second/);
    expect(byId['hoses'].caution).toMatch(/piece of cardboard, never your hands/);
    expect(byId['hitch']).toMatchObject({ hazards: ['raised_load', 'hitching_crush'] });
    expect(byId['hitch'].caution).toMatch(/block them on their mechanical lock or on stands/);
    expect(byId['hitch'].caution).toMatch(/Never stand between tractor and implement/);
    expect(byId['belts'].caution).toMatch(/snap rings/);
    expect(byId['engine-oil'].caution).toMatch(/^Hot fluids: Drain oil warm, not hot/);
    for (const i of items.filter((x: { hazards: string[] }) => x.hazards.length))
      expect(i.caution.endsWith(DEFER)).toBe(true);
    expect(res.body.data.criticalNote).toMatch(/tags the machine out/);
  });

  it('checklist — an operator cannot see a machine they are not assigned to (404, not_assigned with its fleet number) nor edit schedules (403)', async () => {
    const y = await yard();
    const other = await createMachine(y.org, { fleetNumber: 'T-02' });
    const { user: someone } = await createMember(y.org, 'operator');
    await MachineOperator.create({
      organizationId: y.org.id,
      machineId: other.id,
      userId: someone.id,
    });
    const task = await createTask(y.machine);
    const refused = await y.opAgent.get(`${y.base}/machines/${other.id}/checklist`);
    expect(refused.status).toBe(404);
    // the scanned label's machine is the farm's own: the operator is told it is someone else's
    expect(refused.body.error).toEqual({
      code: 'not_assigned',
      message: 'T-02 is not assigned to you: it is assigned to other operators',
    });
    // an id of no machine of this farm stays a plain 404
    const unknown = await y.opAgent.get(
      `${y.base}/machines/00000000-0000-4000-8000-000000000000/checklist`,
    );
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe('not_found');
    expect((await y.opAgent.post(`${y.base}/walkarounds`).send(submission(other.id))).status).toBe(
      404,
    );
    expect((await y.opAgent.get(`${y.base}/machines/${other.id}`)).status).toBe(404);
    const edit = await y.opAgent.patch(`${y.base}/tasks/${task.id}`).send({ intervalMeter: 300 });
    expect(edit.status).toBe(403);
    const add = await y.opAgent
      .post(`${y.base}/machines/${y.machine.id}/tasks`)
      .send({ name: 'Grease', intervalMeter: 10 });
    expect(add.status).toBe(403);
    expect(await countRows('walkarounds')).toBe(0);
  });

  it('checklist templates — the manager writes one per category; it replaces the built-in list; others may not (403)', async () => {
    const y = await yard();
    const url = `${y.base}/checklist-templates`;
    const managerAgent = await signedInAgent(app, y.manager);
    const body = {
      category: 'tractor',
      name: 'Our tractor check',
      items: [
        { label: 'Engine oil level' },
        { label: 'PTO master shield', critical: true, hazards: ['pto'] },
        { id: 'horn', label: 'Horn works' },
      ],
    };
    expect((await y.opAgent.post(url).send(body)).status).toBe(403);
    const bad = await managerAgent.post(url).send({ ...body, items: [{ label: '' }] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['items.0.label']).toBe('Enter what to check');
    const created = await managerAgent.post(url).send(body);
    expect(created.status).toBe(201);
    expect(created.body.data.items.map((i: { id: string }) => i.id)).toEqual([
      'engine-oil-level',
      'pto-master-shield',
      'horn',
    ]);
    expect(created.body.data.items[1].caution).toMatch(/^PTO shaft: Stop the engine/);
    const twice = await managerAgent.post(url).send(body);
    expect(twice.status).toBe(422);
    expect(twice.body.error.fields.category).toMatch(/has a tractor checklist already/);
    const list = await y.opAgent.get(y.checklistUrl);
    expect(list.body.data.template).toMatchObject({ source: 'farm', name: 'Our tractor check' });
    expect(list.body.data.items).toHaveLength(3);
    const tUrl = `${url}/${created.body.data.id}`;
    const patched = await managerAgent
      .patch(tUrl)
      .send({ items: [{ label: 'Horn works', id: 'horn' }] });
    expect(patched.status).toBe(200);
    expect(patched.body.data.items).toHaveLength(1);
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    const strangerAgent = await signedInAgent(app, stranger);
    expect((await strangerAgent.get(tUrl)).status).toBe(404);
    expect((await strangerAgent.delete(tUrl)).status).toBe(404);
    expect((await managerAgent.delete(tUrl)).status).toBe(204);
    expect((await y.opAgent.get(y.checklistUrl)).body.data.template.source).toBe('built_in');
  });
});

describe('walkarounds — submitting', () => {
  beforeEach(resetDatabase);

  it('walkaround — all ok: 201 with the presented shape; the hour meter becomes a walkaround reading', async () => {
    const y = await yard();
    expect((await request(app).post(`${y.base}/walkarounds`).send({})).status).toBe(401);
    const res = await y.opAgent.post(`${y.base}/walkarounds`).send(submission(y.machine.id));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      taggedOut: false,
      message: null,
      duplicate: false,
      defects: [],
      machine: { fleetNumber: 'T-01', status: 'in_service' },
      data: {
        result: 'ok',
        purpose: 'use',
        meterValue: 2004.5,
        operator: { id: y.op.id },
        counts: { ok: tractorItems.length, attention: 0, fail: 0 },
      },
    });
    const reading = (await MeterReading.findOne({ where: { source: 'walkaround' } }))!;
    expect(reading.value).toBe(2004.5);
    expect(res.body.data.readingId).toBe(reading.id);
  });

  it('walkaround — a re-sent submission (same clientId) answers 200 with the first one; nothing is doubled', async () => {
    const y = await yard();
    const body = submission(y.machine.id, {
      items: answers({ 'pto-master-shield': { result: 'fail', note: 'Shield cracked' } }),
    });
    const first = await y.opAgent.post(`${y.base}/walkarounds`).send(body);
    expect(first.status).toBe(201);
    // the machine is tagged out now, yet the re-sent form is recognised, not refused
    const again = await y.opAgent.post(`${y.base}/walkarounds`).send(body);
    expect(again.status).toBe(200);
    expect(again.body.duplicate).toBe(true);
    expect(again.body.data.id).toBe(first.body.data.id);
    expect(again.body.defects.map((d: { id: string }) => d.id)).toEqual(
      first.body.defects.map((d: { id: string }) => d.id),
    );
    expect(await countRows('walkarounds')).toBe(1);
    expect(await countRows('defects')).toBe(1);
    expect(await MeterReading.count({ where: { source: 'walkaround' } })).toBe(1);
    const otherMachine = await createMachine(y.org, { fleetNumber: 'T-05' });
    const reused = await y.opAgent
      .post(`${y.base}/walkarounds`)
      .send({ ...body, machineId: otherMachine.id });
    expect(reused.status).toBe(409);
    expect(reused.body.error.fields.clientId).toMatch(/another walkaround/);
  });

  it('walkaround — a critical fail raises a critical defect and tags the machine out; the operator cannot start a walkaround for use on it', async () => {
    const y = await yard();
    const res = await y.opAgent.post(`${y.base}/walkarounds`).send(
      submission(y.machine.id, {
        performedAt: hoursAgo(8),
        items: answers({
          'wheel-nuts': { result: 'fail', note: 'Two nuts missing on the left front' },
        }),
      }),
    );
    expect(res.status).toBe(201);
    expect(res.body.taggedOut).toBe(true);
    expect(res.body.message).toBe(TAGGED_OUT);
    expect(res.body.data).toMatchObject({ result: 'fail', taggedOut: true });
    expect(res.body.defects).toHaveLength(1);
    expect(res.body.defects[0]).toMatchObject({
      severity: 'critical',
      status: 'open',
      title: 'Wheel nuts: fail',
      description: 'Two nuts missing on the left front',
      itemId: 'wheel-nuts',
      reportedBy: { id: y.op.id },
    });
    expect((await Machine.findByPk(y.machine.id))!.status).toBe('tagged_out');

    const start = await y.opAgent.get(y.checklistUrl);
    expect(start.status).toBe(409);
    expect(start.body.error).toMatchObject({ code: 'tagged_out', message: TAGGED_OUT });
    const use = await y.opAgent
      .post(`${y.base}/walkarounds`)
      .send(submission(y.machine.id, { meterValue: 2005 }));
    expect(use.status).toBe(409);
    expect(use.body.error.message).toBe(TAGGED_OUT);
    expect(await countRows('walkarounds')).toBe(1);
    // the operator may not record a shop inspection instead; a technician may
    const inspect = await y.opAgent
      .post(`${y.base}/walkarounds`)
      .send(submission(y.machine.id, { purpose: 'inspection', meterValue: 2005 }));
    expect(inspect.status).toBe(403);
    const techAgent = await signedInAgent(app, y.tech);
    expect((await techAgent.get(`${y.checklistUrl}?purpose=inspection`)).status).toBe(200);
    const shopCheck = await techAgent
      .post(`${y.base}/walkarounds`)
      .send(submission(y.machine.id, { purpose: 'inspection', meterValue: 2005 }));
    expect(shopCheck.status).toBe(201);
    expect(shopCheck.body.taggedOut).toBe(true);
  });

  it('walkaround — other fails and attentions raise defects without tagging out; a repeat adds to the open defect', async () => {
    const y = await yard();
    const first = await y.opAgent.post(`${y.base}/walkarounds`).send(
      submission(y.machine.id, {
        performedAt: hoursAgo(8),
        items: answers({
          'smv-emblem': { result: 'fail', note: 'Faded' },
          'tyre-damage': { result: 'attention', note: 'Cut in the right rear sidewall' },
        }),
      }),
    );
    expect(first.status).toBe(201);
    expect(first.body.taggedOut).toBe(false);
    const raised = first.body.defects
      .map((d: { severity: string; title: string }) => [d.title, d.severity])
      .sort();
    expect(raised).toEqual([
      ['Cuts in treads and sidewalls: needs attention', 'minor'],
      ['Slow-moving-vehicle emblem: fail', 'major'],
    ]);
    expect((await Machine.findByPk(y.machine.id))!.status).toBe('in_service');
    const second = await y.opAgent.post(`${y.base}/walkarounds`).send(
      submission(y.machine.id, {
        meterValue: 2010,
        items: answers({ 'tyre-damage': { result: 'fail', note: 'Cut is deeper' } }),
      }),
    );
    expect(second.status).toBe(201);
    expect(await countRows('defects')).toBe(2);
    const tyre = (await Defect.findOne({ where: { itemId: 'tyre-damage' } }))!;
    expect([tyre.reportCount, tyre.severity]).toEqual([2, 'major']);
    expect(tyre.description).toBe('Cut in the right rear sidewall\nCut is deeper');
  });

  it('walkaround — bad input names the field and writes nothing: a missing item, an unknown item, a backwards meter', async () => {
    const y = await yard();
    const url = `${y.base}/walkarounds`;
    const missing = await y.opAgent
      .post(url)
      .send(submission(y.machine.id, { items: answers().filter((a) => a.itemId !== 'lights') }));
    expect(missing.status).toBe(422);
    expect(missing.body.error.fields.items).toBe(
      'Answer every item: "Lights and flashers" is missing',
    );
    const unknown = await y.opAgent
      .post(url)
      .send(submission(y.machine.id, { items: [...answers(), { itemId: 'wings', result: 'ok' }] }));
    expect(unknown.status).toBe(422);
    expect(unknown.body.error.fields[`items.${tractorItems.length}.itemId`]).toMatch(
      /No item "wings"/,
    );
    const backwards = await y.opAgent
      .post(url)
      .send(submission(y.machine.id, { meterValue: 1990 }));
    expect(backwards.status).toBe(422);
    expect(backwards.body.error.fields.meterValue).toMatch(
      /lower than the previous reading of 2,000 h/,
    );
    const shape = await y.opAgent
      .post(url)
      .send({ machineId: y.machine.id, clientId: 'abc', meterValue: 'x', items: [] });
    expect(shape.status).toBe(400);
    expect(Object.keys(shape.body.error.fields).sort()).toEqual([
      'clientId',
      'items',
      'meterValue',
    ]);
    expect(await countRows('walkarounds')).toBe(0);
    expect(await countRows('defects')).toBe(0);
    expect(await MeterReading.count({ where: { source: 'walkaround' } })).toBe(0);
  });

  it('walkaround photos — uploaded first, attached to an item, served only to people who may see the machine', async () => {
    const y = await yard();
    const photoUrl = `${y.base}/machines/${y.machine.id}/walkaround-photos`;
    const wrong = await y.opAgent
      .post(photoUrl)
      .attach('photo', Buffer.from('not a photo'), 'x.jpg');
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.fields.photo).toMatch(/not an image/);
    const up = await y.opAgent.post(photoUrl).attach('photo', await png(), 'shield.jpg');
    expect(up.status).toBe(201);
    const photoId = up.body.data.id;
    const res = await y.opAgent.post(`${y.base}/walkarounds`).send(
      submission(y.machine.id, {
        performedAt: hoursAgo(8),
        items: answers({ shields: { result: 'fail', note: 'Rear guard bent', photoId } }),
      }),
    );
    expect(res.status).toBe(201);
    const item = res.body.data.items.find((i: { itemId: string }) => i.itemId === 'shields');
    expect(item).toMatchObject({ photoId, thumbnailUrl: `${up.body.data.photoUrl}?size=thumb` });
    expect(res.body.defects[0]).toMatchObject({
      severity: 'critical',
      photoUrl: up.body.data.photoUrl,
    });
    const got = await y.opAgent.get(up.body.data.thumbnailUrl);
    expect(got.status).toBe(200);
    expect(got.headers['content-type']).toBe('image/webp');
    // used once only
    const reuse = await y.opAgent.post(`${y.base}/walkarounds`).send(
      submission(y.machine.id, {
        purpose: 'inspection',
        items: answers({ shields: { result: 'fail', photoId } }),
      }),
    );
    expect(reuse.status).toBe(403);
    const techAgent = await signedInAgent(app, y.tech);
    const reused = await techAgent.post(`${y.base}/walkarounds`).send(
      submission(y.machine.id, {
        purpose: 'inspection',
        meterValue: 2006,
        items: answers({ shields: { result: 'fail', photoId } }),
      }),
    );
    expect(reused.status).toBe(422);
    expect(Object.values(reused.body.error.fields)).toContain(
      'This photo belongs to another walkaround',
    );
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    const strangerAgent = await signedInAgent(app, stranger);
    expect((await strangerAgent.get(up.body.data.photoUrl)).status).toBe(404);
    expect((await strangerAgent.post(photoUrl).attach('photo', await png(), 'a.jpg')).status).toBe(
      404,
    );
  });

  it('walkarounds — history newest first; operators see only the machines they may see; another farm 404', async () => {
    const y = await yard();
    await y.opAgent.post(`${y.base}/walkarounds`).send(submission(y.machine.id));
    const hidden = await createMachine(y.org, { fleetNumber: 'T-09' });
    const { user: someone } = await createMember(y.org, 'operator');
    await MachineOperator.create({
      organizationId: y.org.id,
      machineId: hidden.id,
      userId: someone.id,
    });
    await addReadings(hidden, [{ daysAgo: 3, value: 10 }]);
    const theirs = await signedInAgent(app, someone);
    const items = tractorItems.map((i) => ({ itemId: i.id, result: 'ok' }));
    expect(
      (
        await theirs
          .post(`${y.base}/walkarounds`)
          .send({ ...submission(hidden.id), meterValue: 12, items })
      ).status,
    ).toBe(201);
    const mine = await y.opAgent.get(`${y.base}/walkarounds`);
    expect(
      mine.body.data.map((w: { machine: { fleetNumber: string } }) => w.machine.fleetNumber),
    ).toEqual(['T-01']);
    const managerAgent = await signedInAgent(app, y.manager);
    const all = await managerAgent.get(`${y.base}/walkarounds`);
    expect(all.body.meta.total).toBe(2);
    const one = await managerAgent.get(`${y.base}/walkarounds/${mine.body.data[0].id}`);
    expect(one.status).toBe(200);
    expect(await Walkaround.count()).toBe(2);
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    const strangerAgent = await signedInAgent(app, stranger);
    expect((await strangerAgent.get(`${y.base}/walkarounds/${mine.body.data[0].id}`)).status).toBe(
      404,
    );
  });
});

describe('walkarounds — machine label', () => {
  beforeEach(resetDatabase);

  it('label.svg — a QR code of APP_URL/o/:orgId/walkaround/:machineId with the fleet number; another farm 404', async () => {
    const y = await yard();
    const url = `${y.base}/machines/${y.machine.id}/label.svg`;
    expect((await request(app).get(url)).status).toBe(401);
    const res = await y.opAgent
      .get(url)
      .buffer(true)
      .parse((r, cb) => {
        let text = '';
        r.on('data', (c: Buffer) => (text += c.toString()));
        r.on('end', () => cb(null, text));
      });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
    const svg = res.body as string;
    expect(svg).toContain('>T-01</text>');
    const target = `${process.env.APP_URL ?? 'http://127.0.0.1:4310'}/o/${y.org.id}/walkaround/${y.machine.id}`;
    const expected = await QRCode.toString(target, {
      type: 'svg',
      errorCorrectionLevel: 'M',
      margin: 0,
    });
    const modules = expected.match(/<path stroke="#000000" d="([^"]+)"/)![1];
    expect(svg).toContain(modules);
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    expect((await (await signedInAgent(app, stranger)).get(url)).status).toBe(404);
  });
});
