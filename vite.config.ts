import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { fileURLToPath } from 'node:url';

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: {
    alias: {
      '@': fileURLToPath(new URL('./src', import.meta.url)),
      '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
    },
  },
  build: {
    outDir: 'dist',
    sourcemap: false,
    chunkSizeWarningLimit: 400,
    reportCompressedSize: true,
  },
  server: {
    // The API accepts writes only from PUBLIC_URL's origin, so the proxy presents that one.
    proxy: { '/api': { target: 'http://127.0.0.1:4180', headers: { origin: 'http://127.0.0.1:4180' } } },
  },
});
