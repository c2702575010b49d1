/// <reference types="vitest/config" />
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vite';

// The API and the socket live on the server's origin; in development the proxy keeps the
// browser on one origin so that the web session cookie and the CSRF token behave as in production.
const serverOrigin = 'http://127.0.0.1:3000';

export default defineConfig({
  base: '/',
  plugins: [react(), tailwindcss()],
  server: {
    proxy: {
      // The live link (socket.io at /api/live) is a WebSocket: the proxy passes upgrades on too.
      '/api': { target: serverOrigin, ws: true, changeOrigin: false },
    },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
  },
  test: {
    // Plain logic runs in Node; whatever renders (*.test.tsx) gets a document from jsdom.
    projects: [
      { extends: true, test: { name: 'node', environment: 'node', include: ['src/**/*.test.ts'] } },
      { extends: true, test: { name: 'dom', environment: 'jsdom', include: ['src/**/*.test.tsx'], setupFiles: ['src/testing/dom-setup.ts'] } },
    ],
  },
});
