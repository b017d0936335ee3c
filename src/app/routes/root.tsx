import { Outlet, ScrollRestoration } from 'react-router-dom';
import { Brand } from '../../components/layouts/brand';
import { NavigationProgress } from '../../components/layouts/navigation-progress';
import { Spinner } from '../../components/ui/spinner';

export function RootLayout() {
  return (
    <>
      <NavigationProgress />
      <ScrollRestoration />
      <Outlet />
    </>
  );
}

/** Shown while the first page's data loads (usually the session lookup). */
export function AppLoading() {
  return (
    <div role="status" className="flex min-h-dvh flex-col items-center justify-center gap-4">
      <Brand />
      <span className="flex items-center gap-2 text-field-700">
        <Spinner /> Loading…
      </span>
    </div>
  );
}
