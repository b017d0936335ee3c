// Last stage of a reading import: the new rows written with COPY FROM STDIN on the transaction's
// own connection (so they commit or roll back with everything else), then the forecast summary
// and due points of each machine that got readings rebuilt once. Each row carries an import key
// (the file's digest and its line), so the farm export tells where an imported reading came from.
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { PoolClient } from 'pg';
import copyStreams from 'pg-copy-streams';
import type { Transaction } from 'sequelize';
import type { OrgAccess } from '../policies/access';
import { refreshMachineForecast } from './forecast';
import { STATUS_NEW } from './reading-import-rows';
import type { ParsedImport } from './reading-import-read';

const COPY_SQL = `COPY meter_readings
  (organization_id, machine_id, meter_id, value, lifetime_value, taken_at, source, entered_by,
   import_key)
  FROM STDIN`;
const ROWS_PER_CHUNK = 2_000;

/** COPY text of the new rows (tab-separated; ids, numbers and ISO times need no escaping). */
function* copyChunks(access: OrgAccess, { rows, machines, upload }: ParsedImport) {
  const org = access.organization.id;
  const user = access.userId ?? '\\N';
  const key = upload.digest.slice(0, 16);
  let chunk = '';
  let n = 0;
  for (let i = 0; i < rows.length; i++) {
    if (rows.status[i] !== STATUS_NEW) continue;
    const at = new Date(rows.takenAtMs[i]).toISOString();
    const target = machines[rows.machine[i]];
    chunk += `${org}\t${target.id}\t${target.meterId}\t${rows.value[i]}\t${rows.lifetime[i]}\t${at}\timport\t${user}\t${key}:${rows.line[i]}\n`;
    if (++n === ROWS_PER_CHUNK) {
      yield chunk;
      [chunk, n] = ['', 0];
    }
  }
  if (n) yield chunk;
}

/** Writes the rows planned as new in the caller's transaction; returns how many. */
export async function copyNewReadings(
  access: OrgAccess,
  parsed: ParsedImport,
  transaction: Transaction,
): Promise<number> {
  const { rows, machines } = parsed;
  const touched = new Set<number>();
  for (let i = 0; i < rows.length; i++)
    if (rows.status[i] === STATUS_NEW) touched.add(rows.machine[i]);
  if (!touched.size) return 0;
  // Sequelize keeps the transaction's pg client here; COPY must run on that same connection.
  const client = (transaction as unknown as { connection: PoolClient }).connection;
  const copy = client.query(copyStreams.from(COPY_SQL));
  await pipeline(Readable.from(copyChunks(access, parsed)), copy);
  for (const id of new Set([...touched].map((m) => machines[m].id)))
    await refreshMachineForecast(id, access.organization.id, transaction);
  return Number(copy.rowCount);
}
