import type { UnitSystem } from '../../../../shared/constants';
import { READING_IMPORT_LIMITS } from '../../../../shared/schemas/readings';
import { formatTimeZoneName } from '../../../lib/format';

const LOCAL_FORMAT: Record<UnitSystem, { pattern: string; example: string }> = {
  imperial: { pattern: 'MM/DD/YYYY', example: '05/01/2026 07:30' },
  metric: { pattern: 'DD/MM/YYYY', example: '01/05/2026 07:30' },
};

/** What a readings file must look like, with the date order this farm uses. */
export function ImportFormatHelp({ units, timeZone }: { units: UnitSystem; timeZone: string }) {
  const local = LOCAL_FORMAT[units];
  const sample = [
    'fleet number,taken at,value',
    'T-01,2026-05-01T07:30,1234.5',
    `T-02,${local.example},3118`,
    'B-01,2026-05-02,18440',
  ].join('\n');
  return (
    <div className="flex flex-col gap-3 text-field-800">
      <ul className="list-disc space-y-1 pl-5">
        <li>
          Three columns, named in the first row: <strong>fleet number</strong>,{' '}
          <strong>taken at</strong> and <strong>value</strong> (the meter reading). Columns are
          separated by commas or semicolons.
        </li>
        <li>
          <strong>Taken at</strong> is an ISO date (2026-05-01 or 2026-05-01T07:30) or this
          farm&apos;s local format, <strong>{local.pattern}</strong> with an optional time. Times
          without a zone are farm time ({formatTimeZoneName(timeZone)}); a date alone counts as
          midday.
        </li>
        <li>
          Nothing is imported while any row has an error. Rows already recorded are skipped, so
          importing the same file twice adds nothing the second time.
        </li>
        <li>
          Up to {READING_IMPORT_LIMITS.maxRows.toLocaleString('en-US')} rows and{' '}
          {READING_IMPORT_LIMITS.maxBytes / 1024 / 1024} MB per file. A large file takes a while:
          the page shows how much has been sent, then that the rows are being checked and written.
        </li>
      </ul>
      <figure className="flex flex-col gap-1">
        <figcaption className="text-sm font-bold text-field-700">Sample file</figcaption>
        <pre className="overflow-x-auto rounded-lg border border-field-200 bg-oat-100 p-3 text-sm">
          <code>{sample}</code>
        </pre>
      </figure>
    </div>
  );
}
