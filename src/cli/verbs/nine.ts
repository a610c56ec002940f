// `nine P1 ... P9`: the nine-point check — does every cubic through the first eight pass through the
// ninth (and likewise for each point against the other eight)? With the dimension and the reason in words.
import type { Verb } from '../verb.ts';
import { nineCheck } from '../../cubic/nine.ts';
import { InvalidInput } from '../../exact/errors.ts';
import { pointParse } from '../../plane/parse-point.ts';

export const nine: Verb = {
  name: 'nine',
  usage:
    'nine P1 ... P9 — does every cubic through P1..P8 pass through P9? ' +
    '{"dimension", "holds", "reason", "each", "notes"}',
  run(args) {
    for (const name of args.options.keys()) throw new InvalidInput(`nine takes no options, found --${name}`, `--${name}`);
    if (args.positional.length !== 9) {
      throw new InvalidInput(`nine needs exactly 9 points, got ${args.positional.length}`, args.positional.length > 9 ? 'argument 10' : `argument ${args.positional.length + 1}`);
    }
    const points = args.positional.map((t, i) => pointParse(t, `argument ${i + 1}`));
    const r = nineCheck(points);
    return { dimension: r.dimension, holds: r.holds, reason: r.reason, each: r.each, notes: r.notes };
  },
};
