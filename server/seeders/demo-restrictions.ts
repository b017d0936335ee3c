// The demo's restricted use: T-02's left rear flasher went out at today's walkaround (the defect
// is in repair), so the shop kept it to field work until the bulb is in — it may still be walked
// round and used, off the road. Set by the farm's shop person, a while after the finding, audited
// as the app would.
import type { Transaction } from 'sequelize';
import { AuditEvent, Machine } from '../models';
import type { DemoMachineWorld } from './demo-service-visits';

const RESTRICTIONS = [
  { fleetNumber: 'T-02', itemId: 'lights', reason: 'Field only — no road: left rear flasher out' },
];

/** The walkaround findings the restrictions follow: a machine, an item, when it was found. */
export interface Finding {
  machineId: string;
  itemId?: string | null;
  createdAt?: Date | null;
}

/** Restricts the machines whose scripted finding is there; returns how many. */
export async function writeRestrictions(
  machines: DemoMachineWorld[],
  findings: Finding[],
  transaction: Transaction,
) {
  let n = 0;
  for (const r of RESTRICTIONS)
    for (const m of machines.filter((x) => x.fleetNumber === r.fleetNumber)) {
      const found = findings
        .filter((f) => f.machineId === m.id && f.itemId === r.itemId && f.createdAt)
        .at(-1);
      if (!found?.createdAt) continue;
      const at = new Date(found.createdAt.getTime() + 20 * 60_000);
      await Machine.update(
        { restrictionReason: r.reason, restrictedAt: at, restrictedBy: m.shopPersonId },
        { where: { id: m.id }, transaction },
      );
      await AuditEvent.create(
        {
          organizationId: m.organizationId,
          actorUserId: m.shopPersonId,
          action: 'machine.restrict',
          entityType: 'machine',
          entityId: m.id,
          changes: { reason: r.reason, before: null },
          createdAt: at,
        },
        { transaction },
      );
      n += 1;
    }
  return n;
}
