// `trials SCENE.json [--count N] [--seed S] [--counterexample OUT.json]`: re-draw every free point of the
// scene as a random exact point N times and decide every check again; report how many instances held and
// save the first counterexample as a scene that opens like any other.
import { writeFileSync } from 'node:fs';
import { InvalidInput } from '../../exact/errors.ts';
import { constructionTrials } from '../../construct/trials.ts';
import { sceneParse } from '../../scene/load.ts';
import { sceneToText } from '../../scene/save.ts';
import { sceneCounterexample } from '../../scene/counterexample.ts';
import { optionInteger, optionString, positionalAt, type Args } from '../args.ts';
import type { Verb } from '../verb.ts';
import { sceneFileRead } from './figure.ts';

export const trials: Verb = {
  name: 'trials',
  usage: 'trials SCENE.json [--count N (default 50)] [--seed S (default 1)] [--counterexample OUT.json]',
  run(args: Args) {
    const file = positionalAt(args, 0, 'scene file');
    const scene = sceneParse(sceneFileRead(file));
    const count = optionInteger(args, 'count', 50, 1, 100_000);
    const seed = optionInteger(args, 'seed', 1, 0, 2 ** 32 - 1);
    const out = optionString(args, 'counterexample');
    const report = constructionTrials(scene.doc, { count, seed });
    if (!report.checks.length) throw new InvalidInput('the scene has no checks to try', 'argument 1');
    let saved: string | null = null;
    const first = report.checks.find((c) => c.firstFailure);
    if (out && first?.firstFailure) {
      try {
        writeFileSync(out, sceneToText(sceneCounterexample(scene, first.label, first.firstFailure)));
      } catch (e) {
        throw new InvalidInput(`cannot write "${out}": ${(e as Error).message}`, '--counterexample');
      }
      saved = out;
    }
    return {
      scene: file,
      count: report.requested,
      completed: report.completed,
      seed: report.seed,
      redrawn: Object.fromEntries(Object.entries(report.redrawn).map(([id, way]) => [labelOf(scene.doc, id), way])),
      checks: report.checks.map((c) => ({
        label: c.label,
        claim: c.claim,
        held: c.held,
        failed: c.failed,
        undecided: c.undecided,
        degenerate: c.degenerate,
        firstFailure: c.firstFailure
          ? {
              trial: c.firstFailure.trial,
              certificate: c.firstFailure.certificate,
              points: pointsOf(c.firstFailure.doc),
              ...(saved && c === first ? { savedAs: saved } : {}),
            }
          : null,
      })),
    };
  },
};

function pointsOf(doc: { objects: readonly { label: string; construction: { kind: string; params: Readonly<Record<string, string>> } }[] }): Record<string, string> {
  const out: Record<string, string> = {};
  for (const o of doc.objects) {
    const k = o.construction.kind;
    if ((k === 'point-free' || k === 'point-on-curve' || k === 'point-parameter') && o.construction.params.at) out[o.label] = o.construction.params.at;
  }
  return out;
}

function labelOf(doc: { objects: readonly { id: string; label: string }[] }, id: string): string {
  return doc.objects.find((o) => o.id === id)?.label || id;
}
