import { QueryClientProvider } from '@tanstack/react-query';
import { RouterProvider } from 'react-router-dom';
import { FullPageMessage } from '../components/errors/full-page-message';
import { ErrorBoundary } from '../components/errors/error-boundary';
import { ReconnectingBanner } from '../components/errors/reconnecting-banner';
import { OfflineBanner } from '../components/layouts/offline-banner';
import { UpdatePrompt } from '../components/layouts/update-prompt';
import { Button } from '../components/ui/button';
import { clearSession, type Me } from '../lib/auth';
import { createQueryClient } from '../lib/query-client';
import { paths } from './paths';
import { createAppRouter } from './router';
import { queryKeys } from '../lib/query-keys';

// One query client and one router for the life of the page.
const queryClient = createQueryClient({
  onUnauthorized: () => {
    // Only a session that ended while in use needs handling; signed-out pages expect 401s.
    if (!queryClient.getQueryData<Me | null>(queryKeys.session.me())) return;
    // Leave the cache's error notification before clearing the cache under it.
    setTimeout(() => {
      clearSession(queryClient);
      const { pathname, search } = window.location;
      void router.navigate(paths.signIn.href(pathname + search), { replace: true });
    });
  },
});
const router = createAppRouter(queryClient);

export function AppProviders() {
  return (
    <ErrorBoundary
      fallback={({ reset }) => (
        <FullPageMessage
          icon="error"
          title="Something went wrong"
          actions={
            <Button onClick={() => (reset(), window.location.reload())}>Reload the page</Button>
          }
        >
          <p>The app stopped working. Reloading usually helps; nothing you saved is lost.</p>
        </FullPageMessage>
      )}
    >
      <QueryClientProvider client={queryClient}>
        <RouterProvider router={router} />
        <ReconnectingBanner />
        <OfflineBanner />
        <UpdatePrompt />
      </QueryClientProvider>
    </ErrorBoundary>
  );
}
