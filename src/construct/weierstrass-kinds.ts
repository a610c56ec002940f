// The Weierstrass model as constructions: 'curve-weierstrass' (the model as a plane cubic) and
// 'point-weierstrass-image' (the image of a point under the map), both read off src/cubic/weierstrass.ts
// (weierstrassModel, weierstrassMap) — never a second implementation of the reduction.
//
// Canonical form: the model curve is the reduced global minimal model in long form,
//   Y²Z + a1·XYZ + a3·YZ² − X³ − a2·X²Z − a4·XZ² − a6·Z³ = 0   (Silverman, AEC III.1),
// as a primitive integer cubic with the fixed sign of formPrimitive (X³ coefficient +1, Y²Z −1); the long form and not the short one
// y² = x³ − 27c4·x − 54c6, because it is the model the maps go to (so images lie on it exactly) and its
// coefficients are small; it draws like any cubic. The image of the base point O is the point at
// infinity (0:1:0), the flex that is the origin of the model's group law.
import { lcm } from '../exact/integer.ts';
import { formPrimitive, monomialIndex, type Form } from '../poly/form.ts';
import { pointToString } from '../plane/parse-point.ts';
import { triple, type Point } from '../plane/point.ts';
import type { ModelPoint } from '../cubic/curve-model.ts';
import { weierstrassMap, weierstrassModel, type WeierstrassModel } from '../cubic/weierstrass.ts';
import { f3Cross, f3FromBig, f3IsZero, f3Normalise, f3Sine, formGradientFloat, formToFloat, lineCurveMeetFloat, type F3 } from './float.ts';

const MODELS = new WeakMap<Form, Map<string, WeierstrassModel>>();

/** The model of f from o, made once per (curve form object, base point). */
export function weierstrassModelOf(f: Form, o: Point): WeierstrassModel {
  let byBase = MODELS.get(f);
  if (!byBase) {
    byBase = new Map();
    MODELS.set(f, byBase);
  }
  const key = pointToString(o);
  let m = byBase.get(key);
  if (!m) {
    m = weierstrassModel(f, o);
    byBase.set(key, m);
  }
  return m;
}

/** The long form of the model's a-invariants as a ternary cubic (canonical form at the top). */
export function weierstrassModelForm(model: WeierstrassModel): Form {
  const [a1, a2, a3, a4, a6] = model.a;
  const coeffs = new Array<bigint>(10).fill(0n);
  const put = (i: number, j: number, c: bigint): void => {
    coeffs[monomialIndex(3, i, j)] += c;
  };
  put(0, 2, 1n); // Y²Z
  put(1, 1, a1); // XYZ
  put(0, 1, a3); // YZ²
  put(3, 0, -1n); // X³
  put(2, 0, -a2); // X²Z
  put(1, 0, -a4); // XZ²
  put(0, 0, -a6); // Z³
  return formPrimitive({ degree: 3, coeffs });
}

/** A point of the model as a primitive projective triple; 'infinity' is (0:1:0). */
export function modelPointTriple(p: ModelPoint): Point {
  if (p === 'infinity') return triple(0n, 1n, 0n);
  const d = lcm(p.x.den, p.y.den);
  return triple((p.x.num * d) / p.x.den, (p.y.num * d) / p.y.den, d);
}


/** The exact image of P (a smooth point of the model's curve) on the model, as a triple. */
export function weierstrassImage(model: WeierstrassModel, p: Point, name: string): Point {
  return modelPointTriple(weierstrassMap(model, p, name));
}

/** The forward forms in doubles, all three scaled by one power of two (their ratio is what matters). */
const FORWARD_FLOAT = new WeakMap<WeierstrassModel, readonly (readonly number[])[]>();

function forwardFloat(model: WeierstrassModel): readonly (readonly number[])[] {
  let out = FORWARD_FLOAT.get(model);
  if (!out) {
    const all = model.forward.flatMap((h) => h.coeffs);
    const bits = Math.max(...all.map((c) => (c < 0n ? -c : c).toString(2).length));
    const shift = BigInt(Math.max(0, bits - 60));
    out = model.forward.map((h) => h.coeffs.map((c) => Number(c >> shift)));
    FORWARD_FLOAT.set(model, out);
  }
  return out;
}

/**
 * The image of a float point near the curve, by the forward forms in doubles (degree 1 at a flex O, else
 * 2). The forms vanish together at O and O' = O * O, so near those points their values are mostly
 * rounding: at O the image is (0:1:0); near O' we use −P = P * O' (the law with base O: −P = P * (O * O),
 * MATH.md) and take the negative of the image of P * O' on the model (when O' is a flex P * O' is near
 * O' too and we give up: null)
 * (−(x, y) = (x, −y − a1·x − a3), Silverman, AEC III.2). Null when no image can be told.
 */
export function weierstrassImageFloat(model: WeierstrassModel, p: F3): F3 | null {
  const o = f3FromBig(model.base);
  if (f3Sine(p, o) < NEAR) return [0, 1, 0];
  const second = model.lines.second;
  if (second && f3Sine(p, f3FromBig(second)) < FAR_FROM_SECOND) {
    // P * O' from the line's three meets, the one farthest from O' (the chord formula cancels badly for
    // P next to O'); at O' itself the line is the tangent there.
    const s2 = f3FromBig(second);
    const cf = formToFloat(model.curve);
    const line = f3Sine(p, s2) < TANGENT_SWITCH ? f3Normalise(formGradientFloat(cf, s2)) : f3Cross(p, s2);
    let q: F3 | null = null;
    for (const m of lineCurveMeetFloat(cf, line)) if (!q || f3Sine(m, s2) > f3Sine(q, s2)) q = m;
    if (!q || f3Sine(q, s2) < FAR_FROM_SECOND) return null;
    const w = formsAt(model, q);
    if (!w) return null;
    const [a1, , a3] = model.a.map(Number);
    return f3Normalise([w[0], -w[1] - a1 * w[0] - a3 * w[2], w[2]]);
  }
  return formsAt(model, p);
}

/** Below this sine a float point is taken to be O itself. */
const NEAR = 1e-12;
/** Closer than this to O' the line P O' is taken to be the tangent there: the cross product of two points
 * a distance h apart is off by about 1e-16/h, the tangent by about h; the two meet near 1e-8. */
const TANGENT_SWITCH = 1e-8;
/** Closer than this to O' the forms' values are too small to trust (they vanish there to first order). */
const FAR_FROM_SECOND = 1e-4;

// The three forward forms at p, as a unit triple; null when they all vanish.
function formsAt(model: WeierstrassModel, p: F3): F3 | null {
  const forms = forwardFloat(model);
  const deg = model.forward[0].degree;
  const v = forms.map((c) => (deg === 1 ? c[0] * p[0] + c[1] * p[1] + c[2] * p[2] : quadraticAt(c, p)));
  const q = f3Normalise(v);
  return f3IsZero(q) ? null : q;
}

// Monomial order of form.ts for degree 2: X², XY, XZ, Y², YZ, Z².
function quadraticAt(c: readonly number[], p: F3): number {
  const [x, y, z] = p;
  return c[0] * x * x + c[1] * x * y + c[2] * x * z + c[3] * y * y + c[4] * y * z + c[5] * z * z;
}
