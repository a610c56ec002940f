// Live outside references for tests/reference: PARI/GP (Debian pari-gp) and Singular (Debian singular),
// run through their command lines. A missing system is a loud failure, never a skip.
import { seededUniform } from '../../src/exact/random.ts';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

function runScript(cmd: string, args: string[], script: string, timeoutMs: number): string {
  const dir = mkdtempSync(join(tmpdir(), 'ninefold-oracle-'));
  const file = join(dir, 'in.txt');
  writeFileSync(file, script);
  try {
    // Run inside the scratch folder: Singular's classify.lib leaves an NFlist database in its working directory.
    return execFileSync(cmd, [...args, file], { cwd: dir, encoding: 'utf8', timeout: timeoutMs, maxBuffer: 1 << 28 });
  } catch (e) {
    const err = e as { code?: string; stderr?: string; message: string };
    if (err.code === 'ENOENT') throw new Error(`${cmd} is not installed: run npm test (it installs it) or apt-get install it`);
    throw new Error(`${cmd} failed: ${err.stderr ?? err.message}`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * Run a GP script and return its output lines. Print one result per line with `print(...)`; GP prints
 * vectors as [a, b, c], which `gpVector` reads back.
 */
export function gp(script: string, timeoutMs = 300_000): string[] {
  const out = runScript('gp', ['-q', '-f', '--default', 'parisizemax=2000000000', '--default', 'colors=no'], script + '\nquit\n', timeoutMs);
  return out.split('\n').filter((l) => l.length > 0);
}

/** Run a Singular script (libraries loaded with LIB "name.lib";) and return its output lines. */
export function singular(script: string, timeoutMs = 300_000): string[] {
  const out = runScript('Singular', ['-q', '--no-warn', '--no-rc'], script + '\nquit;\n', timeoutMs);
  return out.split('\n').filter((l) => l.length > 0);
}

/** Parse a GP vector of integers/rationals printed as "[1, -2/3, 4]" into strings. */
export function gpVector(line: string): string[] {
  const t = line.trim();
  if (!t.startsWith('[') || !t.endsWith(']')) throw new Error(`not a GP vector: ${line}`);
  const body = t.slice(1, -1).trim();
  return body === '' ? [] : body.split(',').map((s) => s.trim());
}

/** A small seeded generator (src/exact/random.ts) so reference runs are reproducible; print the seed on failure. */
export const seededRandom = seededUniform;

/** A random integer with up to `digits` decimal digits, either sign, from a seeded generator. */
export function randomBigInt(rand: () => number, digits: number): bigint {
  let s = '';
  const n = 1 + Math.floor(rand() * digits);
  for (let i = 0; i < n; i++) s += Math.floor(rand() * 10).toString();
  const v = BigInt(s);
  return rand() < 0.5 ? -v : v;
}
