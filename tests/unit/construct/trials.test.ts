// Theorem trials: theorems hold on every random instance, a false claim fails and its counterexample
// reopens as a scene in which the claim fails again.
// Sources of the theorems: Pascal's hexagon theorem (Coxeter, Projective Geometry, 2nd ed., §9.2);
// Cayley–Bacharach for cubics (Eisenbud, Green, Harris, Bull. AMS 33 (1996), Theorem CB3); associativity of
// the chord-and-tangent law for any base point (Silverman–Tate, Rational Points on Elliptic Curves, I.2).
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { constructionAdd, constructionEmpty } from '../../../src/construct/graph.ts';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';
import { constructionTrials, curvePointRandom } from '../../../src/construct/trials.ts';
import { seededUniform } from '../../../src/exact/random.ts';
import type { ConstructionDoc } from '../../../src/construct/types.ts';
import { sceneParse } from '../../../src/scene/load.ts';
import { sceneToText } from '../../../src/scene/save.ts';
import { sceneCounterexample } from '../../../src/scene/counterexample.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { formEval } from '../../../src/poly/form.ts';
import { pointParse } from '../../../src/plane/parse-point.ts';
import { det3 } from '../../../src/plane/point.ts';

const demo = (name: string) => sceneParse(readFileSync(new URL(`../../../scenes/${name}.json`, import.meta.url), 'utf8'));

function falseClaim(): ConstructionDoc {
  let doc = constructionEmpty();
  const ids: string[] = [];
  for (const [at, label] of [['0:0:1', 'A'], ['1:1:1', 'B'], ['2:2:1', 'C']] as const) {
    const r = constructionAdd(doc, { construction: { kind: 'point-free', parents: [], params: { at } }, label });
    doc = r.doc;
    ids.push(r.id);
  }
  return constructionAdd(doc, { construction: { kind: 'check-collinear', parents: ids, params: {} }, label: 'A, B, C collinear' }).doc;
}

describe('theorem trials', () => {
  it("Pascal's line holds in every instance (points re-drawn as rational points of the conic)", () => {
    const r = constructionTrials(demo('pascal-line').doc, { count: 50, seed: 7 });
    expect(r.completed).toBe(50);
    expect(Object.values(r.redrawn).every((w) => w === 'random rational point of the curve')).toBe(true);
    const c = r.checks[0];
    expect([c.held, c.failed, c.undecided, c.degenerate]).toEqual([50, 0, 0, 0]);
  });

  it('associativity holds on a smooth cubic with a base point that is not a flex', () => {
    const r = constructionTrials(demo('group-law').doc, { count: 50, seed: 11 });
    const assoc = r.checks.find((c) => c.label.includes('(P+Q)+R'))!;
    expect(assoc.held).toBe(50);
    expect(assoc.failed).toBe(0);
  });

  it('the ninth point of the pencil lies on every member in every instance', () => {
    const r = constructionTrials(demo('ninth-point').doc, { count: 50, seed: 3 });
    for (const c of r.checks) {
      expect(c.failed, c.label).toBe(0);
      expect(c.held + c.degenerate, c.label).toBe(50);
      expect(c.held, c.label).toBeGreaterThanOrEqual(45);
    }
  });

  it('a false claim (three random points collinear) fails, and its counterexample reopens failing', () => {
    const doc = falseClaim();
    expect(constructionEvaluate(doc).get(doc.objects[3].id)).toMatchObject({ verdict: 'holds' });
    const r = constructionTrials(doc, { count: 50, seed: 5 });
    const c = r.checks[0];
    expect(c.failed).toBeGreaterThan(40);
    expect(c.firstFailure).not.toBeNull();
    const f = c.firstFailure!;
    expect(f.certificate).toMatch(/det/);
    // Saved as a scene and opened again: the check fails there, with the same certificate.
    const scene = sceneCounterexample({ title: 'three points', notes: '', doc, view: demo('pascal-line').view }, c.label, f);
    const back = sceneParse(sceneToText(scene));
    const v = constructionEvaluate(back.doc).get(back.doc.objects[3].id);
    expect(v).toMatchObject({ type: 'check', verdict: 'fails', certificate: f.certificate });
    const [a, b, cc] = back.doc.objects.slice(0, 3).map((o) => pointParse(o.construction.params.at));
    expect(det3(a, b, cc)).not.toBe(0n);
  });

  it('the same seed gives the same instances; another seed other ones', () => {
    const doc = falseClaim();
    const a = constructionTrials(doc, { count: 5, seed: 9 });
    const b = constructionTrials(doc, { count: 5, seed: 9 });
    const c = constructionTrials(doc, { count: 5, seed: 10 });
    expect(a.checks[0].firstFailure!.doc).toEqual(b.checks[0].firstFailure!.doc);
    expect(a.checks[0].firstFailure!.doc).not.toEqual(c.checks[0].firstFailure!.doc);
  });

  it('reports progress and stops when cancelled, keeping what it counted', () => {
    const seen: number[] = [];
    let n = 0;
    const r = constructionTrials(falseClaim(), { count: 50, onProgress: (d) => seen.push(d), isCancelled: () => ++n > 10 });
    expect(r.cancelled).toBe(true);
    expect(r.completed).toBe(10);
    expect(seen).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    expect(r.checks[0].held + r.checks[0].failed + r.checks[0].degenerate).toBe(10);
  });

  it('random rational points of a cubic and of a conic lie on them exactly (seeded loop)', () => {
    const seed = 20261201;
    const rand = seededUniform(seed);
    const cubic = formParse('y^2 = x^3 - 7x + 10').form;
    const conic = formParse('x^2 + xy + y^2 = 7').form;
    const cubicPool = [pointParse('1,2'), pointParse('-1,4')];
    const conicPool = [pointParse('1,2')];
    for (let k = 0; k < 40; k++) {
      const p = curvePointRandom(cubic, cubicPool, rand, 12);
      const q = curvePointRandom(conic, conicPool, rand, 12);
      expect(p, `seed ${seed}, step ${k}`).not.toBeNull();
      expect(formEval(cubic, p!), `seed ${seed}, step ${k}, point ${p}`).toBe(0n);
      expect(formEval(conic, q!), `seed ${seed}, step ${k}, point ${q}`).toBe(0n);
    }
    expect(cubicPool.length).toBeGreaterThan(10);
  });

  it('a point on a curve with no known rational point becomes a random real algebraic point of it', () => {
    let doc = constructionEmpty();
    const c = constructionAdd(doc, { construction: { kind: 'curve-equation', parents: [], params: { equation: 'x^3 + 2y^3 = 7x + 1' } } });
    // (1, y) with 2y^3 = 7: an irrational real point, the only kind of seed this curve offers here.
    const p = constructionAdd(c.doc, { construction: { kind: 'point-on-curve', parents: [c.id], params: { x: '1', near: '1' } }, label: 'P' });
    doc = constructionAdd(p.doc, { construction: { kind: 'check-on-curve', parents: [p.id, c.id], params: {} }, label: 'P on the curve' }).doc;
    const r = constructionTrials(doc, { count: 6, seed: 4 });
    expect(r.redrawn[p.id]).toBe('random real algebraic point of the curve');
    const t = r.checks[0];
    expect(t.failed).toBe(0);
    expect(t.held + t.undecided + t.degenerate).toBe(6);
    expect(t.held + t.undecided).toBeGreaterThan(0);
    expect(curvePointRandom(formParse('x^3 + 2y^3 = 7x + 1').form, [], seededUniform(1), 12)).toBeNull();
  });
});

