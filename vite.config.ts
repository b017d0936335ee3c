import { defineConfig, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { compression } from 'vite-plugin-compression2';
import { VitePWA } from 'vite-plugin-pwa';
import { appIcons, pwaIcons } from './scripts/lib/pwa-icons';

const apiPort = process.env.PORT ?? '4310';

/**
 * `<link rel="modulepreload">` in index.html for a route module and the chunks it imports
 * statically (the entry's own left out), so a cold visit fetches them beside the entry instead of
 * after the entry has run and the router asked for the route. For the dashboard, where a signed-in
 * manager starts; other pages pay its few kilobytes.
 */
function preloadRoute(source: string): Plugin {
  return {
    name: 'hourstone:preload-route',
    apply: 'build',
    transformIndexHtml: {
      order: 'post',
      handler(_html, { bundle }) {
        if (!bundle) return;
        const chunks = Object.values(bundle).flatMap((c) => (c.type === 'chunk' ? [c] : []));
        const route = chunks.find((c) => c.facadeModuleId?.endsWith(source));
        if (!route) throw new Error(`preloadRoute: no chunk for ${source}`);
        const files = new Set<string>();
        const visit = (fileName: string) => {
          const chunk = bundle[fileName];
          if (files.has(fileName) || chunk?.type !== 'chunk' || chunk.isEntry) return;
          files.add(fileName);
          chunk.imports.forEach(visit);
        };
        visit(route.fileName);
        return [...files].map((file) => ({
          tag: 'link',
          attrs: { rel: 'modulepreload', crossorigin: true, href: `/${file}` },
          injectTo: 'head' as const,
        }));
      },
    },
  };
}

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    preloadRoute('src/app/routes/dashboard.tsx'),
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
