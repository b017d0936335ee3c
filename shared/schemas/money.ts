import { z } from 'zod';

// Money travels as integer minor units of the organization's currency (fields named …Minor):
// 1250 is 12.50 in USD, 1,250 yen in JPY. The client's forms take decimal amounts and convert
// (shared/domain/money.ts); the API takes and gives whole minor units only.

const grouped = (n: number) => n.toLocaleString('en-US');

/** Largest single amount, minor units: 100 million in a two-decimal currency. */
export const MONEY_MAX_MINOR = 10_000_000_000;

/** A whole, non-negative number of minor units, at most `max`, named by `label`. */
export function minorAmount(label: string, max = MONEY_MAX_MINOR) {
  return z
    .number({ error: `${label} must be a number` })
    .int({
      error: `${label} is in minor units (cents) and must be whole: use at most the currency's decimals`,
    })
    .min(0, { error: `${label} may not be negative` })
    .max(max, { error: `${label} must be at most ${grouped(max)} minor units` });
}

/** An ISO 4217 code in a response: the currency every …Minor amount beside it is counted in. */
export const currencyCodeSchema = z
  .string()
  .meta({ description: 'ISO 4217 code; the …Minor amounts are integer minor units of it' });
