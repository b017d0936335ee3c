import type { ReactNode } from 'react';
import { Button } from '../../../components/ui/button';

/**
 * One editable line of a list (a part, a fluid, a cost, a measurement): its inputs in a grid that
 * stacks on a phone, and a remove button named after the line.
 */
export function LineRow({
  label,
  columns,
  onRemove,
  children,
  footer,
}: {
  /** "Part 2": the group's accessible name, also used by the remove button */
  label: string;
  /** grid template from the small breakpoint up */
  columns: string;
  onRemove: () => void;
  children: ReactNode;
  /** under the whole line (a message about the line as a whole) */
  footer?: ReactNode;
}) {
  return (
    <div
      role="group"
      aria-label={label}
      className={`grid gap-3 rounded-lg border border-field-200 bg-white p-3 sm:items-start ${columns}`}
    >
      {children}
      <Button
        variant="ghost"
        icon="trash"
        className="sm:mt-8"
        aria-label={`Remove ${label.toLowerCase()}`}
        onClick={onRemove}
      >
        Remove
      </Button>
      {footer ? <div className="sm:col-span-full">{footer}</div> : null}
    </div>
  );
}

/** A list of lines under a legend, with what it holds when empty and the add button. */
export function LineList({
  legend,
  hint,
  emptyText,
  addLabel,
  onAdd,
  children,
  count,
}: {
  legend: string;
  hint?: ReactNode;
  emptyText: string;
  addLabel: string;
  onAdd: () => void;
  children: ReactNode;
  count: number;
}) {
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-2 text-lg font-black text-field-900">{legend}</legend>
      {hint ? <div className="-mt-1 text-sm text-field-600">{hint}</div> : null}
      {count === 0 ? <p className="text-field-600">{emptyText}</p> : null}
      {children}
      <div>
        <Button variant="secondary" icon="plus" onClick={onAdd}>
          {addLabel}
        </Button>
      </div>
    </fieldset>
  );
}
