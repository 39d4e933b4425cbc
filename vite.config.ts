import { defineConfig } from 'vitest/config';
import preact from '@preact/preset-vite';

// The page is built from src/ui; the service worker is built separately (see sw/).
export default defineConfig({
  plugins: [preact()],
  build: { outDir: 'dist', sourcemap: true, target: 'es2022' },
  test: {
    include: ['test/**/*.test.ts'],
    exclude: ['test/e2e/**', 'node_modules/**'],
    environment: 'node',
  },
});
