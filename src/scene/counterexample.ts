// The first failing instance of a theorem trial as a scene: the same objects, styles and view, with the
// free points where the trial put them, and a title and note that say which claim failed and how.
import type { TrialFailure } from '../construct/trials.ts';
import type { Scene } from './scene.ts';

export function sceneCounterexample(scene: Scene, checkLabel: string, failure: TrialFailure): Scene {
  return {
    ...scene,
    title: `Counterexample: ${checkLabel}`.slice(0, 400),
    notes: `Instance ${failure.trial} of a theorem trial on "${scene.title}": the check "${checkLabel}" fails here (${failure.certificate}).\n\n${scene.notes}`.slice(0, 20_000),
    doc: failure.doc,
  };
}
