// Builds the service worker over the built page (run after `vite build`): workbox-build's
// generateSW precaches every file the app needs to start offline, with a revision hash each.
// The worker does not take over by itself (skipWaiting and clientsClaim off): the page asks the
// person first, then sends SKIP_WAITING (src/ui/sw-bridge.ts).
//   node sw/build.mjs [folder]   (default dist; the update test builds into dist-test/ folders)
import { generateSW } from 'workbox-build';
import { existsSync } from 'node:fs';

const dir = process.argv[2] ?? 'dist';
if (!existsSync(`${dir}/index.html`)) {
  console.error(`service worker: needs a built app folder with an index.html (run vite build first), got "${dir}"`);
  process.exit(2);
}

const { count, size, warnings } = await generateSW({
  globDirectory: dir,
  globPatterns: ['**/*.{html,js,css,svg,png,webmanifest,json}'],
  globIgnores: ['sw.js', 'workbox-*.js'],
  swDest: `${dir}/sw.js`,
  navigateFallback: 'index.html',
  // The store's test page (served beside the app only in the browser tests) is never the app.
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
