// "scenes": opening and saving each demo scene (parse, validate, integrity, write), exporting its figure
// (display list with the tracer, SVG, TikZ, PNG through resvg at 300 dpi), and theorem trials (ms per
// random instance). Baseline for the trials on the group-law scene: PARI/GP deciding the same
// associativity on 2,000 random point triples of the same curve (elladd in the usual law), timed inside gp.
import { readFileSync } from 'node:fs';
import { median, medianMs, type BenchFigure, type BenchSuite } from './bench.ts';
import { gp } from '../reference/oracles.ts';
import { sceneParse } from '../../src/scene/load.ts';
import { sceneToText } from '../../src/scene/save.ts';
import { sceneFigureInput } from '../../src/export/scene-figure.ts';
import { figureToSvg } from '../../src/export/svg.ts';
import { figureToTikzStandalone } from '../../src/export/tikz.ts';
import { svgToPng } from '../../src/export/png.ts';
import { constructionTrials } from '../../src/construct/trials.ts';

const DIR = new URL('../../scenes/', import.meta.url);
const index = JSON.parse(readFileSync(new URL('index.json', DIR), 'utf8')) as { scenes: { file: string }[] };

export const scenesBench: BenchSuite = {
  name: 'scenes',
  async run(): Promise<BenchFigure[]> {
    const out: BenchFigure[] = [];
    for (const { file } of index.scenes) {
      const text = readFileSync(new URL(file, DIR), 'utf8');
      const scene = sceneParse(text);
      const openMs = medianMs(() => sceneParse(text));
      const saveMs = medianMs(() => sceneToText(scene));
      const input = sceneFigureInput(scene);
      const displayMs = medianMs(() => sceneFigureInput(scene), 5, 1);
      const svg = figureToSvg(input);
      const svgMs = medianMs(() => figureToSvg(input));
      const tikzMs = medianMs(() => figureToTikzStandalone(input));
      const pngMs = medianMs(() => svgToPng(svg, 300), 3, 1);
      const t0 = performance.now();
      const r = constructionTrials(scene.doc, { count: 50, seed: 1 });
      const trialsMs = performance.now() - t0;
      out.push({
        label: `${file}: open / save / figure (display list, SVG, TikZ, PNG 300 dpi) / 50 trials`,
        values: {
          openMs: +openMs.toFixed(2),
          saveMs: +saveMs.toFixed(2),
          displayListMs: +displayMs.toFixed(1),
          svgMs: +svgMs.toFixed(2),
          tikzMs: +tikzMs.toFixed(2),
          png300dpiMs: +pngMs.toFixed(1),
          svgKB: +(svg.length / 1024).toFixed(1),
          trialsPerInstanceMs: +(trialsMs / r.completed).toFixed(2),
          held: r.checks.map((c) => `${c.held}/${r.completed}`).join(' '),
        },
      });
    }
    // Baseline: associativity of 2,000 random triples on y^2 = x^3 - 7x + 10 in PARI (points P, Q, R from
    // small combinations of two generators; the same count of additions as one of our instances).
    const group = sceneParse(readFileSync(new URL('group-law.json', DIR), 'utf8'));
    const times: number[] = [];
    for (let k = 0; k < 3; k++) {
      const t0 = performance.now();
      constructionTrials(group.doc, { count: 50, seed: 100 + k });
      times.push(performance.now() - t0);
    }
    const pariMs = Number(
      gp(`E = ellinit([0,0,0,-7,10]); G = [[1,2],[-1,4]]; setrand(1);
{
t0 = getabstime();
for (i = 1, 2000,
  P = ellmul(E, G[1], random(7) - 3); P = elladd(E, P, ellmul(E, G[2], random(7) - 3));
  Q = elladd(E, ellmul(E, G[1], random(7) - 3), ellmul(E, G[2], random(7) - 3));
  R = elladd(E, ellmul(E, G[1], random(7) - 3), ellmul(E, G[2], random(7) - 3));
  if (elladd(E, elladd(E, P, Q), R) != elladd(E, P, elladd(E, Q, R)), error("not associative")));
print(getabstime() - t0);
}`).at(-1),
    );
    out.push({
      label: 'group-law trials per instance (re-draw, recompute the whole scene exactly, decide both checks) vs PARI deciding associativity of one random triple (2,000 triples timed inside gp)',
      values: {
        oursPerInstanceMs: +(median(times) / 50).toFixed(3),
        pariPerTripleMs: +(pariMs / 2000).toFixed(4),
        ratio: +(median(times) / 50 / Math.max(1e-3, pariMs / 2000)).toFixed(1),
      },
    });
    return out;
  },
};
