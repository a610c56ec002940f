// Aronhold's invariants S and T of a ternary cubic, its discriminant and j-invariant, and the number of
// real components. Defined for every ternary cubic: no rational point is needed.
//
// Normalisation (MATH.md): S = −c4/1296 and T = c6/5832 where c4, c6 belong to the Jacobian as given by
// Artin, Rodriguez-Villegas, Tate, "On the Jacobians of plane cubics" (Adv. Math. 198, 2005); then
// Δ = T² + 64S³ vanishes exactly on singular cubics and j = 1728·64S³/Δ. On the Hesse cubic
// X³ + Y³ + Z³ + 6mXYZ this gives S = m − m⁴, T = 1 − 20m³ − 8m⁶ and Δ = (1 + 8m³)³ (Salmon's values;
// the constants below were fixed against PARI/GP's ellfromeqn and are checked in the tests).
//
// Method: the symbolic (bracket) expressions S = (abc)(abd)(acd)(bcd) and T = (abc)(abd)(ace)(bcf)(def)²
// (Salmon, Higher Plane Curves, §§ on the invariants of the cubic; Sturmfels, Algorithms in Invariant
// Theory, §4.4) evaluated as full contractions of the coefficient tensor with Levi-Civita symbols. Weights
// 4 and 6 follow from the 4 and 6 brackets.
import { rat, ratAdd, ratDiv, ratMul, ratPow, ratSign, type Rational } from '../exact/rational.ts';
import { monomialIndex, type Form } from '../poly/form.ts';
import { cubicRequire } from './chord.ts';

export interface CubicInvariants {
  readonly S: Rational;
  readonly T: Rational;
  /** T² + 64S³: zero exactly when the cubic is singular; −Δ_E/3⁹ for a Weierstrass model's Δ_E. */
  readonly discriminant: Rational;
  /** c4 and c6 of the Jacobian in the ARVT normalisation: c4 = −1296S, c6 = 5832T. */
  readonly c4: Rational;
  readonly c6: Rational;
  /** 1728·64S³/Δ, null when the cubic is singular. */
  readonly j: Rational | null;
}

// The even permutations of (0,1,2) with sign +1, odd with −1.
const PERMS: readonly (readonly [number, number, number, bigint])[] = [
  [0, 1, 2, 1n], [1, 2, 0, 1n], [2, 0, 1, 1n], [0, 2, 1, -1n], [2, 1, 0, -1n], [1, 0, 2, -1n],
];

// Fixed by comparing the raw contractions of 6Φ with −c4/1296 and c6/5832 from PARI's ellfromeqn
// (tests/reference/pari-group.test.ts repeats the comparison on random cubics).
const S_SCALE = rat(-1n, 24n);
const T_SCALE = rat(-1n, 6n);

/** 6·Φ as a 3×3×3 integer tensor: F = Σ Φ_ijk x_i x_j x_k, so 6Φ_ijk = coefficient · a!b!c!. */
export function cubicPolarTensor(f: Form): bigint[][][] {
  const fact = [1n, 1n, 2n, 6n];
  const t: bigint[][][] = [];
  for (let i = 0; i < 3; i++) {
    t.push([]);
    for (let j = 0; j < 3; j++) {
      t[i].push([]);
      for (let k = 0; k < 3; k++) {
        const e = [0, 0, 0];
        e[i]++;
        e[j]++;
        e[k]++;
        t[i][j].push(f.coeffs[monomialIndex(3, e[0], e[1])] * fact[e[0]] * fact[e[1]] * fact[e[2]]);
      }
    }
  }
  return t;
}

/** (abc)(abd)(acd)(bcd) on the tensor t (each letter is one copy of t). */
export function bracketS(t: bigint[][][]): bigint {
  let s = 0n;
  for (const [a1, b1, c1, e1] of PERMS) {
    for (const [a2, b2, d1, e2] of PERMS) {
      const ta = t[a1][a2];
      const tb = t[b1][b2];
      const e12 = e1 * e2;
      for (const [a3, c2, d2, e3] of PERMS) {
        const va = ta[a3];
        if (va === 0n) continue;
        const tc = t[c1][c2];
        const td = t[d1][d2];
        const e123 = e12 * e3;
        for (const [b3, c3, d3, e4] of PERMS) {
          const p = tb[b3] * tc[c3] * td[d3];
          if (p !== 0n) s += e123 * e4 * va * p;
        }
      }
    }
  }
  return s;
}

/** (abc)(abd)(ace)(bcf)(def)²: the (def)² part is contracted first into V[d1][e1][f1]. */
export function bracketT(t: bigint[][][]): bigint {
  const v: bigint[][][] = [0, 1, 2].map(() => [0, 1, 2].map(() => [0n, 0n, 0n]));
  for (let d1 = 0; d1 < 3; d1++) {
    for (let e1 = 0; e1 < 3; e1++) {
      for (let f1 = 0; f1 < 3; f1++) {
        let s = 0n;
        for (const [d2, e2, f2, s5] of PERMS) {
          for (const [d3, e3, f3, s6] of PERMS) {
            s += s5 * s6 * t[d1][d2][d3] * t[e1][e2][e3] * t[f1][f2][f3];
          }
        }
        v[d1][e1][f1] = s;
      }
    }
  }
  let s = 0n;
  for (const [a1, b1, c1, s1] of PERMS) {
    for (const [a2, b2, d1, s2] of PERMS) {
      for (const [a3, c2, e1, s3] of PERMS) {
        const va = t[a1][a2][a3];
        if (va === 0n) continue;
        for (const [b3, c3, f1, s4] of PERMS) {
          const p = t[b1][b2][b3] * t[c1][c2][c3] * v[d1][e1][f1];
          if (p !== 0n) s += s1 * s2 * s3 * s4 * va * p;
        }
      }
    }
  }
  return s;
}

/** S, T, discriminant, c4, c6 and j of any ternary cubic. */
export function cubicInvariants(f: Form): CubicInvariants {
  cubicRequire(f);
  const t = cubicPolarTensor(f);
  // 6Φ instead of Φ multiplies S by 6⁴ and T by 6⁶.
  const S = ratMul(rat(bracketS(t), 6n ** 4n), S_SCALE);
  const T = ratMul(rat(bracketT(t), 6n ** 6n), T_SCALE);
  const s3 = ratMul(rat(64n), ratPow(S, 3));
  const discriminant = ratAdd(ratPow(T, 2), s3);
  const j = discriminant.num === 0n ? null : ratDiv(ratMul(rat(1728n), s3), discriminant);
  return { S, T, discriminant, c4: ratMul(rat(-1296n), S), c6: ratMul(rat(5832n), T), j };
}

/** Is the cubic singular (over C)? Exactly when Δ = T² + 64S³ vanishes. */
export function cubicIsSingular(f: Form): boolean {
  return cubicInvariants(f).discriminant.num === 0n;
}

/**
 * Number of connected components of the real locus of a smooth cubic: 2 when Δ < 0, else 1 (for a
 * Weierstrass model Δ = −Δ_E/3⁹, and y² = cubic has an oval exactly when Δ_E > 0: Silverman–Tate,
 * Rational Points on Elliptic Curves, I.3). null for a singular cubic (no such dichotomy there).
 */
export function cubicRealComponents(f: Form): 1 | 2 | null {
  const d = cubicInvariants(f).discriminant;
  if (d.num === 0n) return null;
  return ratSign(d) < 0 ? 2 : 1;
}
