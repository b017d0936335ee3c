import { ROLE_LABELS, type Role } from '../../shared/constants';
import { minorDigits } from '../../shared/domain/money';

// The one home of how dates and times read on screen. Every date is shown in the farm's time
// zone, not the browser's: a manager checking from another time zone must see the day and the
// hour the yard sees. The reader's language decides the order of day and month, one style per
// language ("Dec 1, 2026, 1:43 PM" in en-US, "1 Dec 2026, 13:43" in en-GB) for every screen.
// CSV exports do not come through here: they keep ISO 8601 instants with their offset.

const LOCALE = undefined; // the browser's language

const dateFormatters = new Map<string, Intl.DateTimeFormat>();

/** One formatter per locale, zone and style, made on first use (Intl formatters are costly). */
function dateFormatter(
  style: 'date' | 'dateTime' | 'dayTime' | 'zoneName',
  timeZone: string,
  locale: string | undefined,
): Intl.DateTimeFormat {
  const key = `${locale ?? ''}|${timeZone}|${style}`;
  let formatter = dateFormatters.get(key);
  if (!formatter) {
    const options: Record<typeof style, Intl.DateTimeFormatOptions> = {
      date: { dateStyle: 'medium' },
      dateTime: { dateStyle: 'medium', timeStyle: 'short' },
      dayTime: { day: 'numeric', month: 'short', hour: 'numeric', minute: '2-digit' },
      zoneName: { timeZoneName: 'longGeneric' },
    };
    formatter = new Intl.DateTimeFormat(locale ?? LOCALE, { ...options[style], timeZone });
    dateFormatters.set(key, formatter);
  }
  return formatter;
}

/** The reader's own zone, for pages that belong to no farm (the development mail catcher). */
export const readerTimeZone = (): string =>
  Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';

/** An instant's calendar day in the farm's zone: "Dec 1, 2026" (en-US), "1 Dec 2026" (en-GB). */
export function formatDate(instant: string | Date, timeZone: string, locale?: string): string {
  return dateFormatter('date', timeZone, locale).format(new Date(instant));
}

/** An instant in the farm's zone: "Dec 1, 2026, 1:43 PM" (en-US), "1 Dec 2026, 13:43" (en-GB). */
export function formatDateTime(instant: string | Date, timeZone: string, locale?: string): string {
  return dateFormatter('dateTime', timeZone, locale).format(new Date(instant));
}

/** An instant of this season without its year, for tight rows: "Dec 1, 1:43 PM" (en-US). */
export function formatDayTime(instant: string | Date, timeZone: string, locale?: string): string {
  return dateFormatter('dayTime', timeZone, locale).format(new Date(instant));
}

/**
 * A farm calendar date (yyyy-mm-dd: a due date, the day a service was done) in the same style as
 * formatDate. Read as a calendar day, never as an instant: `new Date('2027-04-29')` is UTC
 * midnight, which is the day before in the Americas.
 */
export function formatLocalDate(isoDate: string, locale?: string): string {
  const [y, m, d] = isoDate.slice(0, 10).split('-').map(Number);
  return dateFormatter('date', 'UTC', locale).format(new Date(Date.UTC(y, m - 1, d, 12)));
}

/**
 * A time zone as people say it, not its database name: "America/Chicago" → "Central Time
 * (Chicago)" in English; the city keeps two zones of one name apart. A zone Intl cannot name
 * shows as its city.
 */
export function formatTimeZoneName(timeZone: string, locale?: string): string {
  const city = timeZone.includes('/')
    ? (timeZone.split('/').pop() ?? timeZone).replace(/_/g, ' ')
    : timeZone;
  let name: string | undefined;
  try {
    name = dateFormatter('zoneName', timeZone, locale)
      .formatToParts(new Date())
      .find((part) => part.type === 'timeZoneName')?.value;
  } catch {
    return city;
  }
  if (!name || /^GMT[+-]/.test(name) || name === timeZone) return city;
  return city === name || city === timeZone ? name : `${name} (${city})`;
}

const relative = new Intl.RelativeTimeFormat(LOCALE, { numeric: 'auto' });

/** "in 6 days", "tomorrow", "2 hours ago": for expiry times and the like. */
export function formatRelative(iso: string, now: Date = new Date()): string {
  const seconds = (new Date(iso).getTime() - now.getTime()) / 1000;
  const steps: [Intl.RelativeTimeFormatUnit, number][] = [
    ['day', 86_400],
    ['hour', 3_600],
    ['minute', 60],
  ];
  for (const [unit, size] of steps) {
    if (Math.abs(seconds) >= size) return relative.format(Math.round(seconds / size), unit);
  }
  return relative.format(Math.round(seconds), 'second');
}

export const roleLabel = (role: Role): string => ROLE_LABELS[role] ?? role;

/** "Larkspur Flats Farm · Manager": how a membership reads in the organization switcher. */
export const membershipLabel = (membership: { role: Role; organization: { name: string } }) =>
  `${membership.organization.name} · ${roleLabel(membership.role)}`;

// Money arrives as integer minor units of the organization's currency (…Minor fields). One
// formatter per currency, locale and style, made on first use: Intl.NumberFormat is costly to build.
const moneyFormatters = new Map<string, Intl.NumberFormat>();

interface MoneyStyle {
  /** the reader's language by default */
  locale?: string;
  /** whole units only (a machine's price): "$342,000" */
  whole?: boolean;
}

function moneyFormatter(currency: string, { locale, whole = false }: MoneyStyle = {}) {
  const key = `${locale ?? ''}|${currency}|${whole}`;
  let formatter = moneyFormatters.get(key);
  if (!formatter) {
    formatter = new Intl.NumberFormat(locale ?? LOCALE, {
      style: 'currency',
      currency,
      ...(whole && { minimumFractionDigits: 0, maximumFractionDigits: 0 }),
    });
    moneyFormatters.set(key, formatter);
  }
  return formatter;
}

/** An amount in minor units, in its currency: 120450 USD → "$1,204.50", 1500 JPY → "¥1,500". */
export function formatMoney(minor: number, currency: string, style: MoneyStyle = {}): string {
  return moneyFormatter(currency, style).format(minor / 10 ** minorDigits(currency));
}

/** Minor units as a form shows them for editing, without symbol or grouping: 1250 USD → "12.50". */
export function moneyInputText(minor: number | null | undefined, currency: string): string {
  if (minor === null || minor === undefined || !Number.isFinite(minor)) return '';
  const digits = minorDigits(currency);
  return (minor / 10 ** digits).toFixed(digits);
}
