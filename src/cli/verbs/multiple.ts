// `multiple EQ P N --base O`: N·P in the group law of the cubic with base point O, |N| ≤ 10^4.
import type { Verb } from '../verb.ts';
import { pointToString } from '../../plane/parse-point.ts';
import { GROUP_MULTIPLE_LIMIT, groupMake, groupMultipleIn } from '../../cubic/group.ts';
import { argBase, argCubic, argInteger, argSmoothPoint, argsNoMore, groupLawRun } from '../cubic-args.ts';

export const multiple: Verb = {
  name: 'multiple',
  usage: 'multiple EQ P N [--base O] — N·P in the group law with base point O, |N| ≤ 10000: {"point"}',
  run(args) {
    const f = argCubic(args);
    const p = argSmoothPoint(args, f, 1, 'P');
    const n = argInteger(args, 2, 'the multiple N', GROUP_MULTIPLE_LIMIT);
    argsNoMore(args, 3);
    const g = groupMake(f, argBase(args, f), '--base');
    return { point: pointToString(groupLawRun(() => groupMultipleIn(g, p, n))), base: pointToString(g.base) };
  },
};
