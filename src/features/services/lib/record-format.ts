import type { SpecStatus } from '../api/types';

// How a record's figures read. Costs, line costs and spec status are the server's; this only words
// them (money: formatMoney of src/lib/format.ts, in the record's currency).

const quantity = new Intl.NumberFormat(undefined, { maximumFractionDigits: 3 });
const hours = new Intl.NumberFormat(undefined, { maximumFractionDigits: 2 });

export const formatQuantity = (n: number) => quantity.format(n);
/** Labour: "1.75 h" */
export const formatHours = (n: number) => `${hours.format(n)} h`;

export const SPEC_STATUS_TEXT: Record<SpecStatus, string> = {
  in: 'In spec',
  low: 'Low',
  high: 'High',
};

/** "247–305 psi", "≥ 12.4 V", "≤ 0.5 mm", or null without a spec. */
export function specRangeText(
  specMin: number | null,
  specMax: number | null,
  unit: string,
): string | null {
  const u = unit ? ` ${unit}` : '';
  if (specMin !== null && specMax !== null)
    return `${quantity.format(specMin)}–${quantity.format(specMax)}${u}`;
  if (specMin !== null) return `≥ ${quantity.format(specMin)}${u}`;
  if (specMax !== null) return `≤ ${quantity.format(specMax)}${u}`;
  return null;
}

/** "3.2 MB", "740 KB" */
export function formatBytes(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
  return `${Math.max(1, Math.round(bytes / 1024))} KB`;
}
