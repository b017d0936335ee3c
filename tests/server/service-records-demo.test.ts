import { beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import { Defect, Machine, ServiceRecord, ServiceTask, TaskDuePoint } from '../../server/models';
import { loadDemo } from '../../server/seeders/demo';

describe('demo scenario — service history', () => {
  beforeEach(resetDatabase);

  it("demo — each task's latest completed record is its last-done point; statuses keep a few overdue and due soon", async () => {
    await loadDemo({ reset: true });
    const [tasks, records] = await Promise.all([
      ServiceTask.findAll(),
      ServiceRecord.findAll({ where: { status: 'completed' } }),
    ]);
    expect(records.length).toBeGreaterThan(50);
    const latest = new Map<string, { performedOn: string; meterLifetime: number }>();
    for (const r of records)
      for (const t of r.tasks) {
        const seen = latest.get(t.taskId);
        if (!seen || r.performedOn! > seen.performedOn)
          latest.set(t.taskId, { performedOn: r.performedOn!, meterLifetime: r.meterLifetime! });
      }
    expect(latest.size).toBeGreaterThan(40);
    for (const task of tasks) {
      const last = latest.get(task.id);
      if (!last) continue;
      expect([task.name, last.performedOn, last.meterLifetime]).toEqual([
        task.name,
        task.lastDoneOn,
        task.lastDoneMeter,
      ]);
    }
    const statuses = (await TaskDuePoint.findAll()).map((d) => d.status);
    const count = (s: string) => statuses.filter((x) => x === s).length;
    expect(count('overdue')).toBeGreaterThanOrEqual(3);
    expect(count('due_soon')).toBeGreaterThanOrEqual(3);
    expect(count('ok')).toBeGreaterThan(statuses.length / 2);
    const tagged = await Machine.findAll({ where: { status: 'tagged_out' } });
    expect(tagged.map((m) => m.fleetNumber)).toEqual(['T-03']);
    expect(
      await Defect.count({
        where: { machineId: tagged[0].id, severity: 'critical', status: 'open' },
      }),
    ).toBe(1);
  });
});
