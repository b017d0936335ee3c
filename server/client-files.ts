// Serving the built client: hashed files under /assets never change (a new build gives new
// names), so browsers may keep them a year without asking; index.html and the other files at the
// top level (icons, the manifest) are revalidated on every visit so a deploy is picked up at once.
import path from 'node:path';
import express, { type Express } from 'express';
import expressStaticGzip from 'express-static-gzip';

/** One year, the longest lifetime caches honour; `immutable` skips revalidation on reload. */
const HASHED_ASSET_CACHE = 'public, max-age=31536000, immutable';
const REVALIDATE = 'no-cache';

export function serveClient(app: Express, dist: string) {
  // The build's own .br/.gz copies (vite-plugin-compression2) are sent when the browser takes them;
  // a file without one is compressed on the fly by the compression middleware.
  app.use(
    '/assets',
    expressStaticGzip(path.join(dist, 'assets'), {
      enableBrotli: true,
      orderPreference: ['br', 'gzip'],
      index: false,
      serveStatic: {
        index: false,
        fallthrough: false,
        setHeaders: (res) => res.setHeader('Cache-Control', HASHED_ASSET_CACHE),
      },
    }),
  );
  app.use(
    express.static(dist, {
      index: false,
      setHeaders: (res) => res.setHeader('Cache-Control', REVALIDATE),
    }),
  );
  // Any other path is a route of the single-page app.
  app.get('/{*splat}', (_req, res) => {
    res.setHeader('Cache-Control', REVALIDATE);
    res.sendFile(path.join(dist, 'index.html'));
  });
}
