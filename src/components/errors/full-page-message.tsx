import type { ReactNode } from 'react';
import { Icon, type IconName } from '../ui/icons';

/** A whole-page message (not found, no access, crashed), centred, with the ways out. */
export function FullPageMessage({
  icon,
  title,
  children,
  actions,
  inShell = false,
}: {
  icon: IconName;
  title: string;
  children: ReactNode;
  actions?: ReactNode;
  /** inside the app shell, which already has the page's <main> */
  inShell?: boolean;
}) {
  const Frame = inShell ? 'div' : 'main';
  return (
    <Frame
      id={inShell ? undefined : 'main'}
      tabIndex={inShell ? undefined : -1}
      className="flex min-h-[60dvh] items-center justify-center px-4 py-12 focus:outline-none"
    >
      <title>{`${title} · Hourstone`}</title>
      <div className="flex max-w-md flex-col items-center gap-4 text-center">
        <span className="flex size-16 items-center justify-center rounded-full bg-oat-100 text-loam-700">
          <Icon name={icon} className="size-8" />
        </span>
        <h1 className="text-2xl font-black text-field-950">{title}</h1>
        <div className="text-field-700">{children}</div>
        {actions ? <div className="flex flex-wrap justify-center gap-2">{actions}</div> : null}
      </div>
    </Frame>
  );
}
