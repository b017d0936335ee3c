import { useId } from 'react';
import { WALKAROUND_RESULTS, type WalkaroundResult } from '../../../../shared/schemas/walkarounds';
import { cx } from '../../../components/ui/cx';
import { Icon, type IconName } from '../../../components/ui/icons';

// Short words for the thumb-sized buttons; each has its own icon as well as its colour.
const CHOICES: Record<WalkaroundResult, { label: string; icon: IconName; checked: string }> = {
  ok: { label: 'OK', icon: 'check', checked: 'border-clover-700 bg-clover-700 text-white' },
  attention: {
    label: 'Attention',
    icon: 'alert',
    checked: 'border-straw-600 bg-straw-300 text-straw-900',
  },
  fail: { label: 'Fail', icon: 'error', checked: 'border-poppy-700 bg-poppy-700 text-white' },
};

export const resultLabel = (result: WalkaroundResult) => CHOICES[result].label;

/**
 * Three big radio buttons (OK, Attention, Fail) as one radiogroup named by the item's label.
 * Native radios, so arrow keys and screen readers work as everywhere else.
 */
export function ResultChoice({
  name,
  labelledBy,
  describedBy,
  value,
  invalid,
  onChange,
}: {
  name: string;
  labelledBy: string;
  describedBy?: string;
  value: WalkaroundResult | null;
  invalid: boolean;
  onChange: (result: WalkaroundResult) => void;
}) {
  const groupId = useId();
  return (
    <div
      role="radiogroup"
      aria-labelledby={labelledBy}
      aria-describedby={describedBy}
      aria-invalid={invalid || undefined}
      className="grid grid-cols-3 gap-2"
    >
      {WALKAROUND_RESULTS.map((result) => {
        const choice = CHOICES[result];
        const checked = value === result;
        return (
          <label
            key={result}
            className={cx(
              'relative flex min-h-14 cursor-pointer flex-col items-center justify-center gap-0.5 rounded-xl border-2 px-1 py-1.5 text-center font-black select-none',
              'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-sky-600',
              checked
                ? choice.checked
                : cx(
                    'bg-white text-field-800 active:bg-field-100',
                    invalid ? 'border-poppy-400' : 'border-field-300',
                  ),
            )}
          >
            <input
              type="radio"
              name={`${groupId}-${name}`}
              value={result}
              checked={checked}
              onChange={() => onChange(result)}
              // over the whole button, invisible: a tap anywhere on it is a tap on the radio
              className="absolute inset-0 size-full cursor-pointer appearance-none rounded-xl opacity-0"
            />
            <Icon name={choice.icon} className="size-5" />
            <span>{choice.label}</span>
          </label>
        );
      })}
    </div>
  );
}
