import type { ReactNode } from 'react';
import { Button } from './button';
import { Icon, type IconName } from './icons';

interface ErrorStateProps {
  title?: string;
  message: ReactNode;
  icon?: IconName;
  onRetry?: () => void;
  retrying?: boolean;
  action?: ReactNode;
}

/** A part of the page that could not load: say what failed and offer the way forward. */
export function ErrorState({
  title = "This didn't load",
  message,
  icon = 'error',
  onRetry,
  retrying = false,
  action,
}: ErrorStateProps) {
  return (
    <div
      role="alert"
      className="flex flex-col items-center gap-3 rounded-xl border-2 border-poppy-200 bg-poppy-50 px-6 py-8 text-center"
    >
      <span className="flex size-12 items-center justify-center rounded-full bg-white text-poppy-700">
        <Icon name={icon} className="size-6" />
      </span>
      <h2 className="text-lg font-black text-poppy-900">{title}</h2>
      <div className="max-w-md text-poppy-900">{message}</div>
      {onRetry || action ? (
        <div className="mt-1 flex flex-wrap justify-center gap-2">
          {onRetry ? (
            <Button variant="secondary" icon="refresh" onClick={onRetry} pending={retrying}>
              Try again
            </Button>
          ) : null}
          {action}
        </div>
      ) : null}
    </div>
  );
}
