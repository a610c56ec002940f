// `through P1 P2 ... [--degree D]`: the linear system of curves of degree D (default 3) through the
// points: its dimension, a basis, and any special position of the points, in words.
import type { Verb } from '../verb.ts';
import { curvesThroughPoints, LINEAR_SYSTEM_MAX_DEGREE, LINEAR_SYSTEM_MAX_POINTS } from '../../plane/linear-system.ts';
import { conicRank } from '../../plane/conic.ts';
import { pointParse } from '../../plane/parse-point.ts';
import { formToText } from '../../poly/print.ts';
import { InvalidInput } from '../../exact/errors.ts';
import { optionInteger } from '../args.ts';

const CONIC_KIND = ['', 'double line', 'line pair', 'smooth'] as const;

export const through: Verb = {
  name: 'through',
  usage:
    'through P1 P2 ... [--degree D] — curves of degree D (default 3) through the points: ' +
    '{"degree", "dimension", "basis", "basisAffine", "conditions", "expectedDimension", "special", "notes"}',
  run(args) {
    for (const name of args.options.keys()) {
      if (name !== 'degree') throw new InvalidInput(`unknown option --${name}; the only option is --degree`, `--${name}`);
    }
    const degree = optionInteger(args, 'degree', 3, 1, LINEAR_SYSTEM_MAX_DEGREE);
    if (args.positional.length === 0) throw new InvalidInput('give at least one point, as X:Y:Z or x,y', 'argument 1');
    if (args.positional.length > LINEAR_SYSTEM_MAX_POINTS) {
      throw new InvalidInput(`at most ${LINEAR_SYSTEM_MAX_POINTS} points, got ${args.positional.length}`, 'points');
    }
    const points = args.positional.map((t, i) => pointParse(t, `argument ${i + 1}`));
    const sys = curvesThroughPoints(degree, points);
    const out: Record<string, unknown> = {
      degree,
      dimension: sys.dimension,
      basis: sys.basis.map((f) => formToText(f)),
      basisAffine: sys.basis.map((f) => formToText(f, { affine: true })),
      conditions: sys.conditions,
      expectedDimension: sys.expectedDimension,
      special: sys.special,
      notes: sys.notes,
    };
    if (degree === 2 && sys.dimension === 0) out.conic = CONIC_KIND[conicRank(sys.basis[0])];
    return out;
  },
};
