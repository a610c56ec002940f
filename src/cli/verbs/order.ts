// `order EQ P --base O`: the order of P in the group law with base point O (1..12, or infinite).
import type { Verb } from '../verb.ts';
import { pointToString } from '../../plane/parse-point.ts';
import { groupOrder } from '../../cubic/order.ts';
import { argBase, argCubic, argSmoothPoint, argsNoMore, groupLawRun } from '../cubic-args.ts';

export const order: Verb = {
  name: 'order',
  usage: 'order EQ P [--base O] — the order of P with base point O, or "infinite" (Mazur\'s bound): {"order"}',
  run(args) {
    const f = argCubic(args);
    const p = argSmoothPoint(args, f, 1, 'P');
    argsNoMore(args, 2);
    const o = argBase(args, f);
    return { order: groupLawRun(() => groupOrder(f, o, p)), base: pointToString(o) };
  },
};
