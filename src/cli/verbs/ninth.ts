// `ninth P1 ... P8`: the ninth base point of the pencil of cubics through eight points (Cayley–Bacharach),
// or null with the reason (special position, in words).
import type { Verb } from '../verb.ts';
import { ninthPoint } from '../../cubic/nine.ts';
import { InvalidInput } from '../../exact/errors.ts';
import { pointParse, pointToString } from '../../plane/parse-point.ts';
import { formToText } from '../../poly/print.ts';

export const ninth: Verb = {
  name: 'ninth',
  usage:
    'ninth P1 ... P8 — the ninth base point of the pencil of cubics through eight points: ' +
    '{"point" or null, "reason", "coincidesWith", "dimension", "pencil", "notes"}',
  run(args) {
    for (const name of args.options.keys()) throw new InvalidInput(`ninth takes no options, found --${name}`, `--${name}`);
    if (args.positional.length !== 8) {
      throw new InvalidInput(`ninth needs exactly 8 points, got ${args.positional.length}`, args.positional.length > 8 ? 'argument 9' : `argument ${args.positional.length + 1}`);
    }
    const points = args.positional.map((t, i) => pointParse(t, `argument ${i + 1}`));
    const r = ninthPoint(points);
    return {
      point: r.point ? pointToString(r.point) : null,
      reason: r.reason,
      coincidesWith: r.coincidesWith,
      dimension: r.dimension,
      pencil: r.pencil.map((f) => formToText(f)),
      notes: r.notes,
    };
  },
};
