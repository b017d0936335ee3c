import { ROLE_LABELS, type Role } from '../../shared/constants';

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
