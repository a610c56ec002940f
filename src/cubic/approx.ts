// Floating approximations of exact points, for display only ("approx" fields): they never decide anything.
//
// Canonical form: an approximate point is [x, y, z] scaled so that its last non-zero coordinate (of largest
// modulus, for complex points) is 1; complex points carry a second vector of imaginary parts.

export type Approx = [number, number, number];

export interface ComplexApprox {
  readonly re: Approx;
  readonly im: Approx;
}

/** A rational point as doubles: (x/z, y/z, 1) when z ≠ 0, else scaled by the last non-zero entry. */
export function pointApprox(p: readonly bigint[]): Approx {
  const v = [Number(p[0]), Number(p[1]), Number(p[2])];
  const k = v[2] !== 0 ? 2 : v[1] !== 0 ? 1 : 0;
  return [v[0] / v[k], v[1] / v[k], v[2] / v[k]];
}

type C = [number, number];
const cmul = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const cdiv = (a: C, b: C): C => {
  const n = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / n, (a[1] * b[0] - a[0] * b[1]) / n];
};

/** Normalise a complex projective vector by its coordinate of largest modulus. */
export function complexNormalise(v: readonly C[]): ComplexApprox {
  // The last coordinate that is not negligibly small, as for real points: (x : y : 1) when z is usable.
  const size = v.map((c) => Math.hypot(...c));
  const big = Math.max(...size);
  let k = 2;
  while (k > 0 && size[k] < 1e-9 * big) k--;
  const w = v.map((c) => cdiv(c, v[k]));
  return { re: [w[0][0], w[1][0], w[2][0]], im: [w[0][1], w[1][1], w[2][1]] };
}

/** All complex roots of a real polynomial (coefficient of x^i at index i, leading non-zero), Durand–Kerner. */
export function polyRootsApprox(coeffs: readonly number[]): C[] {
  const n = coeffs.length - 1;
  const lead = coeffs[n];
  const p = coeffs.map((c) => c / lead);
  const evalAt = (x: C): C => {
    let acc: C = [1, 0];
    for (let i = n - 1; i >= 0; i--) acc = [cmul(acc, x)[0] + p[i], cmul(acc, x)[1]];
    return acc;
  };
  const radius = 1 + Math.max(...p.slice(0, n).map(Math.abs));
  let z: C[] = Array.from({ length: n }, (_, k) => [radius * Math.cos(0.4 + (2 * Math.PI * k) / n), radius * Math.sin(0.4 + (2 * Math.PI * k) / n)]);
  for (let iter = 0; iter < 500; iter++) {
    let moved = 0;
    z = z.map((zi, i) => {
      let den: C = [1, 0];
      for (let j = 0; j < n; j++) if (j !== i) den = cmul(den, [zi[0] - z[j][0], zi[1] - z[j][1]]);
      const step = cdiv(evalAt(zi), den);
      moved = Math.max(moved, Math.hypot(...step) / Math.max(1, Math.hypot(...zi)));
      return [zi[0] - step[0], zi[1] - step[1]];
    });
    if (moved < 1e-15) break;
  }
  return z;
}

export type { C as ComplexNumber };
