import { useState } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';
import { parseMajorToMinor } from '../../../shared/domain/money';
import { moneyInputText } from '../../lib/format';
import { TextField } from './field';

// People type money as decimals in their currency ("18.40"); the form and the API hold integer
// minor units (1840). This field converts both ways: the text typed stays as typed while it
// means the value held, and shows the value afresh when the form changes it (a reset, a prefill).

const same = (a: unknown, b: unknown) => (a ?? null) === (b ?? null) || Object.is(a, b);

interface MoneyFieldProps<T extends FieldValues> {
  // the form's transformed values type does not matter here
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  control: Control<T, any, any>;
  name: Path<T>;
  label: string;
  /** ISO 4217 code: how many decimals a minor unit has */
  currency: string;
  error?: string;
  hint?: string;
  /** an empty box is undefined (so the schema names the missing amount), else null */
  required?: boolean;
}

/** A money amount typed in major units and held in minor units (empty: null, or undefined). */
export function MoneyField<T extends FieldValues>({
  control,
  name,
  label,
  currency,
  error,
  hint,
  required = false,
}: MoneyFieldProps<T>) {
  const { field } = useController({ control, name });
  const [typed, setTyped] = useState<string | null>(null);
  const minorOf = (text: string) =>
    parseMajorToMinor(text, currency) ?? (required ? undefined : null);
  const shown =
    typed !== null && same(minorOf(typed), field.value)
      ? typed
      : moneyInputText(field.value as number | null | undefined, currency);
  return (
    <TextField
      // the currency is part of the label: "18.40" alone does not say dollars or euros
      label={`${label} (${currency})`}
      hint={hint}
      error={error}
      inputMode="decimal"
      autoComplete="off"
      name={field.name}
      ref={field.ref}
      value={shown}
      onBlur={field.onBlur}
      onChange={(event) => {
        setTyped(event.target.value);
        field.onChange(minorOf(event.target.value));
      }}
    />
  );
}
