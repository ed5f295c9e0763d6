// Finds Debian's chromium for the browser tests, installing it with apt-get when it is missing and
// we may (root on a Debian-like system). Otherwise stops with the exact command to run.
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const candidates = [process.env.CHROMIUM_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser'].filter(Boolean);
const found = () => candidates.find((candidate) => existsSync(candidate));

if (found()) {
  console.log(`Browser tests will use ${found()}`);
  process.exit(0);
}

const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
const hasApt = existsSync('/usr/bin/apt-get');
const command = 'apt-get update && apt-get install -y chromium';

if (!isRoot || !hasApt) {
  console.error(
    `No chromium found for the browser tests. Install Debian's chromium first:\n  sudo sh -c '${command}'\nor set CHROMIUM_PATH to a chromium binary.`,
  );
  process.exit(1);
}

console.log(`No chromium found; installing Debian's chromium (${command}) ...`);
const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
execFileSync('apt-get', ['update'], { stdio: 'inherit', env });
execFileSync('apt-get', ['install', '-y', 'chromium'], { stdio: 'inherit', env });

if (!found()) {
  console.error('apt-get finished but no chromium binary was found at /usr/bin/chromium.');
  process.exit(1);
}
console.log(`Browser tests will use ${found()}`);
