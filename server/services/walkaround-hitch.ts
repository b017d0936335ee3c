// What is hitched, said in a walkaround (issue 13) and recorded at the walkaround's own time, in
// its transaction and after its reading: a span opened there starts on the tractor's reading of
// that walkaround, so the implement counts the tractor's hours from that figure on, none of what
// ran before it went on; a span closed there ends on it. Locks: tractors before implements, as
// every hitch-log write takes them (hitch-spans.ts).
import type { Transaction } from 'sequelize';
import { AppError } from '../errors';
import type { Machine } from '../models';
import { HitchSpan } from '../models/hitch-span';
import type { OrgAccess } from '../policies/context';
import { HITCH_IMPLEMENT_CATEGORIES, type WalkaroundHitchInput } from '../../shared/schemas/hitch';
import { recomputeImplements } from './hitch-readings';
import { closeSpanLocked, openSpanLocked, whoOf } from './hitch-spans';
import { badField } from './hitch-span-checks';
import { loadMachine } from './machine-load';
import { lockMachinesReadings } from './reading-neighbours';

const isImplement = (m: Machine) =>
  (HITCH_IMPLEMENT_CATEGORIES as readonly string[]).includes(m.category);

const openSpans = (machine: Machine, side: 'tractorId' | 'implementId', transaction: Transaction) =>
  HitchSpan.findAll({
    where: { organizationId: machine.organizationId, [side]: machine.id, endedAt: null },
    order: [['startedAt', 'ASC']],
    transaction,
    lock: transaction.LOCK.UPDATE,
  });

/**
 * On an implement's walkaround with a hitch, the tractors it comes off and goes on, locked before
 * the implement itself is (call first in the walkaround's transaction).
 */
export async function lockHitchTractors(
  machine: Machine,
  hitch: WalkaroundHitchInput | undefined,
  transaction: Transaction,
) {
  if (!hitch || !isImplement(machine)) return;
  const open = await openSpans(machine, 'implementId', transaction);
  const ids = [...open.map((s) => s.tractorId), ...(hitch.machineId ? [hitch.machineId] : [])];
  await lockMachinesReadings([...new Set(ids)].sort(), transaction);
}

/** A refusal of the hitch as the walkaround's: the same status, the words on the field `hitch`. */
function asHitchField(err: unknown): never {
  if (err instanceof AppError) {
    const words = err.fields ? Object.values(err.fields)[0] : err.message;
    throw new AppError(err.status, err.code, `hitch: ${words}`, { hitch: words });
  }
  throw err;
}

/**
 * Records what the walkaround says is hitched, at `at` (its performedAt, where its reading is):
 * on a tractor, the spans of implements no longer on it end and the one named starts; on an
 * implement, its span on another tractor ends and one on the tractor named starts. Nothing
 * changes for what stays. A refusal (an overlap, a pair that cannot be hitched) is the field's.
 */
export async function applyWalkaroundHitch(
  access: OrgAccess,
  machine: Machine,
  hitch: WalkaroundHitchInput,
  at: Date,
  transaction: Transaction,
) {
  const lock = (id: string) => loadMachine(access, id, transaction, { lock: true });
  try {
    const self = await lock(machine.id);
    const tractorSide = machine.category === 'tractor';
    if (!tractorSide && !isImplement(machine))
      throw badField('hitch', `${machine.fleetNumber} is neither a tractor nor an implement`);
    const open = await openSpans(machine, tractorSide ? 'tractorId' : 'implementId', transaction);
    const other = (s: HitchSpan) => (tractorSide ? s.implementId : s.tractorId);
    const touched = new Set<string>();
    for (const span of open.filter((s) => other(s) !== hitch.machineId)) {
      const partner = await lock(other(span));
      const [implement, tractor] = tractorSide ? [partner, self] : [self, partner];
      await closeSpanLocked(access, span, implement, tractor, at, transaction);
      touched.add(span.implementId);
    }
    if (hitch.machineId && !open.some((s) => other(s) === hitch.machineId)) {
      const partner = await lock(hitch.machineId);
      const [implement, tractor] = tractorSide ? [partner, self] : [self, partner];
      const fields = { meterKind: hitch.meterKind, note: '', startedAt: at, endedAt: null };
      await openSpanLocked(access, implement, tractor, fields, transaction);
      touched.add(implement.machine.id);
    }
    await recomputeImplements(whoOf(access), touched, transaction);
  } catch (err) {
    asHitchField(err);
  }
}
