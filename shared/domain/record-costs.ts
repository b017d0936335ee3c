import { lineMinor, sumMinor } from './money';

// A service record's costs, in integer minor units of the farm's currency: each part or fluid
// line is quantity × unit cost rounded once to a whole minor unit; the totals are exact sums.

/** Minor units of one line (quantity or volume × unit cost), or null when it has no unit cost. */
export function lineCostMinor(quantity: number, unitCostMinor: number | null): number | null {
  return unitCostMinor === null ? null : lineMinor(quantity, unitCostMinor);
}

export interface RecordCostInput {
  parts: readonly { quantity: number; unitCostMinor: number | null }[];
  fluids: readonly { volume: number; unitCostMinor: number | null }[];
  otherCosts: readonly { amountMinor: number }[];
}

export interface RecordCostTotals {
  /** line costs of the parts, in the order given (null: no unit cost) */
  partLines: (number | null)[];
  fluidLines: (number | null)[];
  partsMinor: number;
  fluidsMinor: number;
  otherMinor: number;
  totalMinor: number;
  /** part and fluid lines without a unit cost, left out of the sums */
  linesWithoutCost: number;
}

/** Line costs and totals of a record (minor units); lines without a unit cost count as none. */
export function recordCosts(record: RecordCostInput): RecordCostTotals {
  const partLines = record.parts.map((p) => lineCostMinor(p.quantity, p.unitCostMinor));
  const fluidLines = record.fluids.map((f) => lineCostMinor(f.volume, f.unitCostMinor));
  const counted = (lines: (number | null)[]) => lines.filter((l): l is number => l !== null);
  const partsMinor = sumMinor(counted(partLines));
  const fluidsMinor = sumMinor(counted(fluidLines));
  const otherMinor = sumMinor(record.otherCosts.map((c) => c.amountMinor));
  return {
    partLines,
    fluidLines,
    partsMinor,
    fluidsMinor,
    otherMinor,
    totalMinor: sumMinor([partsMinor, fluidsMinor, otherMinor]),
    linesWithoutCost: [...partLines, ...fluidLines].filter((l) => l === null).length,
  };
}
