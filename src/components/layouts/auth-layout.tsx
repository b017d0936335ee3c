import type { ReactNode } from 'react';
import { Brand } from './brand';
import { SkipLink } from './skip-link';

/** The signed-out frame: sign-in, password reset, invitation acceptance. */
export function AuthLayout({
  title,
  description,
  children,
  footer,
}: {
  title: string;
  description?: ReactNode;
  children: ReactNode;
  footer?: ReactNode;
}) {
  return (
    <div className="flex min-h-dvh flex-col bg-oat-100">
      <title>{`${title} · Hourstone`}</title>
      <SkipLink />
      <header className="px-4 pt-6 sm:px-8">
        <Brand />
      </header>
      <main
        id="main"
        tabIndex={-1}
        className="flex flex-1 items-start justify-center px-4 py-8 focus:outline-none sm:items-center"
      >
        <div className="w-full max-w-md">
          <div className="rounded-2xl border border-oat-300 bg-white p-5 shadow-card sm:p-8">
            <h1 className="text-2xl font-black text-field-950">{title}</h1>
            {description ? <div className="mt-2 text-field-700">{description}</div> : null}
            <div className="mt-6">{children}</div>
          </div>
          {footer ? <div className="mt-4 text-center text-field-700">{footer}</div> : null}
        </div>
      </main>
      <footer className="px-4 pb-6 text-center text-sm text-field-600">
        Hourstone keeps track of service intervals. Always follow your operator's manual.
      </footer>
    </div>
  );
}
