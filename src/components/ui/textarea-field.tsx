import { useId, type ReactNode, type Ref, type TextareaHTMLAttributes } from 'react';
import { cx } from './cx';
import { Icon } from './icons';

interface TextareaFieldProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'id'> {
  label: string;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLTextAreaElement>;
}

/** A multi-line text input with its label, hint and error, like TextField. */
export function TextareaField({ label, hint, error, className, ref, ...rest }: TextareaFieldProps) {
  const id = useId();
  const describedBy = cx(hint ? `${id}-hint` : null, error ? `${id}-error` : null) || undefined;
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="font-bold text-field-900">
        {label}
      </label>
      {hint ? (
        <p id={`${id}-hint`} className="text-sm text-field-600">
          {hint}
        </p>
      ) : null}
      <textarea
        id={id}
        ref={ref}
        rows={3}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={cx(
          'min-h-touch w-full rounded-lg border bg-white px-3 py-2 text-base text-field-950',
          'placeholder:text-field-400',
          error ? 'border-2 border-poppy-600' : 'border-field-300 hover:border-field-500',
          className,
        )}
        {...rest}
      />
      {error ? (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm font-bold text-poppy-700">
          <Icon name="error" className="mt-0.5 size-4" />
          <span>{error}</span>
        </p>
      ) : null}
    </div>
  );
}
