// Renderer build: React app in renderer/, built to renderer/dist/ with relative asset paths so
// the page loads from file:// in Electron as well as from the web-mode server.
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { fileURLToPath } from 'node:url';

export default defineConfig({
  root: 'renderer',
  base: './',
  plugins: [react()],
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    target: 'chrome130',
    assetsInlineLimit: 0,
    chunkSizeWarningLimit: 1500,
    // The workspace and the briefing page (printed to PDF by the desktop app).
    rolldownOptions: { input: { main: fileURLToPath(new URL('./renderer/index.html', import.meta.url)), report: fileURLToPath(new URL('./renderer/report/index.html', import.meta.url)) } },
  },
  worker: { format: 'es' },
});
