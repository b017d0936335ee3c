// The CSV import of readings: a preview that checks every row and writes nothing, and a commit
// that checks the file once more (the readings may have changed since) and writes it all or
// nothing. Each reads the upload as it arrives (reading-import-read.ts), checks every row against
// its neighbours once (reading-import-plan.ts) and the commit writes with COPY in the same
// transaction (reading-import-write.ts).
import type { Request } from 'express';
import type { ImportPreview, ImportResult } from '../../shared/schemas/readings';
import { sequelize } from '../db';
import { invalid } from '../errors';
import type { OrgAccess } from '../policies/access';
import { planImport } from './reading-import-plan';
import { readImportUpload, type ParsedImport } from './reading-import-read';
import { STATUS_DUPLICATE, STATUS_NEW, shownRows } from './reading-import-rows';
import { copyNewReadings } from './reading-import-write';

function summarise({ rows, errors }: ParsedImport) {
  let duplicates = 0;
  let fresh = 0;
  for (let i = 0; i < rows.length; i++) {
    if (rows.status[i] === STATUS_DUPLICATE) duplicates++;
    else if (rows.status[i] === STATUS_NEW) fresh++;
  }
  return { total: rows.length, new: fresh, duplicates, errors: errors.count };
}

/** 422 naming each bad row by its line (the first SHOWN_ROWS of them); nothing was written. */
function refusal({ errors }: ParsedImport) {
  const listed = errors.first();
  const more = errors.count > listed.length ? ` (the first ${listed.length} are listed)` : '';
  return invalid(
    Object.fromEntries(listed.map((e) => [`line ${e.line}`, e.message])),
    `${errors.count.toLocaleString('en-US')} row${errors.count === 1 ? '' : 's'} cannot be imported; nothing was written${more}`,
  );
}

/**
 * Checks every row of the uploaded file (parse errors and reading rules) inside a transaction that
 * is rolled back. Lists every row of a small file; of a large one its first SHOWN_ROWS rows and its
 * first SHOWN_ROWS errors, with the counts of all.
 */
export async function previewImport(access: OrgAccess, req: Request): Promise<ImportPreview> {
  const parsed = await readImportUpload(access, req);
  const transaction = await sequelize.transaction();
  try {
    await planImport(access, parsed, transaction, { lock: false });
  } finally {
    await transaction.rollback();
  }
  return {
    rows: shownRows(parsed.rows, parsed.errors, parsed.machines),
    summary: summarise(parsed),
  };
}

/**
 * Writes the whole uploaded file in one transaction, or nothing when any row is bad (422 naming
 * the lines). Rows already stored (same machine, time and value) are skipped, so a resent file
 * adds nothing.
 */
export async function commitImport(access: OrgAccess, req: Request): Promise<ImportResult> {
  const parsed = await readImportUpload(access, req);
  if (parsed.errors.count) throw refusal(parsed);
  return sequelize.transaction(async (transaction) => {
    await planImport(access, parsed, transaction, { lock: true });
    if (parsed.errors.count) throw refusal(parsed);
    const added = await copyNewReadings(access, parsed, transaction);
    const { duplicates, total } = summarise(parsed);
    return { added, duplicates, total };
  });
}
