import { useRegisterSW } from 'virtual:pwa-register/react';
import { Button } from '../ui/button';

/** How often an open app asks whether a new version was deployed. */
const CHECK_EVERY_MS = 30 * 60_000;

/**
 * Registers the service worker and says when a new version is ready, instead of keeping a
 * stale app silently: the new one takes over when the person chooses to reload (a half-done
 * walkaround is kept on the phone either way).
 */
export function UpdatePrompt() {
  const {
    needRefresh: [needRefresh, setNeedRefresh],
    updateServiceWorker,
  } = useRegisterSW({
    onRegisteredSW(_url, registration) {
      if (!registration) return;
      window.setInterval(() => {
        if (navigator.onLine) void registration.update();
      }, CHECK_EVERY_MS);
    },
  });
  if (!needRefresh) return null;
  return (
    <div
      role="alert"
      className="fixed inset-x-2 bottom-20 z-50 mx-auto flex max-w-md flex-wrap items-center justify-between gap-3 rounded-xl border-2 border-field-700 bg-white p-4 text-field-900 shadow-card sm:bottom-4 print:hidden"
    >
      <p className="font-bold">A new version of Hourstone is ready.</p>
      <span className="flex gap-2">
        <Button variant="ghost" onClick={() => setNeedRefresh(false)}>
          Later
        </Button>
        <Button icon="refresh" onClick={() => void updateServiceWorker(true)}>
          Reload
        </Button>
      </span>
    </div>
  );
}
