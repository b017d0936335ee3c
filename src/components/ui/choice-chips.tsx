import { useId } from 'react';
import { cx } from './cx';

/**
 * One choice of a few, as a row of chips that wraps on a phone: native radio buttons, so the
 * arrow keys move between them and a screen reader names the group and each choice.
 */
export function ChoiceChips<T extends string>({
  legend,
  options,
  value,
  onChange,
  className,
}: {
  legend: string;
  options: { value: T; label: string }[];
  value: T;
  onChange: (value: T) => void;
  className?: string;
}) {
  const name = useId();
  return (
    <fieldset className={cx('min-w-0', className)}>
      <legend className="mb-2 font-bold text-field-900">{legend}</legend>
      <div className="flex flex-wrap gap-2">
        {options.map((option) => (
          <label
            key={option.value}
            className={cx(
              'inline-flex min-h-touch max-w-full cursor-pointer items-center rounded-full border px-4 font-bold break-words',
              'has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-field-700',
              option.value === value
                ? 'border-field-800 bg-field-800 text-white'
                : 'border-field-300 bg-white text-field-800 hover:bg-field-50',
            )}
          >
            <input
              type="radio"
              name={name}
              value={option.value}
              checked={option.value === value}
              onChange={() => onChange(option.value)}
              className="sr-only"
            />
            {option.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
