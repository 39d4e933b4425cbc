// The browser tests' static server (never used to deploy): the built app from dist/ at /, and the
// store's test page from dist-test/harness/ at /harness/, on 127.0.0.1 only. The update test
// switches the app's folder to another build under dist-test/ (POST /__test/app-build with the
// build's folder name in the body, or "dist" for the default) to play a new release.
//   node test/tools/test-server.mjs [--port N]   (default: TRIALBOOK_TEST_PORT, else 4317)
import { createServer } from 'node:http';
import { createReadStream, existsSync, statSync } from 'node:fs';
import { extname, join, normalize, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';

const repo = resolve(fileURLToPath(new URL('../..', import.meta.url)));
const testBuilds = join(repo, 'dist-test');

const TYPES = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.webmanifest': 'application/manifest+json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.map': 'application/json; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8',
};

function portFromArgs() {
  const i = process.argv.indexOf('--port');
  const raw = i > 0 ? process.argv[i + 1] : (process.env.TRIALBOOK_TEST_PORT ?? '4317');
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    console.error(`test server: --port needs a whole number from 1 to 65535, got "${raw}"`);
    process.exit(2);
  }
  return port;
}

let appRoot = join(repo, 'dist');

/** The file under root for a URL path, or null when the path leaves root or names nothing. */
function fileFor(root, urlPath) {
  let path;
  try {
    path = decodeURIComponent(urlPath);
  } catch {
    return null;
  }
  const full = normalize(join(root, path));
  if (full !== root && !full.startsWith(root + sep)) return null;
  if (existsSync(full) && statSync(full).isDirectory()) return existsSync(join(full, 'index.html')) ? join(full, 'index.html') : null;
  return existsSync(full) ? full : null;
}

function send(res, status, text) {
  res.writeHead(status, { 'content-type': 'text/plain; charset=utf-8', 'cache-control': 'no-store' });
  res.end(text);
}

function switchBuild(req, res) {
  let body = '';
  req.on('data', (c) => (body += c));
  req.on('end', () => {
    const name = body.trim();
    const next = name === 'dist' ? join(repo, 'dist') : /^[a-z0-9-]{1,40}$/.test(name) ? join(testBuilds, name) : null;
    if (!next || !existsSync(join(next, 'index.html'))) {
      send(res, 400, `app build needs "dist" or the name of a built folder under dist-test/ with an index.html, got "${name}"`);
      return;
    }
    appRoot = next;
    send(res, 200, `serving ${name}`);
  });
}

const server = createServer((req, res) => {
  const url = new URL(req.url ?? '/', 'http://127.0.0.1');
  if (url.pathname === '/__test/app-build' && req.method === 'POST') return switchBuild(req, res);
  if (req.method !== 'GET' && req.method !== 'HEAD') return send(res, 405, `only GET and HEAD are served, got ${req.method}`);
  const harness = url.pathname === '/harness' || url.pathname.startsWith('/harness/');
  const file = harness ? fileFor(join(testBuilds, 'harness'), url.pathname.slice('/harness'.length) || '/') : fileFor(appRoot, url.pathname);
  if (!file) return send(res, 404, `not found: ${url.pathname}`);
  // No HTTP caching: the service worker alone decides what is kept, as the tests expect.
  res.writeHead(200, { 'content-type': TYPES[extname(file)] ?? 'application/octet-stream', 'cache-control': 'no-cache' });
  if (req.method === 'HEAD') return res.end();
  createReadStream(file).pipe(res);
});

const port = portFromArgs();
server.listen(port, '127.0.0.1', () => console.log(`test server on http://127.0.0.1:${port}/ (app from dist/, store test page at /harness/)`));
