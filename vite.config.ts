import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

// The API serves dist/web on 127.0.0.1:8080; in development Vite forwards API and sign-in calls there
// so the session cookie stays first-party.
const apiOrigin = 'http://127.0.0.1:8080';

export default defineConfig({
  root: '.',
  publicDir: 'apps/web/public',
  plugins: [react(), tailwindcss()],
  build: {
    outDir: 'dist/web',
    emptyOutDir: true,
  },
  server: {
    host: '127.0.0.1',
    proxy: {
      '/api': { target: apiOrigin, changeOrigin: false },
      '/auth': { target: apiOrigin, changeOrigin: false },
    },
  },
});
