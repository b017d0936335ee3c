// The installed app's icons, made at build time from the one brand mark (public/favicon.svg) with
// sharp: the mark on the oat background at 192 and 512 px, and a "maskable" 512 px one whose mark
// sits inside the middle 80 % a phone's launcher may crop to a circle or a squircle.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import sharp from 'sharp';
import type { Plugin } from 'vite';

const BACKGROUND = '#f6f1e7';

export interface AppIcon {
  src: string;
  sizes: string;
  type: 'image/png';
  purpose: 'any' | 'maskable';
}

const ICONS: (AppIcon & { size: number; markShare: number })[] = [
  {
    src: '/icons/icon-192.png',
    sizes: '192x192',
    type: 'image/png',
    purpose: 'any',
    size: 192,
    markShare: 0.86,
  },
  {
    src: '/icons/icon-512.png',
    sizes: '512x512',
    type: 'image/png',
    purpose: 'any',
    size: 512,
    markShare: 0.86,
  },
  // the maskable safe zone is a circle of 40 % radius: the mark fills 64 % of the side
  {
    src: '/icons/icon-maskable-512.png',
    sizes: '512x512',
    type: 'image/png',
    purpose: 'maskable',
    size: 512,
    markShare: 0.64,
  },
];

/** What the web app manifest lists (without the build-only fields). */
export const appIcons: AppIcon[] = ICONS.map(({ src, sizes, type, purpose }) => ({
  src,
  sizes,
  type,
  purpose,
}));

/** One icon: the SVG rendered at its share of the side, centred on the background. */
export async function renderIcon(svg: Buffer, size: number, markShare: number): Promise<Buffer> {
  const mark = Math.round(size * markShare);
  const rendered = await sharp(svg, { density: Math.ceil((72 * mark) / 32) })
    .resize(mark, mark)
    .png()
    .toBuffer();
  return sharp({ create: { width: size, height: size, channels: 4, background: BACKGROUND } })
    .composite([{ input: rendered, gravity: 'centre' }])
    .png()
    .toBuffer();
}

/** Emits the icons into the build (so the service worker's precache list includes them). */
export function pwaIcons(source: string): Plugin {
  return {
    name: 'hourstone-pwa-icons',
    apply: 'build',
    async generateBundle() {
      const svg = readFileSync(path.resolve(source));
      for (const icon of ICONS) {
        this.emitFile({
          type: 'asset',
          fileName: icon.src.slice(1),
          source: await renderIcon(svg, icon.size, icon.markShare),
        });
      }
    },
  };
}
