// Text forms of points: projective "X:Y:Z" (integers or rationals) or affine "x,y" (rationals).
// Rationals are cleared to a primitive integer triple.
import { InvalidInput, ParseError } from '../exact/errors.ts';
import { lcm } from '../exact/integer.ts';
import { ratParse, type Rational } from '../exact/rational.ts';
import { triple, type Point } from './point.ts';

export function pointParse(text: string, where = 'point'): Point {
  const t = text.trim();
  const projective = t.includes(':');
  const parts = projective ? t.split(':') : t.split(',');
  const want = projective ? 3 : 2;
  if (parts.length !== want) {
    throw new ParseError(
      `expected a point as X:Y:Z or x,y, found "${text}"`,
      1,
      where,
    );
  }
  const values: Rational[] = [];
  let column = 1;
  for (const part of parts) {
    try {
      values.push(ratParse(part));
    } catch {
      throw new ParseError(
        `expected a rational coordinate at column ${column} of "${text}", found "${part.trim()}"`,
        column,
        `${where}, column ${column}`,
      );
    }
    column += part.length + 1;
  }
  if (!projective) values.push({ num: 1n, den: 1n });
  const l = values.reduce((acc, v) => lcm(acc, v.den), 1n);
  const ints = values.map((v) => (v.num * l) / v.den);
  if (ints.every((x) => x === 0n)) throw new InvalidInput('0:0:0 is not a point of the projective plane', where);
  return triple(ints[0], ints[1], ints[2]);
}

/** "X:Y:Z", the contract form of every printed point. */
export function pointToString(p: Point): string {
  return `${p[0]}:${p[1]}:${p[2]}`;
}
