// The service worker keeps the API's answers for opening the app offline (vite.config.ts,
// runtimeCaching). They hold one person's farm data, so the page empties that cache whenever the
// person changes: at sign-in, at sign-out, and when the session probe finds nobody signed in.

/** The Workbox cache of GET /api/v1 answers (the name in vite.config.ts). */
export const API_CACHE = 'hourstone-api';

export async function clearApiCache(): Promise<void> {
  try {
    if (typeof caches !== 'undefined') await caches.delete(API_CACHE);
  } catch {
    // no Cache Storage here (an insecure origin, a private window): nothing was kept
  }
}
