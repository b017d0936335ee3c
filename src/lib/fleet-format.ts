import { TZDate } from '@date-fns/tz';
import { format } from 'date-fns';
import { METER_UNIT_LABELS, type MeterUnit } from '../../shared/constants';

// Formatting of meter values and the farm's local dates, shared by the fleet, schedule and due
// screens. The figures come from the server; this only decides how they read.

const meterNumber = new Intl.NumberFormat(undefined, { maximumFractionDigits: 1 });

/** "1,943.6 h", "18,440 bales": the short unit after the value. */
export function formatMeter(value: number, unit: MeterUnit | string): string {
  return `${meterNumber.format(value)} ${unit}`;
}

/** The unit spelled out for labels: "hours", "km", "bales". */
export const meterUnitLabel = (unit: MeterUnit | string): string =>
  METER_UNIT_LABELS[unit as MeterUnit] ?? unit;

const rateNumber = new Intl.NumberFormat(undefined, { maximumFractionDigits: 1 });
const smallRateNumber = new Intl.NumberFormat(undefined, { maximumSignificantDigits: 2 });

/** A usage rate per day: one decimal, or two significant digits for light use (0.57). */
export const formatRate = (rate: number): string =>
  Math.abs(rate) < 1 && rate !== 0 ? smallRateNumber.format(rate) : rateNumber.format(rate);

/** Farm calendar dates read as every other date on screen (src/lib/format.ts). */
export { formatLocalDate } from './format';

/** The value of a datetime-local input ("2026-05-01T07:30") for an instant, in the farm's zone. */
export function toDateTimeLocalValue(instant: Date | string, timeZone: string): string {
  return format(new TZDate(new Date(instant).getTime(), timeZone), "yyyy-MM-dd'T'HH:mm");
}

/**
 * A datetime-local value read as wall-clock time in the farm's time zone, as an ISO instant with
 * the zone's offset ("2026-05-01T07:30:00.000-05:00"), or null when it is not a valid value.
 */
export function fromDateTimeLocalValue(value: string, timeZone: string): string | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/.exec(value);
  if (!match) return null;
  const [, y, mo, d, h, mi] = match.map(Number);
  const date = new TZDate(y, mo - 1, d, h, mi, timeZone);
  return Number.isNaN(date.getTime()) ? null : date.toISOString();
}

/** Today's date in the farm's time zone (yyyy-mm-dd), for date inputs' defaults and limits. */
export const todayInZone = (timeZone: string): string =>
  format(new TZDate(Date.now(), timeZone), 'yyyy-MM-dd');
