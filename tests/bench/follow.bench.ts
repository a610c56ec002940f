// Suite "follow": in Node, the cost of one drag step (constructionEvaluate with a moving point) for the
// kinds that follow a drag in floats since the follow-up work: curve–curve meets (Newton from the last
// place), ninth points and pencil members (float pencil), parameter points (followed singular point) and
// Weierstrass images (forward forms in doubles). Each figure is a median over the steps of a 120-step
// drag, with the per-object cost, against the 16.7 ms of a 60 fps frame and against the same drag of
// line–curve meets (followed in floats before this work) as a baseline. Nothing is asserted.
import { constructionAdd, constructionEmpty } from '../../src/construct/graph.ts';
import { constructionEvaluate } from '../../src/construct/evaluate.ts';
import type { ConstructionDoc, ObjectId, ObjectValue, PointApprox } from '../../src/construct/types.ts';
import { cubicParametrisation, parametrisationAt } from '../../src/cubic/parametrise.ts';
import { formParse } from '../../src/poly/parse.ts';
import { median, type BenchFigure, type BenchSuite } from './bench.ts';

const CUBIC = 'y^2 = x^3 - 4x + 4'; // our own
const NODAL = '2(x - 1)^3 - (x - 1)^2 (y - 2) + (y - 2)^3 + (x - 1)^2 + (x - 1)(y - 2) - (y - 2)^2 = 0'; // our own, node at (1, 2)
const STEPS = 120;
const COUNT = 30;

interface Setup {
  readonly doc: ConstructionDoc;
  readonly moving: ObjectId;
  /** The dragged point's place at step k (0..STEPS). */
  readonly at: (k: number) => PointApprox;
}

function builder() {
  let doc = constructionEmpty();
  const add = (kind: string, parents: string[], params: Record<string, string> = {}): string => {
    const r = constructionAdd(doc, { construction: { kind: kind as never, parents, params } });
    doc = r.doc;
    return r.id;
  };
  return { add, doc: () => doc };
}

const EIGHT = ['0:0:1', '1:2:1', '-2:1:1', '3:-1:1', '-1:-3:1', '2:3:1', '-3:2:2', '1:-2:3'];
const slide = (k: number): PointApprox => ({ x: 0.6 * (k / STEPS), y: -0.2 * Math.sin((3 * k) / STEPS), finite: true });

function lineMeets(): Setup {
  const b = builder();
  const e = b.add('curve-equation', [], { equation: CUBIC });
  const a = b.add('point-free', [], { at: EIGHT[0] });
  for (let k = 0; k < COUNT; k++) {
    const q = b.add('point-free', [], { at: `${k - 15}:-40:10` });
    b.add('point-meet', [b.add('line-through-two', [a, q]), e], { index: '0' });
  }
  return { doc: b.doc(), moving: a, at: slide };
}

function curveMeets(): Setup {
  const b = builder();
  const e = b.add('curve-equation', [], { equation: CUBIC });
  const pts = EIGHT.map((at) => b.add('point-free', [], { at }));
  // conics through the moving point and four of the others, each met by the cubic
  // (each of these conics meets the cubic in four real points: 7 × 4 = 28 followed meets)
  for (let k = 0; k < 7; k++) {
    const four = [1, 2, 3, 4, 5, 6, 7].filter((i) => i !== 1 + (k % 7)).slice(0, 4).map((i) => pts[i]);
    const c = b.add('conic-through-five', [pts[0], ...four]);
    for (let j = 0; j < 4; j++) b.add('point-meet', [c, e], { index: String(j) });
  }
  return { doc: b.doc(), moving: pts[0], at: slide };
}

function pencils(): Setup {
  const b = builder();
  const pts = EIGHT.map((at) => b.add('point-free', [], { at }));
  for (let k = 0; k < COUNT / 2; k++) {
    b.add('point-ninth', pts);
    b.add('pencil-member', pts, { member: `${k + 1}:${2 - k}` });
  }
  return { doc: b.doc(), moving: pts[0], at: slide };
}

