// `negate EQ P --base O`: −P in the group law of the cubic with base point O.
import type { Verb } from '../verb.ts';
import { pointToString } from '../../plane/parse-point.ts';
import { groupMake, groupNegateIn } from '../../cubic/group.ts';
import { argBase, argCubic, argSmoothPoint, argsNoMore, groupLawRun } from '../cubic-args.ts';

export const negate: Verb = {
  name: 'negate',
  usage: 'negate EQ P [--base O] — −P in the group law with base point O: {"point"}',
  run(args) {
    const f = argCubic(args);
    const p = argSmoothPoint(args, f, 1, 'P');
    argsNoMore(args, 2);
    const g = groupMake(f, argBase(args, f), '--base');
    return { point: pointToString(groupLawRun(() => groupNegateIn(g, p))), base: pointToString(g.base) };
  },
};
