// Figures against outside programs: every demo scene exported as SVG, TikZ and PNG; the SVG parsed and
// rendered by Chromium (Debian's /usr/bin/chromium through playwright-core), the TikZ file compiled by
// pdflatex (Debian TeX Live) and its page rasterised by pdftoppm (poppler-utils), the PNG decoded by
// resvg; each checked for drawn pixels, and the coordinates in the files checked against the scene's
// exact values. Hostile labels are loaded into Chromium to show that they stay text.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Browser } from 'playwright-core';
import { Resvg } from '@resvg/resvg-js';
import { sceneParse } from '../../src/scene/load.ts';
import type { Scene } from '../../src/scene/scene.ts';
import { sceneFigureInput } from '../../src/export/scene-figure.ts';
import { figureToSvg } from '../../src/export/svg.ts';
import { figureToTikzSnippet, figureToTikzStandalone } from '../../src/export/tikz.ts';
import { svgToPng } from '../../src/export/png.ts';
import { pageFrame, type FigureInput } from '../../src/export/figure.ts';
import { constructionAdd } from '../../src/construct/graph.ts';
import { pointParse } from '../../src/plane/parse-point.ts';
import { rat, ratToNumber } from '../../src/exact/rational.ts';

const SCENES = new URL('../../scenes/', import.meta.url);
const index = JSON.parse(readFileSync(new URL('index.json', SCENES), 'utf8')) as { scenes: { file: string }[] };
const scenes: [string, Scene][] = index.scenes.map((s) => [s.file, sceneParse(readFileSync(new URL(s.file, SCENES), 'utf8'))]);

const HOSTILE_LABELS = [
  '<script>window.__ninefoldPwned = 1</script>',
  '<img src="x" onerror="window.__ninefoldPwned = 2">',
  '<svg onload="window.__ninefoldPwned = 3"></svg>',
  '\\input{/etc/passwd} $x^2$ % & # _ { }',
];

/** The group-law scene with hostile labels on its first points. */
function hostileScene(): Scene {
  const base = scenes.find(([f]) => f === 'group-law.json')![1];
  let doc = base.doc;
  const objects = doc.objects.map((o, k) => (o.type === 'point' && k <= HOSTILE_LABELS.length ? { ...o, label: HOSTILE_LABELS[k - 1] } : o));
  doc = { ...doc, objects };
  doc = constructionAdd(doc, { construction: { kind: 'point-free', parents: [], params: { at: '0:-6:1' } }, label: '</text><script>window.__ninefoldPwned = 4</script>' }).doc;
  doc = constructionAdd(doc, { construction: { kind: 'point-free', parents: [], params: { at: '-4:-3:1' } }, label: '\\input{/etc/passwd} $x^2$ % & # _ { }' }).doc;
  return { ...base, title: '<script>window.__ninefoldPwned = 5</script>', doc };
}

let dir = '';
let browser: Browser | null = null;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'ninefold-figures-'));
  browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
    timeout: 60_000,
  });
});

