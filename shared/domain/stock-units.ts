// One stock unit per kind of quantity, so a parts counter sees grease once, not as 1.1 kg and
// 0.9 lb: volumes are summed in litres, masses in kilograms, counts stay counts, and the total is
// shown in the organization's units (L and kg on a metric one, US gal and lb on an imperial one).
// A unit this module does not know is never guessed at: it stays apart, in its own row.
// The factors are NIST Handbook 44, Appendix C (exact by definition). "gal" and "qt" are the US
// liquid gallon and quart, as the task and record forms mean them; an imperial gallon is another
// unit and is not known here.
import type { UnitSystem } from '../constants';

/** Litres in one US gallon (NIST Handbook 44, Appendix C: exact). */
export const LITRES_PER_US_GALLON = 3.785411784;
/** Litres in one US liquid quart, a quarter of the gallon (NIST HB 44, Appendix C: 0.946352946). */
export const LITRES_PER_US_QUART = LITRES_PER_US_GALLON / 4;
/** Kilograms in one avoirdupois pound (NIST Handbook 44, Appendix C: exact). */
export const KILOGRAMS_PER_POUND = 0.45359237;
/** Kilometres in one mile (NIST Handbook 44, Appendix C: international mile, exact). */
export const KILOMETRES_PER_MILE = 1.609344;

/** What a quantity measures: each kind has one base unit (L, kg, each). */
export type StockKind = 'volume' | 'mass' | 'count';

/** The units known here, as written on tasks and records, with base units (L, kg, each) per one. */
const KNOWN = {
  L: { kind: 'volume', base: 1 },
  mL: { kind: 'volume', base: 0.001 },
  gal: { kind: 'volume', base: LITRES_PER_US_GALLON },
  qt: { kind: 'volume', base: LITRES_PER_US_QUART },
  kg: { kind: 'mass', base: 1 },
  g: { kind: 'mass', base: 0.001 },
  lb: { kind: 'mass', base: KILOGRAMS_PER_POUND },
  each: { kind: 'count', base: 1 },
} as const satisfies Record<string, { kind: StockKind; base: number }>;
export type KnownUnit = keyof typeof KNOWN;

// Other spellings of the same units (lower case, dots and extra spaces aside).
const SPELLINGS: Record<string, KnownUnit> = {
  l: 'L',
  litre: 'L',
  litres: 'L',
  liter: 'L',
  liters: 'L',
  ml: 'mL',
  millilitre: 'mL',
  millilitres: 'mL',
  milliliter: 'mL',
  milliliters: 'mL',
  gal: 'gal',
  'us gal': 'gal',
  'gal us': 'gal',
  usgal: 'gal',
  'us gallon': 'gal',
  'us gallons': 'gal',
  qt: 'qt',
  'us qt': 'qt',
  'qt us': 'qt',
  'us quart': 'qt',
  'us quarts': 'qt',
  kg: 'kg',
  kgs: 'kg',
  kilogram: 'kg',
  kilograms: 'kg',
  g: 'g',
  gram: 'g',
  grams: 'g',
  lb: 'lb',
  lbs: 'lb',
  pound: 'lb',
  pounds: 'lb',
  each: 'each',
  ea: 'each',
  pc: 'each',
  pcs: 'each',
  piece: 'each',
  pieces: 'each',
};

/** The stock unit of each kind, by the organization's unit system. */
export const STOCK_UNITS: Record<UnitSystem, Record<StockKind, KnownUnit>> = {
  metric: { volume: 'L', mass: 'kg', count: 'each' },
  imperial: { volume: 'gal', mass: 'lb', count: 'each' },
};

/** How a unit reads on screen: the US gallon and quart say so; anything else as written. */
export const stockUnitLabel = (unit: string): string =>
  unit === 'gal' ? 'US gal' : unit === 'qt' ? 'US qt' : unit;

/** A unit as written ("US gal", "lbs", "Litres") as the known unit, or null when unknown. */
export function knownUnit(unit: string): KnownUnit | null {
  const key = unit.trim().toLowerCase().replace(/\./g, '').replace(/\s+/g, ' ');
  return SPELLINGS[key] ?? null;
}

/** A quantity in its kind's base unit (litres, kilograms or a count), or null for an unknown unit. */
export function toBaseUnit(
  quantity: number,
  unit: string,
): { kind: StockKind; base: number } | null {
  const known = knownUnit(unit);
  if (!known) return null;
  const { kind, base } = KNOWN[known];
  return { kind, base: quantity * base };
}

/** A base quantity (L, kg or a count) in the organization's stock unit of that kind. */
export function fromBaseUnit(
  base: number,
  kind: StockKind,
  units: UnitSystem,
): { quantity: number; unit: KnownUnit } {
  const unit = STOCK_UNITS[units][kind];
  return { quantity: base / KNOWN[unit].base, unit };
}

/** A quantity in another unit of the same kind (5 gal → 18.927 L), or null when they differ. */
export function convertQuantity(quantity: number, from: string, to: string): number | null {
  const source = toBaseUnit(quantity, from);
  const target = knownUnit(to);
  if (!source || !target || KNOWN[target].kind !== source.kind) return null;
  return source.base / KNOWN[target].base;
}
