import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { afterEach, describe, expect, it } from 'vitest';
import { dashboardInitialJs } from '../../scripts/bench/client-build';

// The client bench's initial JavaScript (issue 14): read from a build manifest in Vite's format
// (https://vite.dev/guide/backend-integration: `file`, `isEntry`, `imports`, `dynamicImports`),
// here a small hand-made one whose chunk sizes are known.
let dist: string;

function writeBuild(manifest: object, files: Record<string, { bytes: number; gz?: number }>) {
  dist = mkdtempSync(path.join(tmpdir(), 'hourstone-bench-client-'));
  mkdirSync(path.join(dist, '.vite'));
  mkdirSync(path.join(dist, 'assets'));
  writeFileSync(path.join(dist, '.vite', 'manifest.json'), JSON.stringify(manifest));
  for (const [file, { bytes, gz }] of Object.entries(files)) {
    writeFileSync(path.join(dist, file), 'x'.repeat(bytes));
    if (gz !== undefined) writeFileSync(path.join(dist, `${file}.gz`), Buffer.alloc(gz));
  }
}

afterEach(() => rmSync(dist, { recursive: true, force: true }));

const manifest = {
  'index.html': {
    file: 'assets/index.js',
    isEntry: true,
    imports: ['_shared.js'],
    dynamicImports: ['src/app/routes/dashboard.tsx', 'src/app/routes/machine.tsx'],
    css: ['assets/index.css'],
  },
  'src/app/routes/dashboard.tsx': {
    file: 'assets/dashboard.js',
    isDynamicEntry: true,
    imports: ['index.html', '_shared.js', '_card.js'],
    dynamicImports: ['src/app/routes/dealer-board.tsx'],
  },
  '_shared.js': { file: 'assets/shared.js' },
  '_card.js': { file: 'assets/card.js', imports: ['_shared.js'] },
  'src/app/routes/machine.tsx': { file: 'assets/machine.js', imports: ['_charts.js'] },
  '_charts.js': { file: 'assets/charts.js' },
  'src/app/routes/dealer-board.tsx': { file: 'assets/dealer-board.js' },
};

describe('client bench — the dashboard route’s initial JavaScript from the build manifest', () => {
  it('counts the entry and the dashboard with their static imports once each, from the .gz files; leaves the dynamic imports out', () => {
    writeBuild(manifest, {
      'assets/index.js': { bytes: 10, gz: 50_000 },
      'assets/dashboard.js': { bytes: 10, gz: 8_000 },
      'assets/shared.js': { bytes: 10, gz: 20_000 },
      'assets/card.js': { bytes: 10, gz: 2_000 },
      'assets/machine.js': { bytes: 10, gz: 9_000 },
      'assets/charts.js': { bytes: 10, gz: 120_000 },
      'assets/dealer-board.js': { bytes: 10, gz: 7_000 },
    });
    const initial = dashboardInitialJs(dist);
    // 50,000 + 8,000 + 20,000 (shared, imported by three chunks, counted once) + 2,000 bytes
    expect(initial.gzipKb).toBe(80);
    expect(initial.files.sort()).toEqual([
      'assets/card.js',
      'assets/dashboard.js',
      'assets/index.js',
      'assets/shared.js',
    ]);
  });

  it('a chunk the build wrote no .gz for is gzipped at level 9', () => {
    writeBuild(manifest, {
      'assets/index.js': { bytes: 4_000 },
      'assets/dashboard.js': { bytes: 10, gz: 1_000 },
      'assets/shared.js': { bytes: 10, gz: 1_000 },
      'assets/card.js': { bytes: 10, gz: 1_000 },
    });
    const expected = gzipSync(Buffer.from('x'.repeat(4_000)), { level: 9 }).length + 3_000;
    expect(dashboardInitialJs(dist).gzipKb).toBe(expected / 1000);
  });

  it('a manifest without the dashboard route says so', () => {
    writeBuild({ 'index.html': manifest['index.html'] }, { 'assets/index.js': { bytes: 10 } });
    expect(() => dashboardInitialJs(dist)).toThrow(
      'the build manifest has no src/app/routes/dashboard.tsx',
    );
  });
});
