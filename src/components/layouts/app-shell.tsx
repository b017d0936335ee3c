import { useEffect, useRef, type ReactNode } from 'react';
import { Link, useLocation } from 'react-router-dom';
import { Brand } from './brand';
import { MainNav, type MainNavItem } from './main-nav';
import { SkipLink } from './skip-link';

interface AppShellProps {
  homeHref: string;
  navItems: MainNavItem[];
  /** the organization switcher, and anything else that belongs in the header's right side */
  headerEnd: ReactNode;
  children: ReactNode;
}

/** The signed-in frame: skip link, header with organization switcher, main navigation, page. */
export function AppShell({ homeHref, navItems, headerEnd, children }: AppShellProps) {
  const mainRef = useRef<HTMLElement>(null);
  const { pathname } = useLocation();
  const shownPath = useRef(pathname);

  // After client-side navigation, move focus to the new page so screen readers announce it
  // (a full page load does this by itself).
  useEffect(() => {
    if (shownPath.current === pathname) return;
    shownPath.current = pathname;
    mainRef.current?.focus({ preventScroll: true });
  }, [pathname]);

  return (
    <div className="min-h-dvh">
      <SkipLink />
      <header className="sticky top-0 z-40 border-b border-field-200 bg-oat-50/95 backdrop-blur print:hidden">
        <div className="flex h-16 items-center gap-3 px-3 sm:px-5">
          <Link to={homeHref} className="flex min-h-touch items-center rounded-lg pr-1">
            <Brand compact />
          </Link>
          <div className="ml-auto flex min-w-0 flex-1 items-center justify-end gap-3">
            {headerEnd}
          </div>
        </div>
      </header>
      {/* printing (a machine label) shows the page alone, without the frame */}
      <div className="sm:grid sm:grid-cols-[14rem_minmax(0,1fr)] print:block">
        {/* the column carries the divider so it runs the page's full height */}
        <div className="sm:border-r sm:border-field-200 print:hidden">
          <MainNav items={navItems} />
        </div>
        <main
          id="main"
          ref={mainRef}
          tabIndex={-1}
          className="mx-auto w-full max-w-5xl px-4 pt-6 pb-28 focus:outline-none sm:px-8 sm:pt-8 sm:pb-12 print:max-w-none print:p-0"
        >
          {children}
        </main>
      </div>
    </div>
  );
}
