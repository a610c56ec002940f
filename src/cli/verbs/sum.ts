// `sum EQ P Q --base O`: P + Q in the group law of the cubic with base point O.
import type { Verb } from '../verb.ts';
import { pointToString } from '../../plane/parse-point.ts';
import { groupAddIn, groupMake } from '../../cubic/group.ts';
import { argBase, argCubic, argSmoothPoint, argsNoMore, groupLawRun } from '../cubic-args.ts';

export const sum: Verb = {
  name: 'sum',
  usage: 'sum EQ P Q [--base O] — P + Q in the group law with base point O: {"point"}',
  run(args) {
    const f = argCubic(args);
    const p = argSmoothPoint(args, f, 1, 'P');
    const q = argSmoothPoint(args, f, 2, 'Q');
    argsNoMore(args, 3);
    const g = groupMake(f, argBase(args, f), '--base');
    return { point: pointToString(groupLawRun(() => groupAddIn(g, p, q))), base: pointToString(g.base) };
  },
};
