// The choices of an organization's settings form, from the browser's own data: time zones and
// currencies it knows (the server checks the same names), month names in its language, and the
// labour rate typed in the currency's major units but stored in minor units.
import { minorDigits, minorToMajor, parseMajorToMinor } from '../../../../shared/domain/money';
import { formatTimeZoneName } from '../../../lib/format';

type SupportedValues = (key: 'timeZone' | 'currency') => string[];
const supported = (Intl as { supportedValuesOf?: SupportedValues }).supportedValuesOf;

/** The browser's own time zone: the preset of a new organization. */
export const browserTimeZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';

/** Every time zone the browser knows, named as people say them, with `current` (and UTC) among them. */
export function timeZoneOptions(current: string) {
  const zones = new Set(supported ? supported('timeZone') : []);
  zones.add(current);
  zones.add('UTC');
  // as people say them ("Central Time (Chicago)"), in that order, so a region's zones sit together
  return [...zones]
    .map((zone) => ({ value: zone, label: formatTimeZoneName(zone) }))
    .sort((x, y) => x.label.localeCompare(y.label));
}

const currencyName = (() => {
  try {
    return new Intl.DisplayNames(undefined, { type: 'currency' });
  } catch {
    return null;
  }
})();

/** ISO 4217 currencies, "EUR — Euro", with `current` among them. */
export function currencyOptions(current: string) {
  const codes = new Set(supported ? supported('currency') : ['EUR', 'GBP', 'USD']);
  codes.add(current);
  return [...codes].sort().map((code) => ({
    value: code,
    label: `${code} — ${currencyName?.of(code) ?? code}`,
  }));
}

const monthName = new Intl.DateTimeFormat(undefined, { month: 'long', timeZone: 'UTC' });
export const MONTH_OPTIONS = Array.from({ length: 12 }, (_, index) => ({
  value: index + 1,
  label: monthName.format(new Date(Date.UTC(2024, index, 1))),
}));

export const HOUR_OPTIONS = Array.from({ length: 24 }, (_, hour) => ({
  value: String(hour),
  label: `${String(hour).padStart(2, '0')}:00`,
}));

/** "55.00" for 5500 minor units of a two-digit currency. */
export const rateToText = (minor: number, currency: string) =>
  minorToMajor(minor, currency).toFixed(minorDigits(currency));

/**
 * Minor units of a rate typed in major units ("55", "55.5", "1,200.00"); empty is 0. Text that is
 * not an amount is NaN and a finer amount than the currency has stays fractional: the shared
 * schema then refuses it by name.
 */
export const textToRate = (text: string, currency: string): number =>
  parseMajorToMinor(text, currency) ?? 0;

/** Imperial for the few countries that keep it, else metric: the preset of a new farm. */
export function browserUnits(): 'metric' | 'imperial' {
  try {
    const region = new Intl.Locale(navigator.language).maximize().region;
    return region && ['US', 'LR', 'MM'].includes(region) ? 'imperial' : 'metric';
  } catch {
    return 'metric';
  }
}