function parameters(): Setup {
  const b = builder();
  const n = b.add('curve-equation', [], { equation: NODAL });
  const par = cubicParametrisation(formParse(NODAL).form);
  const qs = [[1, 2], [2, 1], [-1, 3], [3, 1], [1, -2], [2, -3], [4, 1], [1, 4]].map(([s, t]) => b.add('point-parameter', [n], { at: `${s}:${t}` }));
  const z0 = parametrisationAt(par, 5n, 2n);
  const z = b.add('point-free', [], { at: z0.join(':') });
  const k9 = b.add('cubic-through-nine', [...qs, z]);
  for (let k = 0; k < COUNT; k++) b.add('point-parameter', [k9], { at: `${k - 15}:7` });
  const at = (k: number): PointApprox => {
    const p = parametrisationAt(par, 50n + BigInt(k), 20n);
    return { x: Number(p[0]) / Number(p[2]), y: Number(p[1]) / Number(p[2]), finite: true };
  };
  return { doc: b.doc(), moving: z, at };
}

function images(): Setup {
  const b = builder();
  const c = b.add('curve-equation', [], { equation: 'x^3 + xy^2 - 2y^3 + x^2 - 3y + 2 = 0' });
  const o = b.add('point-on-curve', [c], { at: '1:1:1' });
  const p = b.add('point-on-curve', [c], { at: '2:-1:-2' });
  const q = b.add('point-on-curve', [c], { at: '6:-1:-4' });
  b.add('curve-weierstrass', [c, o]);
  let r = p;
  for (let k = 0; k < COUNT; k++) {
    r = k % 2 ? b.add('point-third', [c, r, q]) : b.add('point-sum', [c, o, r, p]);
    b.add('point-weierstrass-image', [c, o, r]);
  }
  // P slides along the curve from (-1, 1/2): the float shadow of a point on a curve projects the pointer onto it
  return { doc: b.doc(), moving: p, at: (k) => ({ x: -1 - 0.3 * (k / STEPS), y: 0.5, finite: true }) };
}

function dragMedian(s: Setup): number {
  let values: Map<ObjectId, ObjectValue> = constructionEvaluate(s.doc);
  const times: number[] = [];
  for (let k = 1; k <= STEPS; k++) {
    const t0 = performance.now();
    values = constructionEvaluate(s.doc, { previous: values, changed: new Set([s.moving]), moving: new Map([[s.moving, s.at(k)]]) });
    times.push(performance.now() - t0);
  }
  return median(times);
}

export const followBench: BenchSuite = {
  name: 'follow',
  async run(): Promise<BenchFigure[]> {
    const cases: [string, () => Setup, number][] = [
      [`${COUNT} line–curve meets (baseline, followed before this work)`, lineMeets, COUNT],
      [`28 conic–cubic meets (Newton from the last place) and their 7 conics`, curveMeets, 28],
      [`${COUNT / 2} ninth points + ${COUNT / 2} pencil members through the moving point`, pencils, COUNT],
      [`${COUNT} parameter points on a cubic through nine points`, parameters, COUNT],
      [`${COUNT} Weierstrass images of points built from the moving point (and the chords/sums themselves)`, images, COUNT],
    ];
    const out: BenchFigure[] = [];
    let base = 0;
    for (const [label, make, count] of cases) {
      const s = make();
      dragMedian(s); // warm the JIT
      const ms = dragMedian(s);
      if (!base) base = ms;
      out.push({ label: `drag step in Node, ${label}`, values: { medianMs: Number(ms.toFixed(3)), perObjectUs: Number(((1000 * ms) / count).toFixed(1)), frameBudgetMs: 16.7, ratioToBaseline: Number((ms / base).toFixed(2)) } });
    }
    return out;
  },
};
