// The rows of a reading import as they are parsed, kept small: one slot per data row in typed
// columns (machine, time, value, line, status), so 500,000 rows take about 16 MB instead of an
// object each. Only the rows a person will see (the first of the file and the first errors) are
// kept as objects; every other error is counted.
import type { ImportPreviewRow } from '../../shared/schemas/readings';
import type { Machine } from '../models';
import type { MeterKind } from '../../shared/constants';

export const STATUS_NEW = 0;
export const STATUS_DUPLICATE = 1;
export const STATUS_ERROR = 2;

/** How many rows a preview lists: the file's first rows and, as many again, its first errors. */
export const SHOWN_ROWS = 200;

/**
 * What an import row is written to: one meter of one of the farm's machines (issue 13). `id` is
 * the machine's; `meterUnit` the meter's own unit, which its rules speak in.
 */
export type ImportMachine = Pick<
  Machine,
  'id' | 'name' | 'fleetNumber' | 'meterUnit' | 'status' | 'organizationId'
> & { meterId: string; meterKind: MeterKind; isPrimary: boolean };

/** Typed columns that double as they fill. */
export class ReadingColumns {
  length = 0;
  machine = new Int32Array(1024);
  takenAtMs = new Float64Array(1024);
  value = new Float64Array(1024);
  lifetime = new Float64Array(1024);
  line = new Int32Array(1024);
  status = new Uint8Array(1024);

  /** Adds a row (machine -1 and NaN for what could not be read); returns its index. */
  push(machine: number, takenAtMs: number, value: number, line: number, status: number) {
    if (this.length === this.line.length) this.grow();
    const i = this.length++;
    this.machine[i] = machine;
    this.takenAtMs[i] = takenAtMs;
    this.value[i] = value;
    this.line[i] = line;
    this.status[i] = status;
    return i;
  }

  private grow() {
    const size = this.line.length * 2;
    const widen = <T extends Int32Array | Float64Array | Uint8Array>(
      a: T,
      make: new (n: number) => T,
    ) => {
      const b = new make(size);
      b.set(a);
      return b;
    };
    this.machine = widen(this.machine, Int32Array);
    this.takenAtMs = widen(this.takenAtMs, Float64Array);
    this.value = widen(this.value, Float64Array);
    this.lifetime = widen(this.lifetime, Float64Array);
    this.line = widen(this.line, Int32Array);
    this.status = widen(this.status, Uint8Array);
  }
}

interface ErrorNote {
  row: number;
  line: number;
  message: string;
  /** the cell as written, for a row whose machine is unknown */
  fleetNumber: string;
}

/**
 * The errors of a file: all counted, the SHOWN_ROWS with the lowest line numbers kept (errors of
 * the neighbour checks come machine by machine, not in file order).
 */
export class ErrorList {
  count = 0;
  private notes: ErrorNote[] = [];

  add(note: ErrorNote) {
    this.count++;
    this.notes.push(note);
    if (this.notes.length >= 4 * SHOWN_ROWS) this.trim();
  }

  /** The first errors by line. */
  first(): ErrorNote[] {
    this.trim();
    return this.notes;
  }

  private trim() {
    this.notes.sort((a, b) => a.line - b.line);
    this.notes.length = Math.min(this.notes.length, SHOWN_ROWS);
  }
}

/** The file's rows as the preview lists them: its first rows and its first errors, by line. */
export function shownRows(
  rows: ReadingColumns,
  errors: ErrorList,
  machines: ImportMachine[],
): ImportPreviewRow[] {
  const messages = new Map(errors.first().map((e) => [e.row, e]));
  const picked = new Set<number>(messages.keys());
  for (let i = 0; i < Math.min(rows.length, SHOWN_ROWS); i++) picked.add(i);
  return [...picked]
    .sort((a, b) => a - b)
    .map((i) => {
      const m = rows.machine[i] >= 0 ? machines[rows.machine[i]] : null;
      const status = rows.status[i];
      const time = rows.takenAtMs[i];
      return {
        line: rows.line[i],
        fleetNumber: m ? m.fleetNumber : (messages.get(i)?.fleetNumber ?? ''),
        machine: m && {
          id: m.id,
          name: m.name,
          fleetNumber: m.fleetNumber,
          meterUnit: m.meterUnit,
        },
        takenAt: Number.isNaN(time) ? null : new Date(time).toISOString(),
        value: Number.isNaN(rows.value[i]) ? null : rows.value[i],
        status:
          status === STATUS_ERROR ? 'error' : status === STATUS_DUPLICATE ? 'duplicate' : 'new',
        // an error row among the file's first rows is always among its first errors
        error: messages.get(i)?.message ?? null,
      };
    });
}
