import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { compression } from 'vite-plugin-compression2';

const apiPort = process.env.PORT ?? '4310';

export default defineConfig({
  // The build writes .br and .gz beside each text asset (brotli at its best quality, too slow per
  // request), which the API sends as they are (server/client-files.ts).
  plugins: [react(), tailwindcss(), compression({ algorithms: ['brotliCompress', 'gzip'] })],
  build: { outDir: 'dist', sourcemap: true, chunkSizeWarningLimit: 1500 },
  server: {
    port: Number(process.env.CLIENT_PORT ?? 5310),
    strictPort: true,
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
  },
});
