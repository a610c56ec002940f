// `third EQ P Q`: the third point of the cubic on the line PQ (the tangent at P when Q = P).
import type { Verb } from '../verb.ts';
import { pointToString } from '../../plane/parse-point.ts';
import { cubicThirdPoint } from '../../cubic/chord.ts';
import { argCubic, argSmoothPoint, argsNoMore } from '../cubic-args.ts';

export const third: Verb = {
  name: 'third',
  usage: 'third EQ P Q — the third point of the cubic on the line PQ (tangent when P = Q): {"point"}',
  run(args) {
    const f = argCubic(args);
    const p = argSmoothPoint(args, f, 1, 'P');
    const q = argSmoothPoint(args, f, 2, 'Q');
    argsNoMore(args, 3);
    return { point: pointToString(cubicThirdPoint(f, p, q, ['argument 2', 'argument 3'])) };
  },
};
