import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

const fromRoot = (path: string) => fileURLToPath(new URL(path, import.meta.url));

/** Where the dev server sends API calls; the Express server listens on port 3000 by default. */
const apiTarget = process.env.FERRULE_API_URL ?? 'http://localhost:3000';

export default defineConfig({
  root: fromRoot('./frontend'),
  plugins: [react(), tailwindcss()],
  resolve: {
    alias: {
      '@': fromRoot('./frontend/src'),
      '@shared': fromRoot('./shared/src'),
    },
  },
  optimizeDeps: { include: ['html5-qrcode'] },
  build: {
    outDir: fromRoot('./dist/client'),
    emptyOutDir: true,
    rolldownOptions: {
      output: {
        // Libraries change less often than the app: phones on poor signal keep them cached across releases.
        codeSplitting: {
          groups: [
            { name: 'react', test: /node_modules[\\/](react|react-dom|scheduler|react-router|react-router-dom)[\\/]/, priority: 20 },
            { name: 'vendor', test: /node_modules[\\/]/, priority: 10 },
          ],
        },
      },
    },
  },
  server: {
    port: 5173,
    // The Host header is kept as the browser sent it so the server's Origin check sees one origin.
    proxy: {
      '/api': { target: apiTarget },
      '/demo': { target: apiTarget },
    },
  },
});
