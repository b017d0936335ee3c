import type { UnitSystem } from '../../../../shared/constants';
import { CATEGORY_LABELS, MACHINE_CATEGORIES, METER_UNITS } from '../../../../shared/constants';
import { Icon } from '../../../components/ui/icons';
import { formatTimeZoneName } from '../../../lib/format';

const LOCAL_DATE: Record<UnitSystem, string> = { imperial: 'MM/DD/YYYY', metric: 'DD/MM/YYYY' };

/** What a fleet file looks like, in this farm's date and number format, with the example file. */
export function FleetFormatHelp({
  units,
  timeZone,
  exampleHref,
}: {
  units: UnitSystem;
  timeZone: string;
  exampleHref: string;
}) {
  return (
    <div className="flex flex-col gap-3 text-field-800">
      <p>
        One row per machine, with the column names in the first row. Save the spreadsheet as CSV;
        commas or semicolons both work.
      </p>
      <ul className="list-disc space-y-1 pl-5">
        <li>
          <strong>fleet number</strong> (always), <strong>name</strong> and{' '}
          <strong>category</strong> (for a new machine:{' '}
          {MACHINE_CATEGORIES.map((c) => CATEGORY_LABELS[c].toLowerCase()).join(', ')}), and if you
          have them <strong>make</strong>, <strong>model</strong>, <strong>serial</strong>,{' '}
          <strong>year</strong> and <strong>meter unit</strong> ({METER_UNITS.join(', ')}; hours
          when left out).
        </li>
        <li>
          <strong>meter reading</strong> with its <strong>reading date</strong>: the meter now and
          the day it showed that. It is checked like any reading.
        </li>
        <li>
          <strong>schedule</strong>: the name of one of this farm&apos;s schedule templates, to put
          its tasks on the machine.
        </li>
        <li>
          For each task whose last service you know, two columns named after the task:{' '}
          <strong>Engine oil and filter last done</strong> (the date) and{' '}
          <strong>Engine oil and filter last meter</strong> (the meter then). Tasks left out stay
          &ldquo;history unknown&rdquo; until you set them on the machine&apos;s page.
        </li>
        <li>
          Dates are ISO (2026-05-01) or this farm&apos;s <strong>{LOCAL_DATE[units]}</strong>, in
          farm time ({formatTimeZoneName(timeZone)}).{' '}
          {units === 'metric'
            ? 'Numbers may use a decimal comma (1210,5).'
            : 'Numbers use a decimal point (1210.5).'}
        </li>
        <li>
          A fleet number already on the farm updates that machine: only the cells you fill in
          change, and a blank cell leaves the value as it is. Importing the same file again changes
          nothing.
        </li>
        <li>Nothing is imported while any row has an error. Up to 2,000 rows and 2 MB.</li>
      </ul>
      <p>
        <a
          href={exampleHref}
          download
          className="inline-flex min-h-touch items-center gap-1 font-bold text-field-800 underline underline-offset-2"
        >
          <Icon name="download" className="size-4" />
          Download an example file
        </a>
      </p>
    </div>
  );
}
