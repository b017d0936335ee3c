import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { compression } from 'vite-plugin-compression2';
import { VitePWA } from 'vite-plugin-pwa';
import { appIcons, pwaIcons } from './scripts/lib/pwa-icons';

const apiPort = process.env.PORT ?? '4310';

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    pwaIcons('public/favicon.svg'),
    // The installable app (issue 14): the manifest, and a Workbox service worker that keeps the
    // app shell (every built file) and the API answers this person saw, for opening offline.
    VitePWA({
      registerType: 'prompt',
      injectRegister: false,
      manifest: {
        name: 'Hourstone',
        short_name: 'Hourstone',
        description: 'Preventive maintenance for farm machinery, driven by hour meters.',
        theme_color: '#2b3a31',
        background_color: '#f6f1e7',
        display: 'standalone',
        start_url: '/',
        scope: '/',
        icons: appIcons,
      },
      workbox: {
        globPatterns: ['**/*.{js,css,html,svg,png,woff2}'],
        // the charts' chunk is larger than Workbox's 2 MiB default would allow only in source maps
        maximumFileSizeToCacheInBytes: 3 * 1024 * 1024,
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api\//],
        cleanupOutdatedCaches: true,
        runtimeCaching: [
          {
            // The API's JSON for whoever is signed in: fresh from the network when it answers
            // within a few seconds, else what was seen last. The client empties this cache at
            // sign-in, sign-out and whenever the session probe finds nobody signed in.
            urlPattern: ({ url, request }) =>
              url.pathname.startsWith('/api/v1/') && request.method === 'GET',
            handler: 'NetworkFirst',
            options: {
              cacheName: 'hourstone-api',
              networkTimeoutSeconds: 6,
              expiration: { maxEntries: 400, maxAgeSeconds: 14 * 24 * 60 * 60 },
              plugins: [
                {
                  // only JSON answers of 200: no files, no exports, no errors
                  cacheWillUpdate: async ({ response }) =>
                    response.status === 200 &&
                    (response.headers.get('content-type') ?? '').includes('application/json')
                      ? response
                      : null,
                },
              ],
            },
          },
        ],
      },
    }),
    // The build writes .br and .gz beside each text asset (brotli at its best quality, too slow per
    // request), which the API sends as they are (server/client-files.ts).
    compression({ algorithms: ['brotliCompress', 'gzip'] }),
  ],
  build: { outDir: 'dist', sourcemap: true, chunkSizeWarningLimit: 1500 },
  server: {
    port: Number(process.env.CLIENT_PORT ?? 5310),
    strictPort: true,
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
  },
});
