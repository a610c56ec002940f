// Suite "drag": in Chromium (through playwright-core), the time from a pointer move to the redrawn frame
// while dragging a free point with 200 dependent objects on a smooth cubic — 100 lines through the dragged
// point and 100 of their meets with the cubic, all followed in floats during the drag — against the same
// drag with no dependents (the cost of the canvas and the tracer alone), in the same run. Median and 95th
// percentile in ms; nothing is asserted. A further run adds "pixels ready": after each move one pixel of
// the canvas is read back, so the figure also holds what the browser still had to rasterise.
import { constructionAdd, constructionEmpty } from '../../src/construct/graph.ts';
import type { ConstructionDoc } from '../../src/construct/types.ts';
import { loadavg } from 'node:os';
import { harnessStart, pageOpen, worldToPage } from '../e2e/canvas-helpers.ts';
import { median, percentile, type BenchFigure, type BenchSuite } from './bench.ts';

const CURVE = 'y^2 = x^3 - 4x + 4'; // our own smooth cubic
const MOVES = 120;

function construction(dependents: number): ConstructionDoc {
  let doc = constructionEmpty();
  const add = (kind: string, parents: string[], params: Record<string, string>): string => {
    const r = constructionAdd(doc, { construction: { kind: kind as never, parents, params } });
    doc = r.doc;
    return r.id;
  };
  const e = add('curve-equation', [], { equation: CURVE });
  const a = add('point-free', [], { at: '-1:3:1' });
  for (let k = 0; k < dependents / 2; k++) {
    // Fixed points spread along y = -4 (off the curve), one line to each from A, and where it meets E.
    const b = add('point-free', [], { at: `${k - 50}:-40:10` });
    const l = add('line-through-two', [a, b], {});
    add('point-meet', [l, e], { index: '0' });
  }
  return doc;
}

/** Read one pixel of the app's canvas: the browser must then finish rasterising what the sink drew. */
function pixelReadMs(): number {
  const app = document.querySelector('nf-app');
  const canvas = app?.shadowRoot?.querySelector('nf-canvas')?.shadowRoot?.querySelector('canvas') as HTMLCanvasElement | null | undefined;
  const ctx = canvas?.getContext('2d');
  if (!ctx) return NaN;
  const t = performance.now();
  ctx.getImageData(0, 0, 1, 1);
  return performance.now() - t;
}

async function dragTimes(dependents: number, pixels = false): Promise<{ move: number[]; ready: number[]; drop: number; parts: [number, number, number][] }> {
  const h = await harnessStart();
  try {
    const page = await pageOpen(h, 1280, 800);
    const doc = construction(dependents);
    await page.evaluate((d) => (window as unknown as { __ninefold: { load(d: unknown): void } }).__ninefold.load(d), JSON.parse(JSON.stringify(doc)));
    await page.evaluate(() => {
      const w = window as unknown as { __t0: number };
      window.addEventListener('pointermove', () => (w.__t0 = performance.now()), { capture: true });
    });
    await page.waitForTimeout(300);
    const [x0, y0] = await worldToPage(page, -1, 3);
    await page.mouse.move(x0, y0);
    await page.mouse.down();
    if (pixels) await page.evaluate(`window.__pixelReadMs = ${pixelReadMs.toString()}`);
    const times: number[] = [];
    const ready: number[] = [];
    for (let k = 1; k <= MOVES; k++) {
      const t = k / MOVES;
      await page.mouse.move(x0 + 260 * t, y0 + 90 * Math.sin(6 * t));
      const [dt, raster] = await page.evaluate(() => {
        const w = window as unknown as { __t0: number; __ninefold: { frames(): number[] }; __pixelReadMs?: () => number };
        const f = w.__ninefold.frames();
        return [f[f.length - 1] - w.__t0, w.__pixelReadMs ? w.__pixelReadMs() : NaN];
      });
      if (dt >= 0) {
        times.push(dt);
        if (Number.isFinite(raster)) ready.push(dt + raster);
      }
    }
    const parts = await page.evaluate(() => (window as unknown as { __ninefold: { frameParts(): [number, number, number][] } }).__ninefold.frameParts().slice(-120));
    const before = await page.evaluate(() => performance.now());
    await page.mouse.up();
    const drop = await page.evaluate((b) => performance.now() - b, before);
    await page.context().close();
    return { move: times, ready, drop, parts };
  } finally {
    await h.close();
  }
}

export const dragBench: BenchSuite = {
  name: 'drag',
  async run(): Promise<BenchFigure[]> {
    const full = await dragTimes(200);
    const bare = await dragTimes(0);
    // A separate run: reading a pixel back changes how the browser keeps the canvas, so it is kept
    // apart from the figures above.
    const ready = await dragTimes(200, true);
    return [
      {
        label: `pointer move to redrawn frame, free point with 200 dependents on ${CURVE} (${full.move.length} moves)`,
        values: { medianMs: median(full.move), p95Ms: percentile(full.move, 95), targetMedianMs: 8, loadAverage1m: loadavg()[0] },
      },
      {
        label: 'the same drag with no dependents (grid, curve and one point only)',
        values: { medianMs: median(bare.move), p95Ms: percentile(bare.move, 95), ratio: median(full.move) / Math.max(1e-9, median(bare.move)) },
      },
      {
        label: 'where a frame of the 200-dependent drag goes (medians)',
        values: {
          displayListMs: median(full.parts.map((p) => p[0])),
          sinkDrawMs: median(full.parts.map((p) => p[1])),
          recomputeAndRestMs: median(full.move) - median(full.parts.map((p) => p[0] + p[1] + p[2])),
        },
      },
      {
        label: 'pointer move to pixels ready (frame drawn and rasterised: one pixel of the canvas read back), 200 dependents',
        values: { medianMs: median(ready.ready), p95Ms: percentile(ready.ready, 95), drawnMedianMs: median(ready.move) },
      },
      { label: 'drop: exact recomputation of the 200 dependents and redraw (one sample, upper bound)', values: { ms: full.drop } },
    ];
  },
};