describe('trials on a cubic whose points in the scene are not rational', () => {
  it('seeds the random rational points from the point search', () => {
    let doc = constructionEmpty();
    const c = constructionAdd(doc, { construction: { kind: 'curve-equation', parents: [], params: { equation: 'y^2 = x^3 - 7x + 10' } } });
    // (1/2, y) with y^2 = 53/8: irrational, so the scene offers no rational seed.
    const p = constructionAdd(c.doc, { construction: { kind: 'point-on-curve', parents: [c.id], params: { x: '1/2', near: '3' } }, label: 'P' });
    doc = constructionAdd(p.doc, { construction: { kind: 'check-on-curve', parents: [p.id, c.id], params: {} }, label: 'P on E' }).doc;
    expect(constructionEvaluate(doc).get(p.id)).toMatchObject({ status: 'algebraic' });
    const r = constructionTrials(doc, { count: 10, seed: 8 });
    expect(r.redrawn[p.id]).toBe('random rational point of the curve');
    expect(r.checks[0]).toMatchObject({ held: 10, failed: 0, undecided: 0 });
  });
});

describe('the trials job of the job worker', () => {
  it('posts progress with tallies, then the report, all as plain data; a cancelled run keeps the last tallies', async () => {
    const { jobRun } = await import('../../../src/worker/job-run.ts');
    const replies: unknown[] = [];
    jobRun({ kind: 'trials', job: 3, doc: JSON.parse(JSON.stringify(falseClaim())), count: 4, seed: 2 }, (r) => replies.push(structuredClone(r)));
    expect(replies.map((r) => (r as { kind: string }).kind)).toEqual(['progress', 'progress', 'progress', 'progress', 'trials']);
    const last = replies[3] as { job: number; done: number; total: number; checks: { held: number; failed: number }[] };
    expect([last.job, last.done, last.total]).toEqual([3, 4, 4]);
    expect(last.checks[0].held + last.checks[0].failed).toBe(4);
    const done = replies[4] as { job: number; report: { completed: number; checks: unknown[] } };
    expect(done.job).toBe(3);
    expect(done.report.completed).toBe(4);
    expect(done.report.checks).toEqual(last.checks); // the tallies of the last step are the report's
    // The same run as the page's thread would make it (same seed, same instances).
    expect(done.report).toEqual(structuredClone(constructionTrials(falseClaim(), { count: 4, seed: 2 })));
  });
  it('refuses a construction that is not one, in words', async () => {
    const { jobRun } = await import('../../../src/worker/job-run.ts');
    const replies: { kind: string; message?: string }[] = [];
    jobRun({ kind: 'trials', job: 1, doc: { objects: 7 } as never, count: 2, seed: 1 }, (r) => replies.push(r));
    expect(replies).toHaveLength(1);
    expect(replies[0].kind).toBe('error');
    expect(replies[0].message).toMatch(/\w/);
  });
});
