import react from '@vitejs/plugin-react';
import { defaultClientConditions, defineConfig } from 'vite';

const apiPort = process.env.API_PORT ?? '3000';

export default defineConfig({
  plugins: [react()],
  resolve: {
    // Workspace libs are consumed from source, so the web app never needs them prebuilt.
    conditions: ['@linesmith/source', ...defaultClientConditions],
  },
  server: {
    proxy: {
      '/api': { target: `http://127.0.0.1:${apiPort}`, changeOrigin: false },
    },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    // Read by scripts/route-size.mjs to report what each route downloads.
    manifest: true,
  },
});
