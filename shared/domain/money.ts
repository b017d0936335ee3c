// Money is counted in integer minor units of the organization's ISO 4217 currency (cents of USD,
// yen of JPY, fils of KWD), so sums are exact integer additions; only a line's quantity × unit
// price is rounded, once, to a whole minor unit. Display and typing convert at the edges.

const digitsCache = new Map<string, number>();

/** Digits of a currency's minor unit, from the runtime's ISO 4217 data (USD 2, JPY 0, KWD 3). */
export function minorDigits(currency: string): number {
  let digits = digitsCache.get(currency);
  if (digits === undefined) {
    digits = new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions()
      .maximumFractionDigits!;
    digitsCache.set(currency, digits);
  }
  return digits;
}

/**
 * Minor units (integer) of a line: `quantity` × `unitMinor` (minor units per one), rounded half
 * up to a whole minor unit after clearing binary noise (1.005 × 100 is 100.4999… in floating point).
 */
export function lineMinor(quantity: number, unitMinor: number): number {
  const exact = Number((quantity * unitMinor).toPrecision(12));
  return Math.floor(exact + 0.5);
}

/** Exact sum of integer minor amounts (integers add exactly below 2^53). */
export function sumMinor(amounts: readonly number[]): number {
  let total = 0;
  for (const a of amounts) total += a;
  return total;
}

/** Minor units of labour: hours × a rate per hour in minor units, rounded once like a line. */
export function labourMinor(hours: number, rateMinorPerHour: number): number {
  return lineMinor(hours, rateMinorPerHour);
}

/** The decimal amount (major units) of minor units, for a form's input: 1250 USD → 12.5. */
export function minorToMajor(minor: number, currency: string): number {
  return minor / 10 ** minorDigits(currency);
}

const DECIMAL = /^\d+(?:\.(\d*))?$|^\.(\d+)$/;

/**
 * Minor units of an amount a person typed in major units ("12.50", "1,204.5", "12" in USD →
 * 1250, 120450, 1200). Group commas and spaces are ignored; the decimal separator is a point.
 * Empty text is null. Text that is not an amount is NaN; more decimals than the currency has
 * gives a fraction (1234.5), which the schemas' whole-number rule refuses by name.
 */
export function parseMajorToMinor(text: string, currency: string): number | null {
  const cleaned = text.trim().replace(/[,\s\u00a0\u202f]/g, '');
  if (cleaned === '') return null;
  const match = DECIMAL.exec(cleaned);
  if (!match) return Number.NaN;
  const digits = minorDigits(currency);
  const [whole, fraction = ''] = cleaned.split('.');
  const padded = fraction.padEnd(digits, '0');
  const minor = Number(`${whole || '0'}${padded.slice(0, digits)}`);
  const rest = padded.slice(digits);
  // more decimals than the currency has: keep them as a fraction so the rule can name it
  return rest && /[1-9]/.test(rest) ? minor + Number(`0.${rest}`) : minor;
}
