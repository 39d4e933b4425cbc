// Builds the service worker over the built page (run after `vite build`): workbox-build's
// generateSW precaches every file the app needs to start offline, with a revision hash each.
// The worker does not take over by itself (skipWaiting and clientsClaim off): the page asks the
// person first, then sends SKIP_WAITING (src/ui/sw-bridge.ts).
import { generateSW } from 'workbox-build';

const { count, size, warnings } = await generateSW({
  globDirectory: 'dist',
  globPatterns: ['**/*.{html,js,css,svg,webmanifest,json}'],
  // The store's test page is not part of the app.
  globIgnores: ['harness/**', 'assets/harness-*.js', 'sw.js', 'workbox-*.js'],
  swDest: 'dist/sw.js',
  navigateFallback: 'index.html',
  navigateFallbackDenylist: [/^\/harness\//],
  skipWaiting: false,
  clientsClaim: false,
  cleanupOutdatedCaches: true,
  inlineWorkboxRuntime: true,
  sourcemap: false,
  mode: 'production',
});
for (const w of warnings) console.warn(`service worker: ${w}`);
console.log(`service worker: ${count} files precached (${(size / 1024).toFixed(0)} kB)`);
