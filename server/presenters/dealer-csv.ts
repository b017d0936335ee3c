import { stringify } from 'csv-stringify/sync';
import { DUE_STATUS_LABELS } from '../../shared/constants';
import { stockUnitLabel } from '../../shared/domain/stock-units';
import type { BoardRow } from '../services/dealer-board';
import type { partsForecast } from '../services/parts-forecast';

// CSV exports of the dealer's board and parts forecast: the same figures the screens show.

/**
 * A text cell a spreadsheet would run as a formula (=, +, -, @, tab, CR) gets a leading
 * apostrophe: farm-entered names must not become formulas on the dealer's machine.
 */
const cell = (v: string | number | null | undefined) =>
  v === null || v === undefined
    ? ''
    : typeof v === 'number'
      ? v
      : /^[=+\-@\t\r]/.test(v)
        ? `'${v}`
        : v;

export function boardCsv(rows: BoardRow[]): string {
  return stringify(
    rows.map((r) =>
      [
        r.customer.name,
        r.machine.fleetNumber,
        r.machine.name,
        r.machine.category,
        r.taskName,
        DUE_STATUS_LABELS[r.due.status],
        r.dueOnMeter ?? r.due.dueMeter,
        r.machine.meterUnit,
        r.due.dueDate,
        r.due.effectiveDate,
        r.due.projectedDate,
        r.due.projectedLow,
        r.due.projectedHigh,
        r.lastReading?.value ?? null,
        r.lastReading?.takenAt ?? null,
        r.lastReadingAgeDays,
      ].map(cell),
    ),
    {
      header: true,
      columns: [
        'Customer',
        'Fleet number',
        'Machine',
        'Category',
        'Task',
        'Status',
        'Due meter',
        'Meter unit',
        'Due date',
        'Falls due',
        'Projected date',
        'Projected earliest',
        'Projected latest',
        'Last reading',
        'Last reading at',
        'Days since reading',
      ],
    },
  );
}

type Forecast = Awaited<ReturnType<typeof partsForecast>>;

/** One line per customer and part or fluid, then the totals (customer "All customers"). */
export function partsCsv(forecast: Forecast): string {
  const lines = (customer: string, s: Pick<Forecast, 'parts' | 'fluids' | 'wearParts'>) => [
    ...s.parts.map((p) => [
      customer,
      'part',
      p.partNumber,
      p.description,
      p.quantity,
      '',
      p.machines,
      p.services,
      p.firstNeededOn,
      '',
    ]),
    ...s.fluids.map((f) => [
      customer,
      f.converted ? 'fluid' : 'fluid (unit not converted)',
      '',
      f.kind,
      f.volume,
      stockUnitLabel(f.unit),
      f.machines,
      f.services,
      f.firstNeededOn,
      '',
    ]),
    // a wear part has no quantity: it is inspected on these machines and replaced when worn
    ...s.wearParts.map((w) => [
      customer,
      'wear part (inspect, replace when worn)',
      w.partNumber,
      w.description,
      '',
      '',
      w.machines.length,
      w.services,
      w.firstNeededOn,
      w.machines.map((m) => m.fleetNumber).join('; '),
    ]),
  ];
  return stringify(
    [
      ...forecast.byCustomer.flatMap((c) => lines(c.customer.name, c)),
      ...lines('All customers', forecast),
    ].map((row) => row.map(cell)),
    {
      header: true,
      columns: [
        'Customer',
        'Line',
        'Part number',
        'Description',
        'Quantity',
        'Unit',
        'Machines',
        'Services',
        'First needed',
        'Inspect on',
      ],
    },
  );
}
