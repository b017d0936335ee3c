import { useId, type ReactNode } from 'react';
import { cx } from './cx';
import { Icon } from './icons';

interface CheckboxGroupProps<T extends string | number> {
  legend: string;
  hint?: ReactNode;
  error?: string;
  options: readonly { value: T; label: string }[];
  value: readonly T[];
  onChange: (next: T[]) => void;
  /** grid columns from the small breakpoint up (phones get two) */
  columns?: 2 | 3 | 4 | 6;
  className?: string;
}

const COLUMNS = {
  2: 'sm:grid-cols-2',
  3: 'sm:grid-cols-3',
  4: 'sm:grid-cols-4',
  6: 'sm:grid-cols-6',
};

/**
 * A set of checkboxes under one legend (months, hazards, people). Each box is a full-size touch
 * target with its own label; the selection keeps the order of the options.
 */
export function CheckboxGroup<T extends string | number>({
  legend,
  hint,
  error,
  options,
  value,
  onChange,
  columns = 3,
  className,
}: CheckboxGroupProps<T>) {
  const id = useId();
  const toggle = (option: T, checked: boolean) => {
    const chosen = new Set<T>(value);
    if (checked) chosen.add(option);
    else chosen.delete(option);
    onChange(options.map((o) => o.value).filter((v) => chosen.has(v)));
  };
  return (
    <fieldset
      className={cx('flex flex-col gap-1.5', className)}
      aria-describedby={cx(hint ? `${id}-hint` : null, error ? `${id}-error` : null) || undefined}
    >
      <legend className="mb-1.5 font-bold text-field-900">{legend}</legend>
      {hint ? (
        <p id={`${id}-hint`} className="-mt-1 text-sm text-field-600">
          {hint}
        </p>
      ) : null}
      <div className={cx('grid grid-cols-2 gap-2', COLUMNS[columns])}>
        {options.map((option) => (
          <label
            key={String(option.value)}
            className="flex min-h-touch cursor-pointer items-center gap-2 rounded-lg border border-field-200 bg-white px-3 py-2 has-[:checked]:border-field-600 has-[:checked]:bg-field-50"
          >
            <input
              type="checkbox"
              className="size-5 accent-field-800"
              checked={value.includes(option.value)}
              onChange={(event) => toggle(option.value, event.target.checked)}
            />
            <span>{option.label}</span>
          </label>
        ))}
      </div>
      {error ? (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm font-bold text-poppy-700">
          <Icon name="error" className="mt-0.5 size-4" />
          <span>{error}</span>
        </p>
      ) : null}
    </fieldset>
  );
}
