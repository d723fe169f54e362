import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';
import { compression } from 'vite-plugin-compression2';

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    // Brotli and gzip files beside each script, style and SVG at build, so the server sends them
    // without compressing per request (server/http/client-files.ts). Maps and fonts are left alone.
    compression({ algorithms: ['brotliCompress', 'gzip'], include: /\.(js|mjs|css|svg|html|json)$/, threshold: 1024 }),
  ],
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    sourcemap: true,
  },
});
