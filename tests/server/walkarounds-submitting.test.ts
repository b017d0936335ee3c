import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { countRows, resetDatabase } from '../support/db';
import { createMachine, signedInAgent } from '../support/factories';
import { Defect, Machine, MeterReading } from '../../server/models';
import { answers, app, hoursAgo, submission, tractorItems, yard } from './walkarounds-fixture';

const TAGGED_OUT = 'T-01 is tagged out: do not use it until a technician or manager clears it';

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
});
