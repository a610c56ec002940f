// Rational lines contained in a plane curve: exact division of a ternary form by a linear form, and the
// complete list of linear factors over Q with their multiplicities.
//
// Canonical form: a line is a primitive integer triple (a:b:c) with first non-zero entry positive
// (src/plane/point.ts); the factorisation returned satisfies f = c · Π lineᵢ^mᵢ · rest exactly, with
// `rest` primitive and free of rational linear factors, lines in the order they were found.
//
// Why the candidates are complete: a line L that is not a coordinate line meets Z = 0 in a rational point A
// and X = 0 in a rational point B, both on the curve; if A ≠ B then L = AB, and if A = B = (0:1:0) then L
// meets Y = 0 in a third rational point C ≠ A and L = AC. The rational points of the curve on the
// coordinate lines are the rational roots of three binary forms (Gauss's lemma makes the quotient integral).
import { InvalidInput } from '../exact/errors.ts';
import { content } from '../exact/integer.ts';
import { formPrimitive, monomialCount, monomialIndex, monomials, type Form } from '../poly/form.ts';
import { formOnLine } from '../poly/substitute.ts';
import { binaryFormRoots } from '../poly/binary-roots.ts';
import { cross, triple, tripleEquals, tripleIsZero, type Line, type Point } from '../plane/point.ts';

export interface LinearFactor {
  readonly line: Line;
  readonly multiplicity: number;
}

export interface LinearFactorisation {
  readonly lines: readonly LinearFactor[];
  /** f divided by every line (with multiplicity): primitive, with no rational linear factor. */
  readonly rest: Form;
}

/** Linear form aX + bY + cZ as a Form of degree 1. */
export function lineForm(l: readonly bigint[]): Form {
  return { degree: 1, coeffs: [l[0], l[1], l[2]] };
}

/**
 * f / L0 when the line L divides f over Q, else null, where L0 = L divided by its content (sign kept), so
 * f = L0 · quotient exactly. By Gauss's lemma the quotient by a primitive L0 has integer coefficients,
 * so every division below is exact or proves L ∤ f.
 */
export function formDivideLinear(f: Form, l: readonly bigint[]): Form | null {
  if (tripleIsZero(l)) throw new InvalidInput('the zero vector is not a line');
  if (f.degree < 1) return null;
  const g = content(l);
  const L = [l[0] / g, l[1] / g, l[2] / g];
  const d = f.degree;
  // Pivot on a variable v with L_v ≠ 0: cancel every monomial containing v, highest v-power first.
  const v = L[0] !== 0n ? 0 : L[1] !== 0n ? 1 : 2;
  const lv = L[v];
  const r = f.coeffs.slice();
  const q = new Array<bigint>(monomialCount(d - 1)).fill(0n);
  const order = monomials(d)
    .map((e, k) => ({ e, k }))
    .filter(({ e }) => e[v] > 0)
    .sort((a, b) => b.e[v] - a.e[v]);
  for (const { e, k } of order) {
    const c = r[k];
    if (c === 0n) continue;
    if (c % lv !== 0n) return null;
    const qc = c / lv;
    const qe: [number, number, number] = [e[0], e[1], e[2]];
    qe[v] -= 1;
    q[monomialIndex(d - 1, qe[0], qe[1])] += qc;
    for (let w = 0; w < 3; w++) {
      if (L[w] === 0n) continue;
      const me: [number, number, number] = [qe[0], qe[1], qe[2]];
      me[w] += 1;
      r[monomialIndex(d, me[0], me[1])] -= qc * L[w];
    }
  }
  if (r.some((c) => c !== 0n)) return null;
  return { degree: d - 1, coeffs: q };
}

const COORDINATE_LINES: readonly Line[] = [
  [1n, 0n, 0n],
  [0n, 1n, 0n],
  [0n, 0n, 1n],
];

/** Rational points of the curve on the line through p and q (assumes the line is not a component). */
function rationalPointsOnLine(f: Form, p: Point, q: Point): Point[] {
  const b = formOnLine(f, p, q);
  const out: Point[] = [];
  for (const root of binaryFormRoots(b).roots) {
    if (!root.point) continue;
    const [s, t] = root.point;
    out.push(triple(s * p[0] + t * q[0], s * p[1] + t * q[1], s * p[2] + t * q[2]));
  }
  return out;
}

/** One rational line dividing f, or null when there is none (assumes no coordinate line divides f). */
function findNonCoordinateLine(f: Form): Line | null {
  const e: Point[] = [
    [1n, 0n, 0n],
    [0n, 1n, 0n],
    [0n, 0n, 1n],
  ];
  const onZ = rationalPointsOnLine(f, e[0], e[1]);
  const onX = rationalPointsOnLine(f, e[1], e[2]);
  const onY = rationalPointsOnLine(f, e[0], e[2]);
  const tried: Line[] = [];
  for (const a of onZ) {
    for (const b of [...onX, ...onY]) {
      const c = cross(a, b);
      if (tripleIsZero(c)) continue;
      const line = triple(c[0], c[1], c[2]);
      if (tried.some((t) => tripleEquals(t, line))) continue;
      tried.push(line);
      if (formDivideLinear(f, line)) return line;
    }
  }
  return null;
}

/** Every rational line contained in the curve f = 0, with multiplicity, and the quotient left over. */
export function formLinearFactors(f: Form): LinearFactorisation {
  if (f.coeffs.every((c) => c === 0n)) throw new InvalidInput('the zero form defines no curve');
  let rest = formPrimitive(f);
  const found: { line: Line; multiplicity: number }[] = [];
  const record = (line: Line) => {
    const old = found.find((x) => tripleEquals(x.line, line));
    if (old) old.multiplicity += 1;
    else found.push({ line, multiplicity: 1 });
  };
  for (;;) {
    if (rest.degree === 0) break;
    let line: Line | null = null;
    for (const c of COORDINATE_LINES) {
      if (formDivideLinear(rest, c)) {
        line = c;
        break;
      }
    }
    if (!line) line = findNonCoordinateLine(rest);
    if (!line) break;
    rest = formPrimitive(formDivideLinear(rest, line) as Form);
    record(line);
  }
  return { lines: found, rest };
}
