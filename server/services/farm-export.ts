import { Readable, type Writable } from 'node:stream';
import { ZipArchive } from 'archiver';
import { stringify } from 'csv-stringify/sync';
import { QueryTypes, Transaction } from 'sequelize';
import { readDb } from '../db';
import type { Organization } from '../models';
import { getObject, isMissingObject } from '../infra/storage';
import { recordAudit } from '../infra/audit';
import type { OrgAccess } from '../policies/access';
import { todayIso } from '../../shared/domain';
import { EXPORT_TABLES, FILE_PATHS, type ExportTable } from './farm-export-tables';

// A farm's own data as one zip: a CSV per kind of record, organization.json, the stored files and
// a README.txt of the columns. Every query runs in one REPEATABLE READ transaction, so the files
// agree with each other; rows are read a page at a time and files fetched only when the archive
// reaches them, so a large farm streams without being held in memory. With DATABASE_READ_URL the
// reads go to the replica, and the archive is as of a moment a few seconds back.

/** Rows read per query. */
export const EXPORT_PAGE_ROWS = 2000;

// Text a spreadsheet would run as a formula gets a leading apostrophe (OWASP "CSV injection").
// PostgreSQL's numeric values arrive as exact decimal text ("-2.50"); those stay as they are.
const FORMULA_START = /^[=+\-@\t\r]/;
const DECIMAL = /^-?\d+(\.\d+)?$/;

const csvCast = {
  date: (value: Date) => value.toISOString(),
  object: (value: object) => JSON.stringify(value),
  boolean: (value: boolean) => (value ? 'true' : 'false'),
  string: (value: string) =>
    FORMULA_START.test(value) && !DECIMAL.test(value) ? `'${value}` : value,
};

export interface FarmExportSummary {
  /** rows written per CSV file */
  rows: Record<string, number>;
  /** files copied from the object store */
  files: number;
  /** archive paths of files the store no longer held */
  missing: string[];
}

export function exportSql(table: ExportTable): string {
  const columns = table.columns.map(([name, , sql]) => `${sql ?? `t.${name}`} AS "${name}"`);
  return `SELECT ${columns.join(', ')} FROM ${table.from}
    WHERE t.organization_id = :org ORDER BY ${table.orderBy} LIMIT :limit OFFSET :offset`;
}

async function* csvChunks(
  table: ExportTable,
  organizationId: string,
  transaction: Transaction,
  rows: Record<string, number>,
): AsyncGenerator<string> {
  const columns = table.columns.map(([name]) => name);
  const sql = exportSql(table);
  yield stringify([], { header: true, columns });
  rows[table.file] = 0;
  for (let offset = 0; ; offset += EXPORT_PAGE_ROWS) {
    const page = await readDb.query<Record<string, unknown>>(sql, {
      replacements: { org: organizationId, limit: EXPORT_PAGE_ROWS, offset },
      type: QueryTypes.SELECT,
      transaction,
    });
    if (page.length) yield stringify(page, { columns, cast: csvCast });
    rows[table.file] += page.length;
    if (page.length < EXPORT_PAGE_ROWS) return;
  }
}

/** The stored files of the organization: where each goes in the archive and its object's key. */
async function storedFiles(organizationId: string, transaction: Transaction) {
  const { machinePhoto, serviceAttachment, walkaroundPhoto } = FILE_PATHS;
  return readDb.query<{ path: string; key: string }>(
    `SELECT ${machinePhoto.path} AS path, ${machinePhoto.key} AS key FROM machines t
       WHERE t.organization_id = :org AND t.photo_key IS NOT NULL
     UNION ALL
     SELECT ${serviceAttachment.path}, ${serviceAttachment.key} FROM service_attachments t
       WHERE t.organization_id = :org
     UNION ALL
     SELECT ${walkaroundPhoto.path}, ${walkaroundPhoto.key} FROM walkaround_photos t
       WHERE t.organization_id = :org
     ORDER BY path`,
    { replacements: { org: organizationId }, type: QueryTypes.SELECT, transaction },
  );
}

/** A file of the store, fetched when the archive reaches it; a missing one is noted and empty. */
function storedFile(key: string, path: string, missing: string[]): Readable {
  async function* chunks() {
    let body: Readable;
    try {
      body = (await getObject(key)).body;
    } catch (error) {
      if (!isMissingObject(error)) throw error;
      missing.push(path);
      return;
    }
    for await (const chunk of body) yield chunk as Buffer;
  }
  return Readable.from(chunks(), { objectMode: false });
}

