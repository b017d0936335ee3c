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
import { summaryWithNewReadings } from './reading-summary';

/** What planReadings read for each machine under its lock. */
export interface MachineContext {
  machine: Machine;
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
  const byMachine = new Map<string, ReadingRow[]>();
  for (const r of rows) byMachine.set(r.machineId, [...(byMachine.get(r.machineId) ?? []), r]);
  const machines = [...byMachine.keys()].map((id) => contexts.get(id)!);
  const tasks = new Map(machines.map((c) => [c.machine.id, c.tasks]));
  const options = { transaction, timeZone, machines: machines.map((c) => c.machine), tasks };

  const summaries = new Map<string, ReadingSummary>();
  let settled = rows.length <= ONE_STATEMENT_ROWS;
  for (const { machine, summary } of machines) {
    if (!settled || !summary) {
      settled = false;
      break;
    }
    const next = addReadings(summary, byMachine.get(machine.id)!, timeZone);
    if (next.recheck.size) settled = false;
    summaries.set(machine.id, next.summary);
  }
  if (settled) {
    return storeForecasts(access.organization.id, summaries, { ...options, readings: rows });
  }

  const stored = await insertReadingRows(rows, transaction);
  summaries.clear();
  for (const { machine, summary } of machines) {
    if (!summary) {
      // no summary row yet (a machine stored before summaries were kept): build it in full
      await refreshMachineForecast(machine.id, access.organization.id, transaction, { timeZone });
      continue;
    }
    const added = stored.filter((r) => r.machineId === machine.id);
    summaries.set(
      machine.id,
      await summaryWithNewReadings(machine, summary, added, timeZone, transaction),
    );
  }
  await storeForecasts(access.organization.id, summaries, options);
  return stored;
}
