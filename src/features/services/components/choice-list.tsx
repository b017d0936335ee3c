import { useId, type ReactNode } from 'react';
import { Icon } from '../../../components/ui/icons';

export interface Choice {
  value: string;
  label: string;
  /** a second line under the label: status, labour, caution */
  detail?: ReactNode;
}

interface ChoiceListProps {
  legend: string;
  hint?: ReactNode;
  error?: string;
  options: readonly Choice[];
  value: readonly string[];
  onChange: (next: string[]) => void;
  /** shown instead of the list when there is nothing to choose */
  emptyText: string;
}

/**
 * Checkboxes one per line, for choices with long names (tasks, defects): each row is a full-width
 * touch target with its own label; the selection keeps the order of the options.
 */
export function ChoiceList({
  legend,
  hint,
  error,
  options,
  value,
  onChange,
  emptyText,
}: ChoiceListProps) {
  const id = useId();
  const toggle = (option: string, checked: boolean) => {
    const chosen = new Set(value);
    if (checked) chosen.add(option);
    else chosen.delete(option);
    onChange(options.map((o) => o.value).filter((v) => chosen.has(v)));
  };
  return (
    <fieldset
      className="flex flex-col gap-1.5"
      aria-describedby={
        [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].join(' ').trim() || undefined
      }
    >
      <legend className="mb-1.5 font-bold text-field-900">{legend}</legend>
      {hint ? (
        <p id={`${id}-hint`} className="-mt-1 text-sm text-field-600">
          {hint}
        </p>
      ) : null}
      {options.length === 0 ? (
        <p className="text-field-600">{emptyText}</p>
      ) : (
        <ul className="grid gap-2 lg:grid-cols-2">
          {options.map((option, i) => (
            <li key={option.value}>
              <label className="flex min-h-touch cursor-pointer items-start gap-3 rounded-lg border border-field-200 bg-white px-3 py-2.5 has-[:checked]:border-field-600 has-[:checked]:bg-field-50">
                {/* named by the label line alone; the detail line is its description */}
                <input
                  type="checkbox"
                  className="mt-0.5 size-5 shrink-0 accent-field-800"
                  aria-labelledby={`${id}-${i}-label`}
                  aria-describedby={option.detail ? `${id}-${i}-detail` : undefined}
                  checked={value.includes(option.value)}
                  onChange={(event) => toggle(option.value, event.target.checked)}
                />
                <span className="flex min-w-0 flex-col gap-0.5">
                  <span id={`${id}-${i}-label`} className="font-bold text-field-950">
                    {option.label}
                  </span>
                  {option.detail ? (
                    <span id={`${id}-${i}-detail`} className="text-sm text-field-700">
                      {option.detail}
                    </span>
                  ) : null}
                </span>
              </label>
            </li>
          ))}
        </ul>
      )}
      {error ? (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm font-bold text-poppy-700">
          <Icon name="error" className="mt-0.5 size-4" />
          <span>{error}</span>
        </p>
      ) : null}
    </fieldset>
  );
}
