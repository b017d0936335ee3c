import type { ButtonHTMLAttributes } from 'react';
import { cx } from './cx';
import { Icon, type IconName } from './icons';
import { Spinner } from './spinner';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'ghost';

const VARIANTS: Record<ButtonVariant, string> = {
  primary: 'bg-field-800 text-oat-50 hover:bg-field-900 active:bg-field-950 shadow-sm',
  secondary:
    'bg-white text-field-900 border border-field-300 hover:bg-field-50 hover:border-field-400',
  danger: 'bg-poppy-700 text-white hover:bg-poppy-800 active:bg-poppy-900 shadow-sm',
  ghost: 'text-field-800 hover:bg-field-100',
};

/** Classes for anything that should look like a button (a router Link, for one). */
export function buttonClasses(variant: ButtonVariant = 'primary', className?: string) {
  return cx(
    // min-h-touch: 44 px targets for thumbs and gloves
    'inline-flex min-h-touch items-center justify-center gap-2 rounded-lg px-4 py-2 font-bold',
    'transition-colors disabled:cursor-not-allowed disabled:opacity-60',
    VARIANTS[variant],
    className,
  );
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  icon?: IconName;
  /** Shows a spinner and blocks a second submit while the request runs. */
  pending?: boolean;
}

export function Button({
  variant = 'primary',
  icon,
  pending = false,
  className,
  children,
  disabled,
  type = 'button',
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClasses(variant, className)}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      {...rest}
    >
      {pending ? <Spinner /> : icon ? <Icon name={icon} /> : null}
      {children}
    </button>
  );
}
