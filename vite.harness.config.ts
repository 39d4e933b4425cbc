import { defineConfig } from 'vite';
import preact from '@preact/preset-vite';

// The store's browser-test page (src/ui/harness), built only for the tests and the store
// benchmark into dist-test/harness/, never into dist/ (the folder a person deploys). The test
// server (test/tools/test-server.mjs) serves it at /harness/ beside the app.
export default defineConfig({
  root: 'src/ui/harness',
  base: '/harness/',
  publicDir: false,
  plugins: [preact()],
  build: {
    outDir: '../../../dist-test/harness',
    emptyOutDir: true,
    sourcemap: false,
    target: 'es2022',
  },
});
