// `points EQ --height H [--positive | --box XMIN,XMAX,YMIN,YMAX] [--sieve-limit N]`: the rational points of
// a cubic up to height H, sorted by height, with what is proved complete.
import type { Verb } from '../verb.ts';
import { cubicRationalPoints, type SearchRegion } from '../../cubic/search.ts';
import { InvalidInput } from '../../exact/errors.ts';
import { ratCmp, ratParse } from '../../exact/rational.ts';
import { pointToString } from '../../plane/parse-point.ts';
import { formParse } from '../../poly/parse.ts';
import { optionString, positionalAt, type Args } from '../args.ts';

const OPTIONS = new Set(['height', 'positive', 'box', 'sieve-limit']);

function wholeOption(args: Args, name: string, fallback?: bigint): bigint {
  const text = optionString(args, name);
  if (text === undefined) {
    if (fallback !== undefined) return fallback;
    throw new InvalidInput(`--${name} is needed: the largest height max(|X|, |Y|, |Z|) to search`, `--${name}`);
  }
  if (!/^\s*\d+\s*$/.test(text)) throw new InvalidInput(`--${name} must be a whole number, found "${text}"`, `--${name}`);
  const n = BigInt(text.trim());
  if (n < 1n || n > 100000n) throw new InvalidInput(`--${name} must be between 1 and 100000, found ${n}`, `--${name}`);
  return n;
}

function regionOption(args: Args): SearchRegion | undefined {
  const positive = args.options.get('positive');
  const box = optionString(args, 'box');
  if (positive !== undefined && box !== undefined) throw new InvalidInput('give --positive or --box, not both', '--box');
  if (positive !== undefined) return { kind: 'positive' };
  if (box === undefined) return undefined;
  const parts = box.split(',');
  if (parts.length !== 4) throw new InvalidInput(`--box needs XMIN,XMAX,YMIN,YMAX, found "${box}"`, '--box');
  const [xmin, xmax, ymin, ymax] = parts.map((p, i) => ratParse(p, `--box, entry ${i + 1}`));
  if (ratCmp(xmin, xmax) > 0 || ratCmp(ymin, ymax) > 0) throw new InvalidInput('--box needs XMIN <= XMAX and YMIN <= YMAX', '--box');
  return { kind: 'box', xmin, xmax, ymin, ymax };
}

export const points: Verb = {
  name: 'points',
  usage:
    'points EQ --height H [--positive | --box XMIN,XMAX,YMIN,YMAX] [--sieve-limit N] — rational points up to height H: ' +
    '{"points": [pt], "count", "complete", "completeUpTo", "method", "note"}',
  switches: ['positive'],
  run(args) {
    for (const name of args.options.keys()) {
      if (!OPTIONS.has(name)) throw new InvalidInput(`unknown option --${name}; options are --height, --positive, --box, --sieve-limit`, `--${name}`);
    }
    if (args.positional.length > 1) throw new InvalidInput('points takes one equation', 'argument 2');
    const f = formParse(positionalAt(args, 0, 'the equation of the cubic'), 'argument 1').form;
    if (f.degree !== 3) throw new InvalidInput(`expected a cubic, the equation has degree ${f.degree}`, 'argument 1');
    const height = wholeOption(args, 'height');
    const sieveLimit = wholeOption(args, 'sieve-limit', 1000n);
    const r = cubicRationalPoints(f, { height, sieveLimit, region: regionOption(args) });
    return {
      points: r.points.map(pointToString),
      count: r.points.length,
      complete: r.complete,
      completeUpTo: r.completeUpTo,
      method: r.method,
      note: r.note,
    };
  },
};
