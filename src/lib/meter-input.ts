import type { UnitSystem } from '../../shared/constants';

/**
 * A typed meter value as a number, NaN when it is not one. Imperial farms write 3,118.5 (comma
 * groups thousands); metric farms often type 3118,5 on a phone keypad (comma is the decimal).
 * The shared schema then names what is wrong with the number, exactly as the server would.
 * Every meter field of the client reads its text here (Log hours, the machine page's reading,
 * correction and meter-replacement forms, the walkaround).
 */
export function parseMeterInput(text: string, units: UnitSystem): number {
  let s = text.replace(/\s/g, '');
  if (units === 'imperial') s = s.replace(/,/g, '');
  else if (/^\d+,\d+$/.test(s)) s = s.replace(',', '.');
  return /^\d+(\.\d+)?$/.test(s) ? Number(s) : Number.NaN;
}

/** react-hook-form's `setValueAs` for a meter field: empty stays undefined (the schema says it is required). */
export const meterValueAs = (units: UnitSystem) => ({
  setValueAs: (value: unknown) =>
    value === '' || value == null ? undefined : parseMeterInput(String(value), units),
});
