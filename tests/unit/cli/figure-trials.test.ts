// The figure and trials verbs: files written as asked, the counterexample saved as a scene that opens,
// and bad input refused with the place named (also through the real command line, exit 2).
import { afterAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { figure } from '../../../src/cli/verbs/figure.ts';
import { trials } from '../../../src/cli/verbs/trials.ts';
import { argsParse } from '../../../src/cli/args.ts';
import { InvalidInput, NinefoldError } from '../../../src/exact/errors.ts';
import { sceneParse } from '../../../src/scene/load.ts';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';

const dir = mkdtempSync(join(tmpdir(), 'ninefold-cli-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const SCENES = new URL('../../../scenes/', import.meta.url).pathname;

describe('figure verb', () => {
  it('writes SVG, TikZ, snippet and PNG at the asked resolution, and lists the exact objects', () => {
    const out = figure.run(
      argsParse([`${SCENES}pascal-line.json`, '--svg', join(dir, 'p.svg'), '--tikz', join(dir, 'p.tex'), '--snippet', join(dir, 'p-snippet.tex'), '--png', join(dir, 'p.png'), '--dpi', '144', '--grey'], new Set(['grey'])),
    ) as { written: Record<string, string>; objects: { label: string; exact?: string }[]; drawn: Record<string, number> };
    expect(Object.keys(out.written).sort()).toEqual(['png', 'snippet', 'svg', 'tikz']);
    expect(readFileSync(join(dir, 'p.svg'), 'utf8')).toContain('<svg');
    expect(readFileSync(join(dir, 'p.tex'), 'utf8')).toContain('\\documentclass');
    expect(readFileSync(join(dir, 'p-snippet.tex'), 'utf8')).not.toContain('\\documentclass');
    const png = readFileSync(join(dir, 'p.png'));
    expect(png.readUInt32BE(16)).toBe(720); // 360 pt at 144 dpi
    expect(out.objects.find((o) => o.label === 'Z')!.exact).toBe('1:1:-3'); // Z = (-1/3, -1/3) = (-1:-1:3), first entry made positive
    expect(out.drawn.segments).toBe(7);
  });
  it('refuses a call with nothing to write, a bad dpi, and a broken scene (naming the place)', () => {
    expect(() => figure.run(argsParse([`${SCENES}pascal-line.json`]))).toThrow(InvalidInput);
    expect(() => figure.run(argsParse([`${SCENES}pascal-line.json`, '--png', join(dir, 'x.png'), '--dpi', '5']))).toThrow(/--dpi must be between 10 and 2400/);
    const bad = join(dir, 'bad.json');
    const text = readFileSync(`${SCENES}pascal-line.json`, 'utf8').replace('"parents": [\n        "c1"\n      ]', '"parents": [\n        "nowhere"\n      ]');
    writeFileSync(bad, text);
    try {
      figure.run(argsParse([bad, '--svg', join(dir, 'bad.svg')]));
      throw new Error('accepted');
    } catch (e) {
      expect(e).toBeInstanceOf(NinefoldError);
      expect((e as NinefoldError).where).toBe('objects[1].parents[0]');
    }
  });
});

describe('trials verb', () => {
  it('reports held counts for a theorem', () => {
    const out = trials.run(argsParse([`${SCENES}pascal-line.json`, '--count', '10'])) as { checks: { label: string; held: number; failed: number; firstFailure: unknown }[] };
    expect(out.checks).toEqual([expect.objectContaining({ label: 'X, Y, Z are collinear (Pascal)', held: 10, failed: 0, firstFailure: null })]);
  });
  it('saves the first counterexample of a false claim as a scene in which the claim fails', () => {
    const f = join(dir, 'claim.json');
    const text = readFileSync(`${SCENES}pascal-line.json`, 'utf8');
    // A claim that is false in general: A, B, Y collinear (ids p2, p3, p15).
    const file = JSON.parse(text);
    file.objects.push({ id: 'k99', type: 'check', label: 'A, B, Y collinear', kind: 'check-collinear', parents: ['p2', 'p3', 'p15'], params: {}, style: { colour: '#444444', visible: true, showLabel: false } });
    file.nextId = 100;
    writeFileSync(f, JSON.stringify(file));
    const cx = join(dir, 'cx.json');
    const out = trials.run(argsParse([f, '--count', '10', '--counterexample', cx])) as { checks: { label: string; failed: number; firstFailure: { savedAs?: string; points: Record<string, string> } | null }[] };
    const claim = out.checks.find((c) => c.label === 'A, B, Y collinear')!;
    expect(claim.failed).toBeGreaterThan(0);
    expect(claim.firstFailure!.savedAs).toBe(cx);
    const back = sceneParse(readFileSync(cx, 'utf8'));
    expect(back.title).toBe('Counterexample: A, B, Y collinear');
    const v = constructionEvaluate(back.doc).get('k99');
    expect(v).toMatchObject({ verdict: 'fails' });
    expect(back.doc.objects.find((o) => o.label === 'A')!.construction.params.at).toBe(claim.firstFailure!.points.A);
  });
  it('through the command line: JSON on stdout, and exit 2 with the place on stderr for a bad file', () => {
    const ok = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'trials', `${SCENES}group-law.json`, '--count', '3'], { encoding: 'utf8' });
    expect(ok.status).toBe(0);
    expect(JSON.parse(ok.stdout).checks.map((c: { held: number }) => c.held)).toEqual([3, 3]);
    const bad = join(dir, 'v9.json');
    writeFileSync(bad, readFileSync(`${SCENES}group-law.json`, 'utf8').replace('"version": 2', '"version": 9'));
    const no = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'figure', bad, '--svg', join(dir, 'v9.svg')], { encoding: 'utf8' });
    expect(no.status).toBe(2);
    expect(JSON.parse(no.stderr).error.where).toBe('version');
  });
});
