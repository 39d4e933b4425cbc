import { defineConfig } from 'vitest/config';
import preact from '@preact/preset-vite';

// The page lives in src/ui (its index.html is the entry); static files in public/; the service
// worker is built from sw/ (see DEVELOPERS.md).
export default defineConfig({
  root: 'src/ui',
  publicDir: '../../public',
  plugins: [preact()],
  build: { outDir: '../../dist', emptyOutDir: true, sourcemap: true, target: 'es2022' },
  preview: { host: '127.0.0.1', port: 4173, strictPort: true },
  test: {
    root: '.',
    include: ['test/**/*.test.ts'],
    exclude: ['test/e2e/**', 'node_modules/**'],
    environment: 'node',
  },
});
