import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';
import { compression } from 'vite-plugin-compression2';

const api = 'http://127.0.0.1:3000';

export default defineConfig({
  // Text assets also written as .br and .gz beside the originals: the API serves them with their
  // Content-Encoding, so nothing is compressed per request (apps/api/src/web-app/web-app.ts).
  plugins: [react(), compression({ algorithms: ['brotliCompress', 'gzip'], include: /\.(js|css|html|svg|json|txt)$/ })],
  server: {
    host: '127.0.0.1',
    port: 5173,
    strictPort: true,
    proxy: {
      '/api': { target: api, changeOrigin: false },
      '/socket.io': { target: api, ws: true },
    },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    target: 'es2022',
    // Screens load on demand; the entry only holds the shell, the theme and the data layer.
    chunkSizeWarningLimit: 700,
  },
});
