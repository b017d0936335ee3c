import { mkdtempSync, mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { get, type IncomingHttpHeaders } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import {
  brotliCompressSync,
  brotliDecompressSync,
  constants,
  gzipSync,
  gunzipSync,
} from 'node:zlib';
import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';

// The built client as the API serves it: compressed text, hashed assets cached for good,
// index.html revalidated so a deploy shows at once. A throw-away dist folder stands in for vite's.
const dist = mkdtempSync(path.join(tmpdir(), 'hourstone-dist-'));
mkdirSync(path.join(dist, 'assets'));
const script = `export const rows = [${Array.from({ length: 400 }, (_, i) => `"row ${i}"`).join(',')}];\n`;
writeFileSync(path.join(dist, 'assets', 'index-Ab12Cd34.js'), script);
// A file the build compressed ahead (vite-plugin-compression2 writes .br and .gz beside it).
const styles = `.row{color:#123}\n`.repeat(300);
const stylesBr = brotliCompressSync(styles, {
  params: { [constants.BROTLI_PARAM_QUALITY]: constants.BROTLI_MAX_QUALITY },
});
writeFileSync(path.join(dist, 'assets', 'index-Ef56Gh78.css'), styles);
writeFileSync(path.join(dist, 'assets', 'index-Ef56Gh78.css.br'), stylesBr);
writeFileSync(path.join(dist, 'assets', 'index-Ef56Gh78.css.gz'), gzipSync(styles, { level: 9 }));
writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Hourstone</title>');
writeFileSync(path.join(dist, 'favicon.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
// What vite-plugin-pwa writes at the top level: the service worker, its Workbox runtime, the manifest.
writeFileSync(path.join(dist, 'sw.js'), "importScripts('workbox-1a2b3c4d.js');\n");
writeFileSync(path.join(dist, 'workbox-1a2b3c4d.js'), 'self.workbox = {};\n');
writeFileSync(path.join(dist, 'manifest.webmanifest'), '{"name":"Hourstone"}');
afterAll(() => rmSync(dist, { recursive: true, force: true }));

const app = createApp({ serveClient: true, clientDist: dist });

/** The bytes as they travel (supertest would decompress them before the test sees them). */
async function rawGet(url: string, acceptEncoding: string) {
  const server = app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const { port } = server.address() as AddressInfo;
  try {
    return await new Promise<{ headers: IncomingHttpHeaders; body: Buffer }>((resolve, reject) => {
      get(
        { host: '127.0.0.1', port, path: url, headers: { 'Accept-Encoding': acceptEncoding } },
        (res) => {
          const chunks: Buffer[] = [];
          res.on('data', (c: Buffer) => chunks.push(c));
          res.on('end', () => resolve({ headers: res.headers, body: Buffer.concat(chunks) }));
        },
      ).on('error', reject);
    });
  } finally {
    server.close();
  }
}

describe('client files', () => {
  it('hashed assets are cached for a year, immutable, and sent brotli-compressed when asked', async () => {
    const res = await rawGet('/assets/index-Ab12Cd34.js', 'br, gzip');
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.headers['content-encoding']).toBe('br');
    expect(brotliDecompressSync(res.body).toString('utf8')).toBe(script);
    expect(res.body.length).toBeLessThan(script.length / 2);
  });

  it("the build's own compressed copy is sent as it is, with the asset's type and caching", async () => {
    const br = await rawGet('/assets/index-Ef56Gh78.css', 'gzip, deflate, br');
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['content-type']).toMatch(/^text\/css/);
    expect(br.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(br.headers.vary).toMatch(/Accept-Encoding/i);
    expect(br.body.equals(stylesBr)).toBe(true);
    const gz = await rawGet('/assets/index-Ef56Gh78.css', 'gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(gz.body).toString('utf8')).toBe(styles);
  });

  it('gzip for a client that only takes gzip; none for one that takes neither', async () => {
    const gz = await rawGet('/assets/index-Ab12Cd34.js', 'gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(gz.body).toString('utf8')).toBe(script);
    const plain = await request(app)
      .get('/assets/index-Ab12Cd34.js')
      .set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text).toBe(script);
  });

  it('index.html, top-level files and app routes are revalidated on every visit', async () => {
    for (const url of ['/', '/machines/123', '/favicon.svg']) {
      const res = await request(app).get(url);
      expect(res.status, url).toBe(200);
      expect(res.headers['cache-control'], url).toBe('no-cache');
    }
    expect((await request(app).get('/due')).text).toContain('<title>Hourstone</title>');
  });

  it('the service worker, its runtime and the web app manifest are revalidated, with their types', async () => {
    // A cached sw.js would keep an old app running past a deploy: browsers revalidate a worker
    // script at most once a day unless told no-cache (Service Workers spec, update check).
    const types: Record<string, RegExp> = {
      '/sw.js': /^(application|text)\/javascript/,
      '/workbox-1a2b3c4d.js': /^(application|text)\/javascript/,
      '/manifest.webmanifest': /^application\/manifest\+json/,
    };
    for (const [url, type] of Object.entries(types)) {
      const res = await request(app).get(url);
      expect(res.status, url).toBe(200);
      expect(res.headers['cache-control'], url).toBe('no-cache');
      expect(res.headers['content-type'], url).toMatch(type);
    }
  });

  it('a missing asset is a 404, not the app page (a stale tab must not run HTML as a script)', async () => {
    const res = await request(app).get('/assets/index-Old00000.js');
    expect(res.status).toBe(404);
    expect(res.text).not.toContain('<title>Hourstone</title>');
  });

  it('API answers are compressed too', async () => {
    const res = await request(app).get('/api/v1/openapi.json').set('Accept-Encoding', 'gzip');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.body.openapi).toMatch(/^3\./);
  });
});
