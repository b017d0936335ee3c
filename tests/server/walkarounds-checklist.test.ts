import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { countRows, resetDatabase } from '../support/db';
import {
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { ChecklistTemplate, MachineOperator } from '../../server/models';
import { app, submission, yard } from './walkarounds-fixture';

const DEFER = "Follow the operator's manual, local regulations and qualified service practice.";

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
    // walked round first (engine off, key out), then from the seat: the published "oil pressure
    // after start" and "lights" need the engine running; brakes and steering are common practice
    const phases = items.map((i: { phase: string }) => i.phase);
    const seat = phases.indexOf('running');
    expect(phases.slice(0, seat).every((p: string) => p === 'before_start')).toBe(true);
    expect(phases.slice(seat).every((p: string) => p === 'running')).toBe(true);
    for (const id of [
      'oil-pressure',
      'lights',
      'brakes',
      'parking-brake',
      'brake-pedal-latch',
      'steering',
    ])
      expect(byId[id].phase).toBe('running');
    expect(byId['engine-oil'].phase).toBe('before_start');
    // T-01 has no class: the loader tractor's items stay out
    expect(byId['loader-lowered']).toBeUndefined();
  });

  it("checklist — a machine's class adds its items: a loader tractor's loader, on the built-in list and on the farm's", async () => {
    const y = await yard();
    await y.machine.update({ machineClass: 'utility_loader_tractor' });
    const res = await y.opAgent.get(y.checklistUrl);
    const ids = res.body.data.items.map((i: { id: string }) => i.id);
    expect(ids[0]).toBe('loader-lowered');
    expect(ids).toEqual(expect.arrayContaining(['loader-pins', 'loader-hoses', 'tool-lock']));
    // the editor's built-in list holds every class's items, each saying its class
    const managerAgent = await signedInAgent(app, y.manager);
    const builtIn = await managerAgent.get(`${y.base}/checklist-templates/built-in/tractor`);
    const toolLock = builtIn.body.data.items.find((i: { id: string }) => i.id === 'tool-lock');
    expect(toolLock).toMatchObject({ classes: ['utility_loader_tractor'], phase: 'before_start' });
    // the farm's own list: phase and classes kept; an item for another class is left out
    const created = await managerAgent.post(`${y.base}/checklist-templates`).send({
      category: 'tractor',
      name: 'Our tractor check',
      items: [
        { label: 'Engine oil level' },
        { label: 'Loader pins', classes: ['utility_loader_tractor'] },
        { label: 'Front weights', classes: ['row_crop_tractor'] },
        { label: 'Steering free play', phase: 'running', critical: true },
      ],
    });
    expect(created.status).toBe(201);
    expect(created.body.data.items[3]).toMatchObject({ phase: 'running', classes: [] });
    const walked = (await y.opAgent.get(y.checklistUrl)).body.data.items;
    expect(walked.map((i: { id: string }) => i.id)).toEqual([
      'engine-oil-level',
      'loader-pins',
      'steering-free-play',
    ]);
    const bad = await managerAgent
      .patch(`${y.base}/checklist-templates/${created.body.data.id}`)
      .send({
        items: [
          { label: 'Brakes', phase: 'moving' },
          { label: 'Pins', classes: ['crane'] },
        ],
      });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['items.0.phase']).toBe(
      'Phase must be one of: before_start, running',
    );
    expect(bad.body.error.fields['items.1.classes.0']).toMatch(
      /^Classes must be among: row_crop_tractor/,
    );
  });

  it('checklist — an item stored before phases (no phase, no classes) is walked before start', async () => {
    const y = await yard();
    await ChecklistTemplate.create({
      organizationId: y.org.id,
      category: 'tractor',
      name: 'Old list',
      items: [
        {
          id: 'horn',
          label: 'Horn works',
          guidance: '',
          critical: false,
          hazards: [],
          caution: '',
        },
      ],
    });
    const res = await y.opAgent.get(y.checklistUrl);
    expect(res.body.data.items).toEqual([
      expect.objectContaining({ id: 'horn', phase: 'before_start', classes: [] }),
    ]);
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
