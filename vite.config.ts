import { defineConfig, type Plugin } from 'vitest/config';
import preact from '@preact/preset-vite';
import { readFileSync } from 'node:fs';

// The page lives in src/ui (its index.html is the only entry); static files in public/; the
// service worker is built from sw/ (see DEVELOPERS.md). The deployed folder dist/ holds the app
// and nothing else: the store's test page is built by vite.harness.config.ts into dist-test/,
// and source maps are written only on request (TRIALBOOK_SOURCEMAP=1).

const pkg = JSON.parse(readFileSync(new URL('./package.json', import.meta.url), 'utf8')) as { version: string };

/** The version string the app shows: TRIALBOOK_VERSION when set (the update test builds twice), else package.json's. */
const version = process.env.TRIALBOOK_VERSION ?? pkg.version;
if (!/^[\w.+-]{1,40}$/.test(version)) {
  throw new Error(`TRIALBOOK_VERSION needs letters, digits, dots, plus or minus signs (at most 40), got "${version}"`);
}

/**
 * The development server injects each stylesheet as a <style> element, which the page's content
 * security policy (style-src 'self') forbids; only there, the policy also allows inline styles.
 * Built files keep the policy exactly as index.html writes it.
 */
function devStyles(): Plugin {
  return {
    name: 'trialbook-dev-csp',
    apply: 'serve',
    transformIndexHtml: (html) => html.replace("style-src 'self'", "style-src 'self' 'unsafe-inline'"),
  };
}

export default defineConfig({
  root: 'src/ui',
  publicDir: '../../public',
  plugins: [preact(), devStyles()],
  define: { __TRIALBOOK_VERSION__: JSON.stringify(version) },
  build: {
    outDir: '../../dist',
    emptyOutDir: true,
    sourcemap: process.env.TRIALBOOK_SOURCEMAP === '1',
    target: 'es2022',
  },
  preview: { host: '127.0.0.1', port: 4173, strictPort: true },
  test: {
    root: '.',
    include: ['test/**/*.test.ts'],
    exclude: ['test/e2e/**', 'node_modules/**'],
    environment: 'node',
  },
});
