// The outside systems the tests check Ninefold against, and the Debian packages that provide them.
// Used by `npm test` (installs what is missing when it can) and by .ci/run.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

// `check` is a shell test that succeeds when the oracle is usable.
export const ORACLES = [
  { command: 'gp', check: 'command -v gp', packages: ['pari-gp'], why: 'PARI/GP reference checks (tests/reference)' },
  { command: 'Singular', check: 'command -v Singular', packages: ['singular'], why: 'Singular reference checks (tests/reference)' },
  { command: 'chromium', check: 'command -v chromium', packages: ['chromium'], why: 'browser tests (tests/e2e)' },
  {
    command: 'pdflatex (with TikZ and standalone)',
    check: 'command -v pdflatex && kpsewhich tikz.sty && kpsewhich standalone.cls',
    packages: ['texlive-latex-base', 'texlive-pictures', 'texlive-latex-extra'],
    why: 'compiling exported TikZ figures (tests/reference)',
  },
  { command: 'pdftoppm', check: 'command -v pdftoppm', packages: ['poppler-utils'], why: 'checking compiled figures' },
  {
    command: 'DejaVu fonts',
    check: 'test -e /usr/share/fonts/truetype/dejavu/DejaVuSans.ttf',
    packages: ['fonts-dejavu-core'],
    why: 'labels in PNG figures (resvg draws with system fonts)',
  },
];

function usable(o) {
  return spawnSync('sh', ['-c', o.check], { stdio: 'ignore' }).status === 0;
}

/** Install missing oracles through apt when running as root; return the ones still missing. */
export function ensureOracles(log = console.error) {
  let missing = ORACLES.filter((o) => !usable(o));
  if (missing.length > 0 && process.getuid?.() === 0 && existsSync('/usr/bin/apt-get')) {
    const pkgs = missing.flatMap((o) => o.packages);
    log(`installing Debian packages: ${pkgs.join(' ')}`);
    const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
    try {
      execFileSync('apt-get', ['-o', 'DPkg::Lock::Timeout=600', 'update', '-qq'], { stdio: 'inherit', env });
      execFileSync('apt-get', ['-o', 'DPkg::Lock::Timeout=600', 'install', '-y', '-qq', ...pkgs], { stdio: 'inherit', env });
    } catch (e) {
      log(`apt-get failed: ${e.message}`);
    }
    missing = ORACLES.filter((o) => !usable(o));
  }
  return missing;
}

// Run directly (`node tests/tools/oracles.mjs`, as .ci/run does): install what is missing, fail loudly if
// anything is still missing.
if (import.meta.url === `file://${process.argv[1]}`) {
  const still = ensureOracles();
  for (const o of still) console.error(`FATAL: ${o.command} is missing (Debian ${o.packages.join(', ')}), needed for ${o.why}`);
  process.exit(still.length === 0 ? 0 : 1);
}
