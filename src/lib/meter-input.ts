import type { FieldError, FieldValues, Resolver } from 'react-hook-form';
import type { UnitSystem } from '../../shared/constants';
import { meterNumberMessage, parseMeterNumber } from '../../shared/domain/meter-number';

// Every meter field of the client reads its text through the one rule the CSV imports use too
// (shared/domain/meter-number.ts): Log hours, the machine page's reading, correction and
// meter-replacement forms, last done, the service record's meter, the walkaround. An imperial farm
// writes 3,118.5; a metric farm 3118,5 or 3.118,5.

/** A typed meter value as a number, NaN when the farm's rule refuses it (meterInputError says why). */
export function parseMeterInput(text: string, units: UnitSystem): number {
  const read = parseMeterNumber(text, units);
  return read.ok ? read.value : Number.NaN;
}

/** Why a typed meter value is not a number on this farm, as a sentence; null when it is one. */
export function meterInputError(text: string, units: UnitSystem): string | null {
  const read = parseMeterNumber(text, units);
  return read.ok ? null : meterNumberMessage(text, read);
}

/**
 * What a meter field holds while its text is refused: the message. The schema refuses it (it is
 * not a number); `withMeterReasons` puts this message in place of "must be a number".
 */
export class RefusedMeterText {
  constructor(readonly message: string) {}
}

/**
 * react-hook-form's `setValueAs` for a meter field: empty stays undefined (the schema says it is
 * required), a number (a default value) stays, text is read by the farm's rule.
 */
export const meterValueAs = (units: UnitSystem) => ({
  setValueAs: (value: unknown): number | undefined => {
    if (value === '' || value == null) return undefined;
    if (typeof value === 'number') return value;
    const read = parseMeterNumber(String(value), units);
    // The form's value type stays number: a refused text never passes the schema to reach submit.
    return (
      read.ok ? read.value : new RefusedMeterText(meterNumberMessage(String(value), read))
    ) as number;
  },
});

/**
 * A form's resolver with the reasons of refused meter fields (top-level fields read by
 * `meterValueAs`) in place of the schema's "must be a number".
 */
export function withMeterReasons<T extends FieldValues, C, O>(
  resolver: Resolver<T, C, O>,
): Resolver<T, C, O> {
  return async (values, context, options) => {
    const result = await resolver(values, context, options);
    const refused = Object.entries(values).filter(
      (entry): entry is [string, RefusedMeterText] => entry[1] instanceof RefusedMeterText,
    );
    if (!refused.length) return result;
    const errors: Record<string, FieldError> = { ...(result.errors as Record<string, FieldError>) };
    for (const [name, value] of refused) errors[name] = { type: 'meter', message: value.message };
    return { values: {}, errors: errors as typeof result.errors };
  };
}
