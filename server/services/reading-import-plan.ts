// Second stage of a reading import: every row checked against its neighbours by the same rules as
// one reading (shared/domain checkReading), once, for the whole file. The rows are grouped by
// meter (a machine's primary unless the file names another) and sorted by time; each machine's existing readings in the file's time window (and the
// one either side) come in one query per batch of machines, and each row is checked in one pass
// with a pointer — not a search per row. Same outcome as planReadings (readings.ts) row for row:
// an identical repeat (same time, same value) is a duplicate; a row that breaks a rule is an error
// and does not count as a neighbour for later rows.
import { Op, QueryTypes, type Transaction } from 'sequelize';
import { checkReading, toLifetimeValue, type MeterReplacementPoint } from '../../shared/domain';
import { sequelize } from '../db';
import { MeterReplacement } from '../models';
import type { OrgAccess } from '../policies/access';
import { timeFormatter } from './reading-neighbours';
import { STATUS_DUPLICATE, STATUS_ERROR, STATUS_NEW } from './reading-import-rows';
import type { ParsedImport } from './reading-import-read';

// A batch of machines whose windows are read in one query: enough to make round trips rare, few
// enough that the readings it returns (about as many as its rows, for a resent file) stay small.
const BATCH_ROWS = 20_000;
const BATCH_MACHINES = 200;

/** Row indices of the checkable rows, grouped by machine, each group in time then file order. */
function groupByMachine({ rows, machines }: ParsedImport) {
  const starts = new Int32Array(machines.length + 1);
  for (let i = 0; i < rows.length; i++)
    if (rows.status[i] === STATUS_NEW) starts[rows.machine[i] + 1]++;
  for (let m = 0; m < machines.length; m++) starts[m + 1] += starts[m];
  const order = new Int32Array(starts[machines.length]);
  const fill = starts.slice(0, machines.length);
  for (let i = 0; i < rows.length; i++)
    if (rows.status[i] === STATUS_NEW) order[fill[rows.machine[i]]++] = i;
  const t = rows.takenAtMs;
  for (let m = 0; m < machines.length; m++)
    order.subarray(starts[m], starts[m + 1]).sort((a, b) => t[a] - t[b] || a - b);
  return { starts, order };
}

interface Existing {
  at: number;
  raw: number;
  lifetime: number;
}

