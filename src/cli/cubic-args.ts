// Shared argument readers for the cubic verbs: the equation, points on it, the base point of the group
// law and integer multiples. Every error names the argument it came from.
import { Degenerate, InvalidInput } from '../exact/errors.ts';
import { formParse } from '../poly/parse.ts';
import type { Form } from '../poly/form.ts';
import { pointParse } from '../plane/parse-point.ts';
import type { Point } from '../plane/point.ts';
import { cubicRequire, cubicRequireSmoothPoint } from '../cubic/chord.ts';
import { cubicFlexes } from '../cubic/flex.ts';
import { optionString, positionalAt, type Args } from './args.ts';
import type { Rational } from '../exact/rational.ts';
import { ratToString } from '../exact/rational.ts';
import type { ModelPoint } from '../cubic/curve-model.ts';

/** The cubic written as positional argument `index` (a primitive form). */
export function argCubic(args: Args, index = 0): Form {
  const where = `argument ${index + 1}`;
  const { form } = formParse(positionalAt(args, index, 'the equation of the cubic'), where);
  if (form.degree !== 3) throw new InvalidInput(`expected a cubic, the equation has degree ${form.degree}`, where);
  cubicRequire(form, where);
  return form;
}

/** A point written as positional argument `index`, required to be a smooth point of f. */
export function argSmoothPoint(args: Args, f: Form, index: number, what: string): Point {
  const where = `argument ${index + 1}`;
  const p = pointParse(positionalAt(args, index, what), where);
  cubicRequireSmoothPoint(f, p, `${what} (${where})`, where);
  return p;
}

/** The point given with --NAME, required to be a smooth point of f; undefined when absent. */
export function optionSmoothPoint(args: Args, f: Form, name: string): Point | undefined {
  const text = optionString(args, name);
  if (text === undefined) return undefined;
  const p = pointParse(text, `--${name}`);
  cubicRequireSmoothPoint(f, p, `--${name}`);
  return p;
}

/**
 * The base point of the group law: --base when given, else the rational flex of least height (from
 * src/cubic/flex.ts); with neither, a clear error asking for --base.
 */
export function argBase(args: Args, f: Form, option = 'base'): Point {
  const o = optionSmoothPoint(args, f, option);
  if (o !== undefined) return o;
  const flexes = cubicFlexes(f);
  const flex = flexes.degenerate === null ? flexes.rational.find((p) => isSmooth(f, p)) : undefined;
  if (flex !== undefined) return flex;
  throw new InvalidInput(
    `--${option} is needed: the curve has no rational flex to use as the base point, so give O as --${option} X:Y:Z`,
    `--${option}`,
  );
}

function isSmooth(f: Form, p: Point): boolean {
  try {
    cubicRequireSmoothPoint(f, p);
    return true;
  } catch {
    return false;
  }
}

/** An integer written as positional argument `index`, within ±limit. */
export function argInteger(args: Args, index: number, what: string, limit: bigint): bigint {
  const where = `argument ${index + 1}`;
  const text = positionalAt(args, index, what).trim();
  if (!/^[+-]?\d+$/.test(text)) throw new InvalidInput(`${what} must be an integer, found "${text}"`, where);
  const n = BigInt(text);
  if (n > limit || -n > limit) throw new InvalidInput(`${what} must be between -${limit} and ${limit}, found ${n}`, where);
  return n;
}

/** Refuses extra positional arguments (a likely typo), naming the first one. */
export function argsNoMore(args: Args, count: number): void {
  if (args.positional.length > count) {
    throw new InvalidInput(`unexpected extra argument "${args.positional[count]}"`, `argument ${count + 1}`);
  }
}

export function rationalText(q: Rational): string {
  return ratToString(q);
}

/** A model point as ["x", "y"] strings or "infinity". */
export function modelPointJson(p: ModelPoint): [string, string] | 'infinity' {
  return p === 'infinity' ? p : [ratToString(p.x), ratToString(p.y)];
}

/**
 * Runs a group-law computation, turning "a line lies inside the curve" into a message about the curve:
 * the law needs a cubic without line components (irreducible; singular ones work on their smooth points).
 */
export function groupLawRun<T>(fn: () => T): T {
  try {
    return fn();
  } catch (e) {
    if (e instanceof Degenerate) {
      throw new Degenerate(`the group law is not defined here: a line it uses lies inside the curve, so the cubic contains a line (${e.message})`, 'argument 1');
    }
    throw e;
  }
}