/**
 * A manager's download of the farm's data: recorded in the audit log first, then `write` streams
 * the archive to the response. The caller names the file by `localDate` (the farm's date today).
 */
export async function startFarmExport(access: OrgAccess, now: Date) {
  const { organization } = access;
  await recordAudit({
    organizationId: organization.id,
    actorUserId: access.userId,
    action: 'organization.export',
    entityType: 'organization',
    entityId: organization.id,
  });
  return {
    localDate: todayIso(organization.timeZone, now),
    write: (out: Writable) => writeFarmExport(organization, out, now),
  };
}

/** Writes the organization's export to `out` (a response, a file) and resolves when it is done. */
export async function writeFarmExport(
  organization: Organization,
  out: Writable,
  now = new Date(),
): Promise<FarmExportSummary> {
  const archive = new ZipArchive({ zlib: { level: 6 } });
  const summary: FarmExportSummary = { rows: {}, files: 0, missing: [] };
  const failed = new Promise<never>((_resolve, reject) => {
    archive.on('error', reject);
    archive.on('warning', reject);
    // The person cancelled the download: stop reading rather than wait for a reader forever.
    out.on('close', () => {
      if (!out.writableFinished) reject(new Error('the export was cancelled before it finished'));
    });
  });
  failed.catch(() => archive.abort());
  const finished = new Promise<void>((resolve) => out.on('finish', resolve));
  archive.pipe(out);

  // One entry at a time: archiver starts reading a stream as soon as it is appended, so each
  // source is made only when the entry before it is written (one query, one download at a time).
  const add = async (name: string, source: () => Readable | string) => {
    const written = new Promise((resolve) => archive.once('entry', resolve));
    archive.append(source(), { name, date: now });
    await Promise.race([written, failed]);
  };

  // on the read replica when there is one (DATABASE_READ_URL): a standby runs REPEATABLE READ too
  await readDb.transaction(
    { isolationLevel: Transaction.ISOLATION_LEVELS.REPEATABLE_READ },
    async (transaction) => {
      await add('README.txt', () => exportReadme(organization.name, now));
      const about = {
        id: organization.id,
        name: organization.name,
        kind: organization.kind,
        timeZone: organization.timeZone,
        units: organization.units,
        exportedAt: now.toISOString(),
        files: ['README.txt', ...EXPORT_TABLES.map((t) => t.file)],
      };
      await add('organization.json', () => `${JSON.stringify(about, null, 2)}\n`);
      for (const table of EXPORT_TABLES) {
        await add(table.file, () =>
          Readable.from(csvChunks(table, organization.id, transaction, summary.rows), {
            objectMode: false,
          }),
        );
      }
      const files = await storedFiles(organization.id, transaction);
      for (const file of files)
        await add(file.path, () => storedFile(file.key, file.path, summary.missing));
      summary.files = files.length - summary.missing.length;
      await add('missing-files.txt', () => summary.missing.map((path) => `${path}\n`).join(''));
      await Promise.race([archive.finalize(), failed]);
    },
  );
  await Promise.race([finished, failed]);
  return summary;
}
/** The README.txt of the archive: what each file holds, column by column. */
export function exportReadme(organizationName: string, exportedAt: Date): string {
  const lines = [
    `Hourstone export of ${organizationName}`,
    `Made ${exportedAt.toISOString()} (UTC), from one consistent moment of the database.`,
    '',
    'CSV files are UTF-8 with a header line; times are ISO 8601 in UTC, dates yyyy-mm-dd, and',
    'numbers use a dot for decimals. Columns marked "as JSON" hold a JSON value. Ids (UUIDs) link',
    'the files together. organization.json names the farm, its time zone and units. Files (photos,',
    'invoices) are under files/, at the path the CSV names. missing-files.txt lists any file the',
    'store no longer held (its entry in files/ is then empty). Text that begins with =, +, -, @ or',
    "a tab starts with an apostrophe (') so that spreadsheets show it rather than run it.",
    '',
  ];
  for (const table of EXPORT_TABLES) {
    lines.push(`${table.file} — ${table.about}`);
    for (const [name, doc] of table.columns) lines.push(`  ${name}: ${doc}`);
    lines.push('');
  }
  return lines.join('\n');
}
