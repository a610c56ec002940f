// Floating approximations of all complex roots of an integer polynomial, used in src/exact only as a
// source of candidates (rational roots are then verified exactly, and completeness is proved separately),
// never to decide anything.
//
// Canonical form: roots as parallel arrays re[], im[] of length deg p. Coefficients are scaled by one
// power of two before conversion, so huge integers neither overflow nor lose their ratios.
//
// Method: the Aberth–Ehrlich simultaneous iteration (O. Aberth, "Iteration methods for finding all zeros
// of a polynomial simultaneously", Math. Comp. 27 (1973); Bini, "Numerical computation of polynomial
// zeros by means of Aberth's method", Numer. Algorithms 13 (1996), for the start on circles).
import { bitLength } from './integer.ts';

export interface FloatRoots {
  readonly re: Float64Array;
  readonly im: Float64Array;
}

/** The coefficients as doubles after dividing all of them by 2^maxbits (the largest becomes ~1). */
export function upolyScaledFloats(p: readonly bigint[]): Float64Array {
  let bits = 0;
  for (const c of p) bits = Math.max(bits, bitLength(c));
  const shift = Math.max(0, bits - 60);
  const out = new Float64Array(p.length);
  const S = BigInt(shift);
  const scale = 2 ** (shift - bits);
  for (let i = 0; i < p.length; i++) out[i] = Number(p[i] >> S) * scale;
  return out;
}

/** Approximate complex roots of p (deg >= 1, leading coefficient non-zero); square-free p converges best. */
export function upolyFloatRoots(p: readonly bigint[], maxIter = 200): FloatRoots {
  const n = p.length - 1;
  const a = upolyScaledFloats(p);
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  if (n < 1) return { re, im };
  if (n === 1) {
    re[0] = -a[0] / a[1];
    return { re, im };
  }
  // Start on a circle of radius ~ the geometric mean of the root moduli (|a0/an|^(1/n)), capped by the
  // Cauchy-type bound, rotated off the real axis so conjugate pairs separate.
  let bound = 0;
  for (let i = 0; i < n; i++) bound = Math.max(bound, Math.abs(a[i] / a[n]) ** (1 / (n - i)));
  let radius = a[0] !== 0 ? Math.abs(a[0] / a[n]) ** (1 / n) : bound / 2;
  if (!(radius > 0) || !Number.isFinite(radius)) radius = 1;
  radius = Math.min(radius, 2 * bound || 1);
  for (let k = 0; k < n; k++) {
    const t = (2 * Math.PI * k) / n + 0.7;
    re[k] = radius * Math.cos(t);
    im[k] = radius * Math.sin(t);
  }
  const done = new Uint8Array(n);
  for (let iter = 0; iter < maxIter; iter++) {
    let active = 0;
    for (let k = 0; k < n; k++) {
      if (done[k]) continue;
      const zr = re[k];
      const zi = im[k];
      // p(z) and p'(z) by Horner in complex arithmetic.
      let pr = a[n];
      let pi = 0;
      let dr = 0;
      let di = 0;
      for (let i = n - 1; i >= 0; i--) {
        const ndr = dr * zr - di * zi + pr;
        const ndi = dr * zi + di * zr + pi;
        dr = ndr;
        di = ndi;
        const npr = pr * zr - pi * zi + a[i];
        const npi = pr * zi + pi * zr;
        pr = npr;
        pi = npi;
      }
      const dd = dr * dr + di * di;
      if (dd === 0) continue;
      // N = p/p'
      const nr = (pr * dr + pi * di) / dd;
      const ni = (pi * dr - pr * di) / dd;
      let sr = 0;
      let si = 0;
      for (let j = 0; j < n; j++) {
        if (j === k) continue;
        const xr = zr - re[j];
        const xi = zi - im[j];
        const m = xr * xr + xi * xi;
        if (m === 0) continue;
        sr += xr / m;
        si -= xi / m;
      }
      // step = N / (1 − N·S)
      const denr = 1 - (nr * sr - ni * si);
      const deni = -(nr * si + ni * sr);
      const den = denr * denr + deni * deni;
      if (den === 0) continue;
      const stepr = (nr * denr + ni * deni) / den;
      const stepi = (ni * denr - nr * deni) / den;
      if (!Number.isFinite(stepr) || !Number.isFinite(stepi)) continue;
      re[k] = zr - stepr;
      im[k] = zi - stepi;
      if (Math.hypot(stepr, stepi) <= 2 ** -50 * Math.max(Math.hypot(zr, zi), 2 ** -900)) done[k] = 1;
      else active++;
    }
    if (active === 0) break;
  }
  return { re, im };
}
