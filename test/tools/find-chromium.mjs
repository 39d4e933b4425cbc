// Finds Chromium for the browser tests: CHROME_PATH, else `command -v chromium`. When it is
// missing and we are root on Debian, installs Debian's chromium with apt-get (never a browser
// download by a test tool). Elsewhere it stops with a message saying how to get one.
import { execSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';

function which(cmd) {
  try {
    return execSync(`command -v ${cmd}`, { stdio: ['ignore', 'pipe', 'ignore'], shell: '/bin/sh' }).toString().trim();
  } catch {
    return '';
  }
}

export function findChromium() {
  if (process.env.CHROME_PATH && existsSync(process.env.CHROME_PATH)) return process.env.CHROME_PATH;
  return which('chromium') || which('chromium-browser') || '';
}

function isDebian() {
  try {
    return /debian/i.test(readFileSync('/etc/os-release', 'utf8'));
  } catch {
    return false;
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  let path = findChromium();
  if (!path) {
    if (process.getuid?.() === 0 && isDebian() && which('apt-get')) {
      console.log('Chromium not found: installing Debian\'s chromium with apt-get ...');
      execSync('apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium', { stdio: 'inherit', shell: '/bin/sh' });
      path = findChromium();
    }
    if (!path) {
      console.error(
        'The browser tests need Chromium and none was found.\n' +
          'Install it (Debian/Ubuntu: sudo apt-get install chromium) or set CHROME_PATH to a Chromium or Chrome binary, then run npm test again.',
      );
      process.exit(1);
    }
  }
  console.log(`Chromium: ${path}`);
}
