// What each kind of meter is, where a rule depends on it. One place, so the server's refusal,
// the reading form and the README agree.
import { METER_KIND_UNITS, type MeterKind, type MeterUnit } from '../constants';

/**
 * The counting meters: they count things a machine makes (a baler's bales), and the operator
 * zeroes them at will (per field, per customer, per season), so a reading below the last one may
 * be a counter reset. Hour meters (engine, separator, PTO) and distance or area meters are not
 * zeroed in use: a lower figure there is a typing error or a new meter (a meter replacement).
 */
export const COUNTING_METER_KINDS = ['bales'] as const satisfies readonly MeterKind[];

/** Whether a counter reset may be recorded on a meter of this kind (a counting meter). */
export function isCountingMeter(kind: MeterKind): boolean {
  return (COUNTING_METER_KINDS as readonly MeterKind[]).includes(kind);
}

/** Whether readings in this unit come from a counting meter (bales): the unit of a counting kind. */
export function isCountingUnit(unit: MeterUnit): boolean {
  return COUNTING_METER_KINDS.some((kind) => METER_KIND_UNITS[kind] === unit);
}
