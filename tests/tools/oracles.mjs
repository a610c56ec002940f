// The outside systems the tests check Ninefold against, and the Debian packages that provide them.
// Used by `npm test` (installs what is missing when it can) and by .ci/run.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

export const ORACLES = [
  { command: 'gp', package: 'pari-gp', why: 'PARI/GP reference checks (tests/reference)' },
  { command: 'Singular', package: 'singular', why: 'Singular reference checks (tests/reference)' },
  { command: 'chromium', package: 'chromium', why: 'browser tests (tests/e2e)' },
];

export function hasCommand(cmd) {
  return spawnSync('sh', ['-c', `command -v ${cmd}`], { stdio: 'ignore' }).status === 0;
}

/** Install missing oracles through apt when running as root; return the ones still missing. */
export function ensureOracles(log = console.error) {
  let missing = ORACLES.filter((o) => !hasCommand(o.command));
  if (missing.length > 0 && process.getuid?.() === 0 && existsSync('/usr/bin/apt-get')) {
    const pkgs = missing.map((o) => o.package);
    log(`installing Debian packages: ${pkgs.join(' ')}`);
    const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
    try {
      execFileSync('apt-get', ['-o', 'DPkg::Lock::Timeout=600', 'update', '-qq'], { stdio: 'inherit', env });
      execFileSync('apt-get', ['-o', 'DPkg::Lock::Timeout=600', 'install', '-y', '-qq', ...pkgs], { stdio: 'inherit', env });
    } catch (e) {
      log(`apt-get failed: ${e.message}`);
    }
    missing = ORACLES.filter((o) => !hasCommand(o.command));
  }
  return missing;
}
