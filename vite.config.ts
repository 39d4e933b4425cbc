import { defineConfig } from 'vitest/config';
import preact from '@preact/preset-vite';
import { fileURLToPath } from 'node:url';

// The page lives in src/ui (its index.html is the entry); static files in public/; the service
// worker is built from sw/ (see DEVELOPERS.md). A second page, harness/index.html, is the store's
// browser-test page: its own entry, so nothing of it enters the app's bundle.
export default defineConfig({
  root: 'src/ui',
  publicDir: '../../public',
  plugins: [preact()],
  build: {
    outDir: '../../dist',
    emptyOutDir: true,
    sourcemap: true,
    target: 'es2022',
    rolldownOptions: {
      input: {
        main: fileURLToPath(new URL('./src/ui/index.html', import.meta.url)),
        harness: fileURLToPath(new URL('./src/ui/harness/index.html', import.meta.url)),
      },
    },
  },
  preview: { host: '127.0.0.1', port: 4173, strictPort: true },
  test: {
    root: '.',
    include: ['test/**/*.test.ts'],
    exclude: ['test/e2e/**', 'node_modules/**'],
    environment: 'node',
  },
});
