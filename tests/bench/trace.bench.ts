// Benchmark "tracer": 20 cubics (singular ones included) at 1920 x 1080. Printed in one run: the median
// retrace (landmarks reused, as in a drag), the median first trace (exact landmarks included), a plain
// per-pixel marching-squares baseline over the same view, the ratio, and how many cubics each drew with
// the wrong number of connected components (a dot counts as one) against the known answer.
import type { BenchFigure, BenchSuite } from './bench.ts';
import { medianMs } from './bench.ts';
import { formParse } from '../../src/poly/parse.ts';
import { curveLandmarks, formFloatCoefficients } from '../../src/poly/curve-landmarks.ts';
import { curvePrepare, curveTrace, type CurveTrace, type TraceView } from '../../shaders-free-render/trace.ts';
import { marchingSquares } from '../../shaders-free-render/baseline-marching.ts';

const VIEW: TraceView = { xmin: -4, ymin: -2.25, xmax: 4, ymax: 2.25, width: 1920, height: 1080 };

// Connected components of the real curve inside VIEW (an isolated point or an oval under a pixel counts
// as one), worked out by hand from the factorisations and the sign of the cubic in x noted beside each.
const CUBICS: readonly { eq: string; components: number; note: string }[] = [
  { eq: 'y^2 = x^3 - 3x + 2', components: 1, note: 'node at (1, 0): (x - 1)^2 (x + 2)' },
  { eq: 'y^2 = (x - 1)^3', components: 1, note: 'cusp at (1, 0)' },
  { eq: 'y^2 = (x - 1)^2 (x - 2)', components: 2, note: 'acnode at (1, 0) and the branch x >= 2' },
  { eq: 'y^2 = x^3 - 4x', components: 2, note: 'oval over [-2, 0] and the branch x >= 2' },
  { eq: 'y^2 = x^3 + 2x + 3', components: 1, note: '(x + 1)(x^2 - x + 3): one real root' },
  { eq: 'x^3 + y^3 = 3 x y', components: 1, note: 'folium: node at the origin' },
  { eq: 'y = x^3 - 3x', components: 1, note: 'a graph' },
  { eq: 'x y (x - y - 1) = 0', components: 1, note: 'three lines meeting pairwise inside the view' },
  { eq: '(x - 1)(x + y - 1)(2x - y - 2) = 0', components: 1, note: 'three lines through (1, 0)' },
  { eq: '(2y - x)(x^2 + y^2 - 5) = 0', components: 1, note: 'a line through the centre of a circle' },
  { eq: '(y - 2)(x^2 + y^2 - 4) = 0', components: 1, note: 'a circle and its tangent' },
  { eq: '(y - 2)(x^2 + y^2 - 1) = 0', components: 2, note: 'a circle and a line missing it' },
  { eq: 'y^2 = x (x + 1/500) (x - 1)', components: 2, note: 'an oval of half a pixel and the branch x >= 1' },
  { eq: 'y^2 = x (x + 1/20) (x - 1)', components: 2, note: 'a small oval and the branch x >= 1' },
  { eq: 'x (y^2 - 1) = 1', components: 3, note: 'two branches over x > 0, one over x <= -1' },
  { eq: 'y (x^2 + 1) = 1', components: 1, note: 'a graph with a horizontal asymptote' },
  { eq: 'y^2 (1 - x) = x^2 (1 + x)', components: 1, note: 'strophoid: node at the origin, asymptote x = 1' },
  { eq: 'y^2 (2 - x) = x^3', components: 1, note: 'cissoid: cusp at the origin, asymptote x = 2' },
  { eq: '4y^2 = 4x^3 - 4x + 1', components: 2, note: 'three real roots of 4x^3 - 4x + 1 (signs at -1.2, -1.1, 0.5, 1)' },
  { eq: 'y^2 = (x + 1)^2 (x + 3)', components: 1, note: 'node at (-1, 0), loop over [-3, -1]' },
];

class UnionFind {
  private readonly parent: number[] = [];
  add(): number {
    this.parent.push(this.parent.length);
    return this.parent.length - 1;
  }
  find(a: number): number {
    while (this.parent[a] !== a) a = this.parent[a] = this.parent[this.parent[a]];
    return a;
  }
  union(a: number, b: number): void {
    this.parent[this.find(a)] = this.find(b);
  }
  roots(): number {
    let n = 0;
    for (let i = 0; i < this.parent.length; i++) if (this.find(i) === i) n++;
    return n;
  }
}

/** Connected components of a trace: polylines joined where their ends coincide, plus the dots. */
function traceComponents(tr: CurveTrace): number {
  const uf = new UnionFind();
  const ends: [number, number, number][] = [];
  for (const p of tr.polylines) {
    const id = uf.add();
    if (!p.ends) continue;
    for (const e of p.ends) {
      for (const [x, y, j] of ends) if (Math.abs(x - e.x) + Math.abs(y - e.y) < 1e-9) uf.union(id, j);
      ends.push([e.x, e.y, id]);
    }
  }
  return uf.roots() + tr.dots.length;
}

export const traceBench: BenchSuite = {
  name: 'tracer',
  async run(): Promise<BenchFigure[]> {
    const figures: BenchFigure[] = [];
    const retrace: number[] = [];
    const first: number[] = [];
    const baseline: number[] = [];
    const floatOnly: number[] = [];
    let tracerErrors = 0;
    let baselineErrors = 0;
    let vertices = 0;
    for (const c of CUBICS) {
      const form = formParse(c.eq).form;
      const floats = { degree: form.degree, coeffs: formFloatCoefficients(form) };
      const prepared = curvePrepare(floats, curveLandmarks(form));
      const rt = medianMs(() => curveTrace(prepared, VIEW), 21, 5);
      const ft = medianMs(() => curveTrace(curvePrepare(floats, curveLandmarks(form)), VIEW), 7, 2);
      const bt = medianMs(() => marchingSquares(floats, VIEW), 3, 1);
      // Without the core: the tracer's own float search for critical points, redone for every view.
      const floatPrepared = curvePrepare(floats);
      const ot = medianMs(() => curveTrace(floatPrepared, VIEW), 21, 5);
      floatOnly.push(ot);
      const tr = curveTrace(prepared, VIEW);
      vertices += tr.stats.vertices;
      const got = traceComponents(tr);
      const ms = marchingSquares(floats, VIEW);
      if (got !== c.components) tracerErrors++;
      if (ms.components !== c.components) baselineErrors++;
      retrace.push(rt);
      first.push(ft);
      baseline.push(bt);
      figures.push({
        label: c.eq,
        values: { retraceMs: rt, firstMs: ft, floatOnlyMs: ot, marchingMs: bt, components: c.components, tracer: got, marching: ms.components },
      });
    }
    const med = (xs: number[]): number => [...xs].sort((a, b) => a - b)[xs.length >> 1];
    figures.push({
      label: `20 cubics at ${VIEW.width}x${VIEW.height}, medians`,
      values: {
        retraceMs: med(retrace),
        firstTraceWithLandmarksMs: med(first),
        floatLandmarksTraceMs: med(floatOnly),
        marchingSquaresMs: med(baseline),
        speedup: med(baseline) / med(retrace),
        tracerTopologyErrors: tracerErrors,
        marchingTopologyErrors: baselineErrors,
        meanVertices: Math.round(vertices / CUBICS.length),
      },
    });
    return figures;
  },
};
