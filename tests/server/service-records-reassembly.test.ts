import { beforeEach, describe, expect, it } from 'vitest';
import { countRows, resetDatabase } from '../support/db';
import { ServiceTask } from '../../server/models';
import { addDaysIso } from '../../shared/domain';
import { completed, shop, today } from './service-records-fixture';

describe('service records — reassembly settings', () => {
  beforeEach(resetDatabase);

  const settings = [
    { what: 'Shim pack under the rear bearing cap', value: '0.40 mm', restored: true },
    { what: 'LH adjuster', value: '3½ turns out', restored: false },
    { what: 'Final drive cap bolts', value: 'torque 120 N·m', restored: true },
  ];

  it('reassembly — completion is refused (422 naming the setting) while one is unticked; nothing written', async () => {
    const s = await shop();
    const res = await s.agent
      .post(s.records)
      .send(completed({ taskIds: [s.oil.id], reassemblySettings: settings }));
    expect(res.status).toBe(422);
    expect(res.body.error.fields['reassemblySettings.1.restored']).toMatch(
      /"LH adjuster: 3½ turns out" is not ticked as restored/,
    );
    expect(res.body.error.message).toMatch(/LH adjuster: 3½ turns out/);
    expect(await countRows('service_records')).toBe(0);
    expect(await countRows('meter_readings')).toBe(3);
    expect((await ServiceTask.findByPk(s.oil.id))!.lastDoneMeter).toBe(1000);
  });

  it('reassembly — with the reason given the record completes and keeps the reason', async () => {
    const s = await shop();
    const res = await s.agent.post(s.records).send(
      completed({
        taskIds: [s.oil.id],
        reassemblySettings: settings,
        unrestoredReason: 'LH adjuster left for the dealer to set after the new lining beds in',
      }),
    );
    expect(res.status).toBe(201);
    expect(res.body.data.reassemblySettings).toEqual(settings);
    expect(res.body.data.unrestoredReason).toMatch(/dealer/);
  });

  it('reassembly — a plan cannot be completed until the setting is ticked; ticking it lets it complete', async () => {
    const s = await shop();
    const plan = await s.agent.post(s.records).send({
      status: 'planned',
      plannedFor: addDaysIso(today(), 1),
      taskIds: [s.oil.id],
      reassemblySettings: settings,
    });
    expect(plan.status).toBe(201);
    const url = `${s.base}/service-records/${plan.body.data.id}`;
    const refused = await s.agent
      .post(`${url}/complete`)
      .send({ performedOn: today(), meterValue: 1200 });
    expect(refused.status).toBe(422);
    expect(Object.keys(refused.body.error.fields)).toEqual(['reassemblySettings.1.restored']);
    const ticked = settings.map((x) => ({ ...x, restored: true }));
    const done = await s.agent
      .post(`${url}/complete`)
      .send({ performedOn: today(), meterValue: 1200, reassemblySettings: ticked });
    expect(done.status).toBe(200);
    expect(done.body.data.status).toBe('completed');
    // a completed record may not lose a tick without a reason either
    const untick = await s.agent.patch(url).send({ reassemblySettings: settings });
    expect(untick.status).toBe(422);
  });
});
