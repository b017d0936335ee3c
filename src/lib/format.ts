import { ROLE_LABELS, type Role } from '../../shared/constants';
import { minorDigits } from '../../shared/domain/money';

// Dates are shown in the organization's time zone, not the browser's: a manager checking from
// another time zone must see the same day the yard sees.

const LOCALE = undefined; // the browser's language decides the order of day and month

export function formatDate(iso: string, timeZone?: string): string {
  return new Intl.DateTimeFormat(LOCALE, { dateStyle: 'medium', timeZone }).format(new Date(iso));
}

export function formatDateTime(iso: string, timeZone?: string): string {
  return new Intl.DateTimeFormat(LOCALE, {
    dateStyle: 'medium',
    timeStyle: 'short',
    timeZone,
  }).format(new Date(iso));
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
