// Writes a checked batch of new readings with their machines' summaries, usage and due points.
// The usual post settles in one statement: the summary follows from the new readings alone
// (daily-summary.ts addReadings), so readings, forecast row and due points go together
// (forecast-rows.ts writeForecasts). A batch past a thousand rows, a machine without a summary
// row, or a reading tying its day's stored point is written first and settled after.
import type { Transaction } from 'sequelize';
import type { Machine, MeterReading } from '../models';
import type { OrgAccess } from '../policies/context';
import { refreshMachineForecast, storeForecasts } from './forecast';
import type { DueTask } from './forecast-rows';
import { addReadings, type ReadingSummary } from './daily-summary';
import { insertReadingRows, type ReadingRow } from './reading-rows';
import { meterRef, summaryWithNewReadings } from './reading-summary';
import type { MeterOfWrite } from './reading-neighbours';

/** What planReadings read for each meter under its machine's lock. */
export interface MachineContext {
  machine: Machine;
  meter: MeterOfWrite;
  summary: ReadingSummary | null;
  tasks: DueTask[];
}

// Rows a post may send inside its one write statement; larger batches (imports) go in chunks.
const ONE_STATEMENT_ROWS = 1000;

/** Stores the rows and brings each machine's forecast up to date; the stored readings, in order. */
export async function storeNewReadings(
  access: OrgAccess,
  rows: ReadingRow[],
  contexts: Map<string, MachineContext>,
  transaction: Transaction,
): Promise<MeterReading[]> {
  const { timeZone } = access.organization;
  const byMeter = new Map<string, ReadingRow[]>();
  for (const r of rows) byMeter.set(r.meterId, [...(byMeter.get(r.meterId) ?? []), r]);
  const meters = [...byMeter.keys()].map((id) => contexts.get(id)!);
  const tasks = new Map(meters.map((c) => [c.meter.id, c.tasks]));
  const options = {
    transaction,
    timeZone,
    machines: [...new Map(meters.map((c) => [c.machine.id, c.machine])).values()],
    meters: meters.map((c) => ({ id: c.meter.id, machineId: c.machine.id })),
    tasks,
  };

  const summaries = new Map<string, ReadingSummary>();
  let settled = rows.length <= ONE_STATEMENT_ROWS;
  for (const { meter, summary } of meters) {
    if (!settled || !summary) {
      settled = false;
      break;
    }
    const next = addReadings(summary, byMeter.get(meter.id)!, timeZone);
    if (next.recheck.size) settled = false;
    summaries.set(meter.id, next.summary);
  }
  if (settled) {
    return storeForecasts(access.organization.id, summaries, { ...options, readings: rows });
  }

  const stored = await insertReadingRows(rows, transaction);
  summaries.clear();
  const rebuilt = new Set<string>();
  for (const { machine, meter, summary } of meters) {
    if (!summary) {
      // no summary row yet (a meter stored before summaries were kept): build its machine's in full
      if (!rebuilt.has(machine.id))
        await refreshMachineForecast(machine.id, access.organization.id, transaction, { timeZone });
      rebuilt.add(machine.id);
      continue;
    }
    const added = stored.filter((r) => r.meterId === meter.id);
    summaries.set(
      meter.id,
      await summaryWithNewReadings(meterRef(machine, meter), summary, added, timeZone, transaction),
    );
  }
  for (const id of [...summaries.keys()])
    if (rebuilt.has(contexts.get(id)!.machine.id)) summaries.delete(id);
  await storeForecasts(access.organization.id, summaries, options);
  return stored;
}
