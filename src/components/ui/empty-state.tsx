import type { ReactNode } from 'react';
import { Icon, type IconName } from './icons';

interface EmptyStateProps {
  icon?: IconName;
  title: string;
  children?: ReactNode;
  action?: ReactNode;
}

/** What a list or page shows when there is nothing yet: what will be here, and how it gets here. */
export function EmptyState({ icon = 'field', title, children, action }: EmptyStateProps) {
  return (
    <div className="flex flex-col items-center gap-3 rounded-xl border-2 border-dashed border-field-200 bg-white/60 px-6 py-10 text-center">
      <span className="flex size-14 items-center justify-center rounded-full bg-oat-100 text-loam-600">
        <Icon name={icon} className="size-7" />
      </span>
      <h2 className="text-lg font-black text-field-900">{title}</h2>
      {children ? <div className="max-w-md text-field-700">{children}</div> : null}
      {action ? <div className="mt-1">{action}</div> : null}
    </div>
  );
}
