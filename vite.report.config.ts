// Briefing page build: renderer/report/ (same React and chart code as the app) to dist/report/,
// relative asset paths, for the command line's headless Chromium. The desktop app builds the same
// page into renderer/dist/report/ with its own config.
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { fileURLToPath } from 'node:url';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

export default defineConfig({
  root: here('./renderer/report'),
  base: './',
  plugins: [react()],
  build: {
    outDir: here('./dist/report'),
    emptyOutDir: true,
    target: 'chrome130',
    assetsInlineLimit: 0,
    chunkSizeWarningLimit: 2000,
  },
});
