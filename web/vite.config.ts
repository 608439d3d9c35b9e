import { fileURLToPath, URL } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';
import { compression } from 'vite-plugin-compression2';
import { firstPaintPlugin } from './scripts/first-paint-plugin';

export default defineConfig({
  plugins: [
    react(),
    firstPaintPlugin(),
    // Brotli and gzip copies of every text asset beside the original; the API sends the one the browser accepts.
    compression({ algorithms: ['brotliCompress', 'gzip'], threshold: 1024 }),
  ],
  resolve: {
    alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) },
  },
  server: {
    host: '127.0.0.1',
    proxy: { '/api': 'http://127.0.0.1:3000' },
  },
  preview: {
    host: '127.0.0.1',
    proxy: { '/api': 'http://127.0.0.1:3000' },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    // antd alone is larger than the default 500 kB warning threshold; routes are split with React.lazy.
    chunkSizeWarningLimit: 900,
  },
});