afterAll(async () => {
  await browser?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

/** Open an SVG file in Chromium as an XML document; report parse errors, scripts, texts and drawn pixels. */
async function chromiumLook(svgPath: string) {
  const page = await browser!.newPage();
  try {
    await page.goto(`file://${svgPath}`);
    return await page.evaluate(async () => {
      const doc = document;
      const svgText = new XMLSerializer().serializeToString(doc);
      const img = new Image();
      const url = URL.createObjectURL(new Blob([svgText], { type: 'image/svg+xml' }));
      await new Promise<void>((ok, bad) => {
        img.onload = () => ok();
        img.onerror = () => bad(new Error('the SVG did not load as an image'));
        img.src = url;
      });
      const canvas = document.createElementNS('http://www.w3.org/1999/xhtml', 'canvas') as HTMLCanvasElement;
      canvas.width = 300;
      canvas.height = Math.max(1, Math.round((300 * img.naturalHeight) / img.naturalWidth));
      const ctx = canvas.getContext('2d')!;
      ctx.fillStyle = '#fff';
      ctx.fillRect(0, 0, canvas.width, canvas.height);
      ctx.drawImage(img, 0, 0, canvas.width, canvas.height);
      const px = ctx.getImageData(0, 0, canvas.width, canvas.height).data;
      let dark = 0;
      for (let k = 0; k < px.length; k += 4) if (px[k] + px[k + 1] + px[k + 2] < 600) dark++;
      return {
        root: doc.documentElement.localName,
        parseErrors: doc.getElementsByTagName('parsererror').length,
        scripts: doc.getElementsByTagName('script').length,
        foreign: doc.getElementsByTagName('foreignObject').length + doc.getElementsByTagName('img').length,
        texts: [...doc.getElementsByTagName('text')].map((t) => t.textContent),
        pwned: (window as unknown as { __ninefoldPwned?: number }).__ninefoldPwned ?? null,
        dark,
        total: px.length / 4,
      };
    });
  } finally {
    await page.close();
  }
}

/** Count dark pixels of a binary PGM (pdftoppm -gray). */
function pgmDark(path: string): { dark: number; total: number } {
  const buf = readFileSync(path);
  const head = buf.subarray(0, 64).toString('latin1');
  const m = /^P5\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(head);
  if (!m) throw new Error(`not a binary PGM: ${path}`);
  const w = Number(m[1]);
  const h = Number(m[2]);
  const data = buf.subarray(m[0].length, m[0].length + w * h);
  let dark = 0;
  for (const v of data) if (v < 200) dark++;
  return { dark, total: w * h };
}

function resvgDark(svg: string): { dark: number; total: number } {
  const img = new Resvg(svg, { fitTo: { mode: 'width', value: 300 }, background: '#ffffff' }).render();
  const px = img.pixels;
  let dark = 0;
  for (let k = 0; k < px.length; k += 4) if (px[k] + px[k + 1] + px[k + 2] < 600) dark++;
  return { dark, total: px.length / 4 };
}

/** The page position of every point that the figure records exactly, from the scene's exact values. */
function exactPositions(input: FigureInput): Map<string, [number, number]> {
  const f = pageFrame(input.view, input.options);
  const out = new Map<string, [number, number]>();
  for (const fact of input.facts) {
    if (fact.type !== 'point' || !fact.exact) continue;
    const [X, Y, Z] = pointParse(fact.exact);
    if (Z === 0n) continue;
    out.set(fact.id, [f.u(ratToNumber(rat(X, Z))), f.v(ratToNumber(rat(Y, Z)))]);
  }
  return out;
}

describe('figures of the demo scenes', () => {
  for (const [file, scene] of scenes) {
    it(`${file}: SVG, TikZ and PNG are drawn and agree with the exact values`, async () => {
      const input = sceneFigureInput(scene);
      const base = join(dir, file.replace(/\.json$/, ''));
      const svg = figureToSvg(input);
      writeFileSync(`${base}.svg`, svg);
      writeFileSync(`${base}.tex`, figureToTikzStandalone(input));
      writeFileSync(`${base}.png`, svgToPng(svg, 96));

      // SVG in Chromium: well-formed XML, no script, drawn.
      const look = await chromiumLook(`${base}.svg`);
      expect(look.root).toBe('svg');
      expect(look.parseErrors).toBe(0);
      expect(look.scripts).toBe(0);
      expect(look.dark / look.total, 'share of drawn pixels in Chromium').toBeGreaterThan(0.003);

      // TikZ through pdflatex, page to pixels through pdftoppm.
      execFileSync('pdflatex', ['-interaction=nonstopmode', '-halt-on-error', '-no-shell-escape', `-output-directory=${dir}`, `${base}.tex`], { cwd: dir, stdio: 'pipe', timeout: 120_000 });
      execFileSync('pdftoppm', ['-gray', '-r', '50', '-singlefile', `${base}.pdf`, `${base}-tex`], { stdio: 'pipe', timeout: 60_000 });
      const tex = pgmDark(`${base}-tex.pgm`);
      expect(tex.dark / tex.total, 'share of drawn pixels in the compiled TikZ').toBeGreaterThan(0.003);

      // PNG: a real PNG of the asked size (96 dpi: 360 pt -> 480 px), drawn.
      const png = readFileSync(`${base}.png`);
      expect(png.subarray(1, 4).toString('latin1')).toBe('PNG');
      expect(png.readUInt32BE(16)).toBe(480);
      const r = resvgDark(svg);
      expect(r.dark / r.total, 'share of drawn pixels in the PNG').toBeGreaterThan(0.003);

      // Coordinates: every exact point is drawn where its exact coordinates say (to 1/1000 pt), in both files.
      const want = exactPositions(input);
      const tikz = readFileSync(`${base}.tex`, 'utf8');
      const H = pageFrame(input.view, input.options).heightPt;
      let compared = 0;
      for (const m of svg.matchAll(/<circle data-owner="([^"]+)" data-exact="([^"]+)" cx="([-\d.]+)" cy="([-\d.]+)"/g)) {
        const w = want.get(m[1]);
        expect(w, `point ${m[1]} has an exact value`).toBeDefined();
        expect(Math.abs(Number(m[3]) - w![0])).toBeLessThan(1e-3);
        expect(Math.abs(Number(m[4]) - w![1])).toBeLessThan(1e-3);
        const fact = input.facts.find((x) => x.id === m[1])!;
        expect(m[2]).toBe(fact.exact);
        // The same point in the TikZ file (y measured from the bottom, 2 decimals).
        const t = new RegExp(`\\((${w![0].toFixed(2).replace('-', '\\-')}|${(+w![0].toFixed(2)).toString().replace('-', '\\-')}),([-\\d.]+)\\) circle\\[radius=[\\d.]+pt\\]; % [^\\n]* = ${fact.exact}`).exec(tikz);
        expect(t, `TikZ dot of ${fact.label}`).not.toBeNull();
        expect(Math.abs(Number(t![2]) - (H - w![1]))).toBeLessThan(6e-3);
        compared++;
      }
      expect(compared).toBeGreaterThan(0);
      // Curves carry their equations and exact coefficients in both files.
      for (const fact of input.facts.filter((x) => x.type === 'curve' && x.coefficients)) {
        expect(svg).toContain(`coefficients (${fact.coefficients!.join(', ')})`);
        expect(tikz).toContain(`coefficients (${fact.coefficients!.join(', ')})`);
      }
    });
  }
});

describe('hostile labels in figures', () => {
  it('stay text in Chromium and in LaTeX', async () => {
    const scene = hostileScene();
    const input = sceneFigureInput(scene);
    const svg = figureToSvg(input);
    const path = join(dir, 'hostile.svg');
    writeFileSync(path, svg);
    const look = await chromiumLook(path);
    expect(look.parseErrors).toBe(0);
    expect(look.scripts).toBe(0);
    expect(look.foreign).toBe(0);
    expect(look.pwned).toBeNull();
    // Every label the display list draws (crowded ones are left out, as on the canvas) is there as text.
    const drawn = input.list.items.flatMap((i) => (i.kind === 'label' ? [i.text] : []));
    expect(drawn.filter((t) => t.includes('__ninefoldPwned') || t.includes('\\input')).length).toBeGreaterThanOrEqual(2);
    for (const t of drawn) expect(look.texts).toContain(t);
    const tex = join(dir, 'hostile.tex');
    writeFileSync(tex, figureToTikzStandalone(input));
    execFileSync('pdflatex', ['-interaction=nonstopmode', '-halt-on-error', '-no-shell-escape', `-output-directory=${dir}`, tex], { cwd: dir, stdio: 'pipe', timeout: 120_000 });
    expect(drawn).toContain('\\input{/etc/passwd} $x^2$ % & # _ { }');
    const text = execFileSync('pdftotext', [join(dir, 'hostile.pdf'), '-'], { encoding: 'utf8' });
    expect(text).toContain('\\input{/etc/passwd}');
  });
});

describe('the TikZ snippet', () => {
  it('compiles when pasted into an article that loads tikz (greyscale print settings)', () => {
    const scene = scenes.find(([f]) => f === 'ninth-point.json')![1];
    const snippet = figureToTikzSnippet(sceneFigureInput(scene, { greyscale: true, widthPt: 300, fontSizePt: 8 }));
    const doc = ['\\documentclass{article}', '\\usepackage{tikz}', '\\begin{document}', 'A figure:', '', snippet, '', '\\end{document}', ''].join('\n');
    const tex = join(dir, 'paper.tex');
    writeFileSync(tex, doc);
    execFileSync('pdflatex', ['-interaction=nonstopmode', '-halt-on-error', '-no-shell-escape', `-output-directory=${dir}`, tex], { cwd: dir, stdio: 'pipe', timeout: 120_000 });
    execFileSync('pdftoppm', ['-gray', '-r', '40', '-singlefile', join(dir, 'paper.pdf'), join(dir, 'paper')], { stdio: 'pipe', timeout: 60_000 });
    const px = pgmDark(join(dir, 'paper.pgm'));
    expect(px.dark / px.total).toBeGreaterThan(0.002);
    // greyscale: every colour defined in the picture is a grey
    for (const m of snippet.matchAll(/\\definecolor\{\w+\}\{HTML\}\{([0-9A-F]{6})\}/g)) expect(m[1]).toMatch(/^([0-9A-F]{2})\1\1$/);
  });
});
