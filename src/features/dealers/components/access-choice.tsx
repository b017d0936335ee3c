import { useId } from 'react';
import {
  DEALER_ACCESS,
  DEALER_ACCESS_DESCRIPTIONS,
  DEALER_ACCESS_LABELS,
  type DealerAccess,
} from '../../../../shared/schemas/dealers';
import { cx } from '../../../components/ui/cx';

/** View or service, each with what it allows, as two large radio cards. */
export function AccessChoice({
  value,
  onChange,
  legend = 'Access',
}: {
  value: DealerAccess;
  onChange: (access: DealerAccess) => void;
  legend?: string;
}) {
  const name = useId();
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 font-bold text-field-900">{legend}</legend>
      {DEALER_ACCESS.map((access) => (
        <label
          key={access}
          className={cx(
            'flex min-h-touch cursor-pointer items-start gap-3 rounded-lg border bg-white p-3',
            value === access ? 'border-field-600 bg-field-50' : 'border-field-200',
          )}
        >
          <input
            type="radio"
            name={name}
            className="mt-1 size-5 accent-field-800"
            checked={value === access}
            onChange={() => onChange(access)}
          />
          <span>
            <span className="block font-bold">{DEALER_ACCESS_LABELS[access]}</span>
            <span className="block text-sm text-field-700">
              {DEALER_ACCESS_DESCRIPTIONS[access]}
            </span>
          </span>
        </label>
      ))}
    </fieldset>
  );
}
