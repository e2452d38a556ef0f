// Finds Debian's Chromium for the browser tests; installs it with apt-get when run as root on Debian.
// It never downloads a browser of its own.
import { existsSync } from 'node:fs';
import { execSync } from 'node:child_process';

/** The switches every headless Chromium of the tests and benchmarks runs with. */
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** The Chromium executable to drive: CHROMIUM_PATH (set by scripts/test.mjs), else Debian's. */
export const chromiumPath = () => process.env.CHROMIUM_PATH || '/usr/bin/chromium';

/** How the tests and benchmarks launch headless Chromium. */
export const chromiumLaunchOptions = () => ({ executablePath: chromiumPath(), args: CHROMIUM_ARGS });

/** The Chromium executable to drive, installing Debian's package when that is possible. */
export function ensureChromium() {
  const wanted = chromiumPath();
  if (existsSync(wanted)) return wanted;
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  const hasApt = existsSync('/usr/bin/apt-get');
  if (!process.env.CHROMIUM_PATH && isRoot && hasApt) {
    console.log("Chromium is missing: installing Debian's chromium package with apt-get…");
    execSync('apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium', {
      stdio: 'inherit',
    });
    if (existsSync(wanted)) return wanted;
  }
  console.error(
    `No Chromium at ${wanted}. Install Debian's package (sudo apt-get install chromium) ` +
      'or set CHROMIUM_PATH to a Chromium or Chrome executable, then run npm test again.',
  );
  process.exit(1);
}