/** Existing readings of each meter (window id) from the one before its window to the one after. */
async function existingAround(
  organizationId: string,
  windows: { id: string; from: number; to: number }[],
  transaction: Transaction,
) {
  const found = await sequelize.query<{ i: number; v: string; l: string; t: Date }>(
    `SELECT w.i, r.value AS v, r.lifetime_value AS l, r.taken_at AS t
     FROM unnest($2::uuid[], $3::timestamptz[], $4::timestamptz[]) WITH ORDINALITY AS w(id, from_at, to_at, i)
     CROSS JOIN LATERAL (
       SELECT value, lifetime_value, taken_at FROM meter_readings
       WHERE organization_id = $1 AND meter_id = w.id
         AND taken_at >= coalesce((SELECT max(taken_at) FROM meter_readings
                                   WHERE organization_id = $1 AND meter_id = w.id AND taken_at < w.from_at), '-infinity')
         AND taken_at <= coalesce((SELECT min(taken_at) FROM meter_readings
                                   WHERE organization_id = $1 AND meter_id = w.id AND taken_at > w.to_at), 'infinity')
     ) r
     ORDER BY w.i, r.taken_at, r.lifetime_value`,
    {
      bind: [
        organizationId,
        windows.map((w) => w.id),
        windows.map((w) => new Date(w.from).toISOString()),
        windows.map((w) => new Date(w.to).toISOString()),
      ],
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  const byWindow: Existing[][] = windows.map(() => []);
  for (const r of found)
    byWindow[Number(r.i) - 1].push({
      at: new Date(r.t).getTime(),
      raw: Number(r.v),
      lifetime: Number(r.l),
    });
  return byWindow;
}

/** The replacements and counter resets of each meter (by meter id). */
async function replacementsByMeter(
  organizationId: string,
  meterIds: string[],
  transaction: Transaction,
) {
  const rows = await MeterReplacement.findAll({
    where: { organizationId, meterId: { [Op.in]: meterIds } },
    transaction,
  });
  const by = new Map<string, MeterReplacementPoint[]>();
  for (const r of rows)
    by.set(r.meterId, [
      ...(by.get(r.meterId) ?? []),
      {
        replacedAtMs: r.replacedAt.getTime(),
        oldFinalValue: r.oldFinalValue,
        newStartValue: r.newStartValue,
      },
    ]);
  return by;
}

/**
 * Checks every readable row of the file in the caller's transaction and marks it new, duplicate or
 * error (with its message in `parsed.errors`); sets each new row's lifetime value. With `lock`, the
 * rows of the machines concerned are locked first (in id order, so two imports cannot deadlock),
 * as every writer of a machine's readings does.
 */
export async function planImport(
  access: OrgAccess,
  parsed: ParsedImport,
  transaction: Transaction,
  { lock, now = new Date() }: { lock: boolean; now?: Date },
) {
  const { rows, machines } = parsed;
  const orgId = access.organization.id;
  const { starts, order } = groupByMachine(parsed);
  const touched = machines
    .map((_, i) => i)
    .filter((m) => starts[m + 1] > starts[m])
    .sort((a, b) => (machines[a].id < machines[b].id ? -1 : 1));
  if (!touched.length) return;
  const ids = [...new Set(touched.map((m) => machines[m].id))];
  if (lock)
    await sequelize.query(
      'SELECT id FROM machines WHERE id = ANY($1::uuid[]) ORDER BY id FOR UPDATE',
      {
        bind: [ids],
        transaction,
      },
    );
  const meterIds = touched.map((m) => machines[m].meterId);
  const replacements = await replacementsByMeter(orgId, meterIds, transaction);
  const rule = { nowMs: now.getTime(), formatTime: timeFormatter(access.organization.timeZone) };

  for (let b = 0; b < touched.length;) {
    const batch: number[] = [];
    for (let n = 0; b < touched.length && batch.length < BATCH_MACHINES && n < BATCH_ROWS; b++) {
      batch.push(touched[b]);
      n += starts[touched[b] + 1] - starts[touched[b]];
    }
    const windows = batch.map((m) => ({
      id: machines[m].meterId,
      from: rows.takenAtMs[order[starts[m]]],
      to: rows.takenAtMs[order[starts[m + 1] - 1]],
    }));
    const existing = await existingAround(orgId, windows, transaction);
    batch.forEach((m, k) =>
      checkMachine(parsed, order.subarray(starts[m], starts[m + 1]), existing[k], {
        ...rule,
        meterUnit: machines[m].meterUnit,
        replacements: replacements.get(machines[m].meterId) ?? [],
      }),
    );
  }
}

/** One machine's rows (in time order) against its existing readings (in time, lifetime order). */
function checkMachine(
  { rows, errors }: ParsedImport,
  group: Int32Array,
  existing: Existing[],
  opts: {
    nowMs: number;
    meterUnit: string;
    formatTime: (ms: number) => string;
    replacements: MeterReplacementPoint[];
  },
) {
  let next = 0; // first existing reading after the row's time
  let accepted: Existing | null = null; // the latest new row accepted (by time, then lifetime)
  let sameTime: number[] = []; // raw values of the accepted rows at the current time
  let sameTimeAt = Number.NaN;
  for (const i of group) {
    const at = rows.takenAtMs[i];
    const raw = rows.value[i];
    while (next < existing.length && existing[next].at <= at) next++;
    if (at !== sameTimeAt) [sameTime, sameTimeAt] = [[], at];
    let repeat = sameTime.includes(raw);
    for (let k = next - 1; !repeat && k >= 0 && existing[k].at === at; k--)
      repeat = existing[k].raw === raw;
    if (repeat) {
      rows.status[i] = STATUS_DUPLICATE;
      continue;
    }
    const lifetime = toLifetimeValue(raw, at, opts.replacements);
    const before = next > 0 ? existing[next - 1] : null;
    // the later of the two in (time, lifetime) order; an accepted row wins a tie, as in planReadings
    const previous =
      accepted &&
      (!before ||
        accepted.at > before.at ||
        (accepted.at === before.at && accepted.lifetime >= before.lifetime))
        ? accepted
        : before;
    const after = next < existing.length ? existing[next] : null;
    const point = (r: Existing) => ({ value: r.lifetime, takenAtMs: r.at, raw: r.raw });
    const violation = checkReading(
      { value: lifetime, takenAtMs: at, raw },
      { previous: previous ? point(previous) : undefined, next: after ? point(after) : undefined },
      opts,
    );
    if (violation) {
      rows.status[i] = STATUS_ERROR;
      errors.add({
        row: i,
        line: rows.line[i],
        message: `Line ${rows.line[i]}: ${violation.message}`,
        fleetNumber: '',
      });
      continue;
    }
    rows.lifetime[i] = lifetime;
    sameTime.push(raw);
    if (!accepted || at > accepted.at || lifetime >= accepted.lifetime)
      accepted = { at, raw, lifetime };
  }
}
