// Global minimal models over Q, in the reduced form a1, a3 ∈ {0, 1}, a2 ∈ {−1, 0, 1}.
//
// Method (Cremona, Algorithms for Modular Elliptic Curves, 2nd ed., §3.2, after Laska and Kraus): for each
// prime p, the largest d with p^4d | c4, p^6d | c6, p^12d | Δ; at p = 2 and 3 lower d by one when the
// scaled pair fails Kraus's conditions (Kraus 1989: integers c4, c6 come from an integral model exactly
// when v3(c6) ≠ 2, and c6 ≡ −1 mod 4 or [v2(c4) ≥ 4 and c6 ≡ 0 or 8 mod 32]). Then the reduced model
// with invariants c4/u⁴, c6/u⁶ is read off: b2 ≡ −c6 (mod 12) in −5..6, b4 = (b2² − c4)/24,
// b6 = (−b2³ + 36b2b4 − c6)/216, a1 = b2 mod 2, a3 = b6 mod 2, a2 = (b2 − a1)/4, a4 = (b4 − a1a3)/2,
// a6 = (b6 − a3)/4. The result is PARI's ellminimalmodel form (checked in tests/reference).
//
// Canonical form: the returned model and the change (u > 0, r, s, t) from the given model to it.
import { NinefoldError, NotExact } from '../exact/errors.ts';
import { gcd } from '../exact/gcd.ts';
import { integerFactor, integerRoot, integerValuation } from '../exact/factor-integer.ts';
import { modelChangeBetween, modelQuantities, type AInvariants, type CoordinateChange } from './curve-model.ts';

export interface MinimalModel {
  readonly a: AInvariants;
  readonly change: CoordinateChange;
  readonly discriminant: bigint;
}

function mod(a: bigint, m: bigint): bigint {
  const r = a % m;
  return r < 0n ? r + m : r;
}

/** The reduced model with invariants c4, c6 (assumed to satisfy Kraus's conditions), or null. */
export function modelFromC4C6(c4: bigint, c6: bigint): AInvariants | null {
  let b2 = mod(-c6, 12n);
  if (b2 > 6n) b2 -= 12n;
  const n4 = b2 * b2 - c4;
  if (n4 % 24n !== 0n) return null;
  const b4 = n4 / 24n;
  const n6 = -b2 * b2 * b2 + 36n * b2 * b4 - c6;
  if (n6 % 216n !== 0n) return null;
  const b6 = n6 / 216n;
  const a1 = mod(b2, 2n);
  const a3 = mod(b6, 2n);
  if ((b2 - a1) % 4n !== 0n || (b4 - a1 * a3) % 2n !== 0n || (b6 - a3) % 4n !== 0n) return null;
  return [a1, (b2 - a1) / 4n, a3, (b4 - a1 * a3) / 2n, (b6 - a3) / 4n];
}

/**
 * The global minimal model of an integral model with Δ ≠ 0, and the change that reaches it.
 *
 * `jacobian` may give another pair (c4, c6) of the same curve over Q with small entries (a plane cubic's
 * ARVT invariants, src/cubic/invariants.ts): the factoring is then done on its gcd, far smaller than the
 * construction model's, and the scale u from `a` to the minimal model is the exact 4th (or 6th) root of
 * c4/c4_min. Every step is checked; if one fails, the model's own gcd(c4, c6) is factored instead.
 */
export function modelMinimal(a: AInvariants, jacobian?: { c4: bigint; c6: bigint }): MinimalModel {
  const q = modelQuantities(a);
  if (q.discriminant === 0n) throw new NinefoldError('a singular Weierstrass model has no minimal model', 'model');
  if (jacobian) {
    const viaJacobian = minimalThrough(a, q.c4, q.c6, jacobian.c4, jacobian.c6);
    if (viaJacobian) return viaJacobian;
  }
  const u = minimalScale(q.c4, q.c6, q.discriminant);
  const c4 = q.c4 / u ** 4n;
  const c6 = q.c6 / u ** 6n;
  const b = modelFromC4C6(c4, c6);
  if (!b) throw new NinefoldError(`internal: no integral model with c4 = ${c4}, c6 = ${c6}`, 'model');
  const change = modelChangeBetween(a, b, u);
  if (!change) throw new NinefoldError('internal: the minimal model is not reached by a change of coordinates', 'model');
  return { a: b, change, discriminant: q.discriminant / u ** 12n };
}

// The minimal model reached through a second, smaller pair (j4, j6) of the same curve; null if any check fails.
function minimalThrough(a: AInvariants, c4: bigint, c6: bigint, j4: bigint, j6: bigint): MinimalModel | null {
  const n = j4 * j4 * j4 - j6 * j6;
  if (n === 0n || n % 1728n !== 0n) return null;
  let w: bigint;
  try {
    w = minimalScale(j4, j6, n / 1728n);
  } catch (e) {
    if (e instanceof NotExact) return null;
    throw e;
  }
  const m4 = j4 / w ** 4n;
  const m6 = j6 / w ** 6n;
  const b = modelFromC4C6(m4, m6);
  if (!b) return null;
  const num = m4 !== 0n ? c4 : c6;
  const den = m4 !== 0n ? m4 : m6;
  if (num % den !== 0n || num / den <= 0n) return null;
  const u = integerRoot(num / den, m4 !== 0n ? 4 : 6);
  if (u ** 4n * m4 !== c4 || u ** 6n * m6 !== c6) return null;
  const change = modelChangeBetween(a, b, u);
  if (!change) return null;
  const d = modelQuantities(b).discriminant;
  return { a: b, change, discriminant: d };
}

/** The largest u with an integral model of invariants c4/u⁴, c6/u⁶ (Laska–Kraus, as at the head of this file). */
function minimalScale(c4: bigint, c6: bigint, discriminant: bigint): bigint {
  // Primes with p^4 | c4 and p^6 | c6 all divide gcd(c4, c6) (which is |c6| when c4 = 0, and so on).
  const fac = integerFactor(gcd(c4, c6));
  if (!fac.complete) {
    throw new NotExact(`could not factor ${fac.unfactored.join(', ')} (a divisor of gcd(c4, c6)), so minimality is not decided`, 'model');
  }
  let u = 1n;
  for (const { prime: p, exponent } of fac.factors) {
    if (exponent < 4) continue;
    let d = Math.min(
      c4 === 0n ? Infinity : Math.floor(integerValuation(c4, p) / 4),
      c6 === 0n ? Infinity : Math.floor(integerValuation(c6, p) / 6),
      Math.floor(integerValuation(discriminant, p) / 12),
    );
    if (d <= 0) continue;
    if (p === 2n || p === 3n) {
      const pd = p ** BigInt(d);
      // The conditions at 2 and at 3 do not see the other primes (odd sixth powers are 1 mod 8).
      if (!krausAt(p, c4 / pd ** 4n, c6 / pd ** 6n)) d -= 1;
    }
    u *= p ** BigInt(d);
  }
  return u;
}

// Kraus's condition at one prime (2 or 3), the other prime's condition being irrelevant there.
function krausAt(p: bigint, c4: bigint, c6: bigint): boolean {
  if (p === 3n) return integerValuation(c6, 3n) !== 2;
  if (mod(c6, 4n) === 3n) return true;
  return integerValuation(c4, 2n) >= 4 && (mod(c6, 32n) === 0n || mod(c6, 32n) === 8n);
}
