import { beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import { Defect, Machine } from '../../server/models';
import { completed, shop } from './service-records-fixture';

describe('service records — plans, history, measurements, shop week', () => {
  beforeEach(resetDatabase);

  it('service record — completing it closes the defects it names; the tagged-out machine stays tagged out until someone returns it to service', async () => {
    const s = await shop();
    await Machine.update({ status: 'tagged_out' }, { where: { id: s.machine.id } });
    const defect = await Defect.create({
      organizationId: s.org.id,
      machineId: s.machine.id,
      title: 'PTO master shield: fail',
      severity: 'critical',
      walkaroundId: null,
      itemId: 'pto-master-shield',
      photoId: null,
      reportedBy: s.op.id,
      assignedTo: null,
      fixedAt: null,
      fixedBy: null,
      fixedByRecordId: null,
    });
    const res = await s.agent
      .post(s.records)
      .send(completed({ closesDefectIds: [defect.id], notes: 'New master shield fitted' }));
    expect(res.status).toBe(201);
    await defect.reload();
    expect([defect.status, defect.fixedByRecordId]).toEqual(['fixed', res.body.data.id]);
    expect((await Machine.findByPk(s.machine.id))!.status).toBe('tagged_out');
  });
});
