import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

const root = (p: string) => fileURLToPath(new URL(p, import.meta.url));

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: {
    alias: { '@': root('./src'), '@shared': root('./shared') },
  },
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': 'http://127.0.0.1:3000', '/media': 'http://127.0.0.1:3000', '/t/': 'http://127.0.0.1:3000' },
  },
  // The manifest lets bench/first-load.bench.ts add up what each page downloads.
  build: { outDir: 'dist/client', sourcemap: true, manifest: true, chunkSizeWarningLimit: 900 },
});
