// The worker's jobs, run in Node: the background evaluation equals the evaluation on the page's thread,
// deferred objects wait for it, and the point search reports progress and points.
import { describe, expect, it } from 'vitest';
import { jobRun } from '../../../src/worker/job-run.ts';
import type { JobReply } from '../../../src/worker/jobs.ts';
import { constructionAdd, constructionEmpty } from '../../../src/construct/graph.ts';
import { DEFERRED_MESSAGE, constructionEvaluate } from '../../../src/construct/evaluate.ts';
import { kindIsHeavy } from '../../../src/construct/kinds.ts';
import type { ConstructionDoc } from '../../../src/construct/types.ts';

function doc(): { doc: ConstructionDoc; meet: string; line: string } {
  let d = constructionEmpty();
  const add = (kind: string, parents: string[], params: Record<string, string>): string => {
    const r = constructionAdd(d, { construction: { kind: kind as never, parents, params } });
    d = r.doc;
    return r.id;
  };
  const e = add('curve-equation', [], { equation: 'y^2 = x^3 - 4x + 4' });
  const c = add('curve-equation', [], { equation: 'x^2 + y^2 = 8' }); // through (2, ±2) and (-2, ±2)
  const meet = add('point-meet', [e, c], { index: '0' });
  const p = add('point-free', [], { at: '5:5:1' });
  const line = add('line-through-two', [meet, p], {});
  return { doc: d, meet, line };
}

describe('background evaluation', () => {
  it('marks curve–curve meets as heavy, and small multiples as light', () => {
    expect(kindIsHeavy('point-meet', ['curve', 'curve'], { index: '0' })).toBe(true);
    expect(kindIsHeavy('point-meet', ['line', 'curve'], { index: '0' })).toBe(false);
    expect(kindIsHeavy('point-multiple', ['curve', 'point', 'point'], { n: '12' })).toBe(false);
    expect(kindIsHeavy('point-multiple', ['curve', 'point', 'point'], { n: '1000' })).toBe(true);
  });
  it('defers heavy objects (their children wait) and the worker job gives the full exact values', () => {
    const { doc: d, meet, line } = doc();
    const here = constructionEvaluate(d, { defer: (o) => o.id === meet });
    expect(here.get(meet)).toMatchObject({ type: 'failure', message: DEFERRED_MESSAGE });
    expect(here.get(line)).toMatchObject({ type: 'failure' });
    const replies: JobReply[] = [];
    jobRun({ kind: 'evaluate', job: 7, doc: JSON.parse(JSON.stringify(d)) }, (r) => replies.push(r));
    expect(replies).toHaveLength(1);
    const r = replies[0];
    if (r.kind !== 'values') throw new Error(`expected values, got ${JSON.stringify(r)}`);
    expect(r.job).toBe(7);
    expect(r.values.get(meet)).toEqual(constructionEvaluate(d).get(meet));
    expect(r.values.get(meet)).toMatchObject({ type: 'point', status: 'exact' });
    expect(r.values.get(line)).toMatchObject({ type: 'line', status: 'exact' });
  });
  it('runs a point search with progress, and refuses bad input in words', () => {
    const replies: JobReply[] = [];
    // y^2 = x^3 - 4x + 4: Z^3 ... coefficients in the order of form.ts: X^3, X^2Y, X^2Z, XY^2, XYZ, XZ^2, Y^3, Y^2Z, YZ^2, Z^3.
    jobRun({ kind: 'search', job: 1, coeffs: ['1', '0', '0', '0', '0', '-4', '0', '-1', '0', '4'], height: 3, box: null }, (r) => replies.push(r));
    const found = replies.find((r) => r.kind === 'found');
    if (!found || found.kind !== 'found') throw new Error(JSON.stringify(replies));
    expect(found.points).toEqual(expect.arrayContaining(['0:1:0', '1:1:1', '2:2:1', '0:2:1']));
    expect(replies.some((r) => r.kind === 'progress')).toBe(true);
    const bad: JobReply[] = [];
    jobRun({ kind: 'search', job: 2, coeffs: ['1', '2'], height: 3, box: null }, (r) => bad.push(r));
    expect(bad[0]).toMatchObject({ kind: 'error', message: 'a curve with 2 coefficients has no degree' });
  });
});
