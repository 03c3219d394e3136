import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';

export const chromiumPath = '/usr/bin/chromium';

/** Debian's Chromium drives the browser tests; as root it is installed with apt-get when missing. */
export function ensureChromium(): void {
  if (existsSync(chromiumPath)) return;
  if (process.getuid?.() !== 0) {
    console.error('Chromium is not installed. Install it with: sudo apt-get install -y chromium');
    process.exit(1);
  }
  console.log('Installing Chromium from Debian packages (apt-get install chromium)…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  execFileSync('apt-get', ['install', '-y', '-qq', '--no-install-recommends', 'chromium'], { stdio: 'inherit', env });
}
