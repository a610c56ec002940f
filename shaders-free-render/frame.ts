// The curve as the tracer sees it: a real polynomial G(U, V) in a sheared, re-centred and scaled frame.
//
// Input (`FloatForm`): float coefficients of a ternary form in the monomial order X^d, X^(d-1)Y,
// X^(d-1)Z, X^(d-2)Y^2, ... (the order of src/poly/form.ts), read in the affine chart Z = 1.
// Frame: world (x, y) = (ox + Lx(U + sV), oy + Ly V), so the frame's vertical is the world direction
// (s Lx / Ly, 1) = (worldShear, 1). The shear makes the coefficient of V^d a non-zero
// constant, so no branch runs off to infinity over a bounded U-range (no vertical asymptote) and the
// sweep in U needs no special case for them; centring and scaling by the viewport keep the numbers near 1
// whatever the scale of the coefficients or of the view (1e-30 .. 1e30).
// Canonical layout: `a[i * (d + 1) + j]` is the coefficient of U^i V^j, normalised so max |a| = 1.

export interface FloatForm {
  readonly degree: number;
  readonly coeffs: ArrayLike<number>;
}

export interface Frame {
  readonly degree: number;
  readonly a: Float64Array;
  /** Shear in frame units (worldShear * Ly / Lx). */
  readonly shear: number;
  /** Shear in world units: the frame's vertical is the world direction (worldShear, 1). */
  readonly worldShear: number;
  readonly ox: number;
  readonly oy: number;
  readonly scaleX: number;
  readonly scaleY: number;
}

/** Shears tried in order; the core's landmarks use the same values as exact rationals. */
export const SHEAR_CANDIDATES: readonly [number, number][] = [
  [1, 7], [-2, 9], [3, 11], [-4, 13], [5, 17], [-6, 19], [7, 23], [-8, 29],
];

export function floatFormCheck(f: FloatForm): void {
  const d = f.degree;
  if (!Number.isInteger(d) || d < 0) throw new Error(`a curve's degree must be a whole number, got ${d}`);
  if (f.coeffs.length !== ((d + 1) * (d + 2)) / 2) {
    throw new Error(`a form of degree ${d} has ${((d + 1) * (d + 2)) / 2} coefficients, got ${f.coeffs.length}`);
  }
  for (let k = 0; k < f.coeffs.length; k++) {
    if (!Number.isFinite(f.coeffs[k])) throw new Error(`coefficient ${k} of the curve is not a finite number`);
  }
}

/** The coefficients of F(x, y, 1) as `b[i][j]` of x^i y^j, scaled so that max |b| = 1. */
export function formAffine(f: FloatForm): number[][] {
  const d = f.degree;
  const b: number[][] = [];
  for (let i = 0; i <= d; i++) b.push(new Array<number>(d + 1).fill(0));
  let k = 0;
  let m = 0;
  for (let i = d; i >= 0; i--) {
    for (let j = d - i; j >= 0; j--) {
      b[i][j] = f.coeffs[k++];
      m = Math.max(m, Math.abs(b[i][j]));
    }
  }
  if (m > 0) for (const row of b) for (let j = 0; j <= d; j++) row[j] /= m;
  return b;
}

/** The degree-d part F_d(x, y) at (s, 1), relative to its largest coefficient (0 when F_d vanishes). */
export function topAtDirection(b: number[][], d: number, s: number): number {
  let v = 0;
  let m = 0;
  for (let i = 0; i <= d; i++) {
    const c = b[i][d - i];
    v += c * s ** i;
    m = Math.max(m, Math.abs(c));
  }
  return m === 0 ? 0 : v / m;
}

/** The first candidate shear with a clearly non-zero V^d coefficient (a float choice; see landmarks). */
export function shearChoose(b: number[][], d: number): number {
  for (const [p, q] of SHEAR_CANDIDATES) {
    const s = p / q;
    if (Math.abs(topAtDirection(b, d, s)) > 0.05) return s;
  }
  return SHEAR_CANDIDATES[0][0] / SHEAR_CANDIDATES[0][1];
}

/** G(U, V) = F(ox + Lx(U + sV), oy + Ly V) expanded and normalised, for a world shear. */
export function frameMake(b: number[][], d: number, worldShear: number, ox: number, oy: number, scaleX: number, scaleY: number): Frame {
  const shear = (worldShear * scaleY) / scaleX;
  // Powers of the two linear substitutions as bivariate arrays c[i][j] (U^i V^j).
  const xs = powersOf([[ox, scaleY * worldShear], [scaleX, 0]], d);
  const ys = powersOf([[oy, scaleY], [0, 0]], d);
  const n = d + 1;
  const a = new Float64Array(n * n);
  for (let i = 0; i <= d; i++) {
    for (let j = 0; i + j <= d; j++) {
      const c = b[i][j];
      if (c === 0) continue;
      const px = xs[i];
      const py = ys[j];
      for (let p = 0; p <= i; p++) {
        for (let q = 0; p + q <= i; q++) {
          const u = px[p][q];
          if (u === 0) continue;
          for (let r = 0; r <= j; r++) {
            for (let t = 0; r + t <= j; t++) {
              const w = py[r][t];
              if (w !== 0) a[(p + r) * n + q + t] += c * u * w;
            }
          }
        }
      }
    }
  }
  let m = 0;
  for (let k = 0; k < a.length; k++) m = Math.max(m, Math.abs(a[k]));
  if (m > 0) for (let k = 0; k < a.length; k++) a[k] /= m;
  return { degree: d, a, shear, worldShear, ox, oy, scaleX, scaleY };
}

// lin[i][j] is the coefficient of U^i V^j of a linear polynomial; returns its powers 0..d.
function powersOf(lin: number[][], d: number): number[][][] {
  const one = [[1]];
  const out: number[][][] = [one];
  for (let e = 1; e <= d; e++) out.push(bivMul(out[e - 1], lin));
  return out;
}

function bivMul(f: number[][], g: number[][]): number[][] {
  const out: number[][] = [];
  for (let i = 0; i < f.length + g.length - 1; i++) out.push(new Array<number>(f.length + g.length).fill(0));
  for (let i = 0; i < f.length; i++) {
    for (let j = 0; j < f[i].length; j++) {
      if (f[i][j] === 0) continue;
      for (let p = 0; p < g.length; p++) for (let q = 0; q < g[p].length; q++) out[i + p][j + q] += f[i][j] * g[p][q];
    }
  }
  return out;
}

/** Coefficients in V of G(U, ·) at a fixed U (index j = coefficient of V^j). */
export function frameAtU(fr: Frame, u: number): number[] {
  const n = fr.degree + 1;
  const out = new Array<number>(n).fill(0);
  for (let j = 0; j < n; j++) {
    let s = 0;
    for (let i = n - 1 - j; i >= 0; i--) s = s * u + fr.a[i * n + j];
    out[j] = s;
  }
  return out;
}

/** Coefficients in U of G(·, V) at a fixed V. */
export function frameAtV(fr: Frame, v: number): number[] {
  const n = fr.degree + 1;
  const out = new Array<number>(n).fill(0);
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = n - 1 - i; j >= 0; j--) s = s * v + fr.a[i * n + j];
    out[i] = s;
  }
  return out;
}

/** [G, G_U, G_V, |terms|] at (U, V); |terms| is Σ |a_ij U^i V^j|, the scale of rounding in G. */
export function frameEval(fr: Frame, u: number, v: number, out: Float64Array): Float64Array {
  const n = fr.degree + 1;
  const a = fr.a;
  let g = 0;
  let gu = 0;
  let gv = 0;
  let mag = 0;
  const au = Math.abs(u);
  const av = Math.abs(v);
  for (let j = n - 1; j >= 0; j--) {
    let p = 0;
    let dp = 0;
    let m = 0;
    for (let i = n - 1 - j; i >= 0; i--) {
      dp = dp * u + p;
      p = p * u + a[i * n + j];
      m = m * au + Math.abs(a[i * n + j]);
    }
    gv = gv * v + g;
    g = g * v + p;
    gu = gu * v + dp;
    mag = mag * av + m;
  }
  out[0] = g;
  out[1] = gu;
  out[2] = gv;
  out[3] = mag;
  return out;
}

/** Second partials [G_UU, G_UV, G_VV] at (U, V) (used to refine singular points). */
export function frameHessian(fr: Frame, u: number, v: number): [number, number, number] {
  const n = fr.degree + 1;
  let uu = 0;
  let uv = 0;
  let vv = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; i + j < n; j++) {
      const c = fr.a[i * n + j];
      if (c === 0) continue;
      if (i >= 2) uu += c * i * (i - 1) * u ** (i - 2) * v ** j;
      if (i >= 1 && j >= 1) uv += c * i * j * u ** (i - 1) * v ** (j - 1);
      if (j >= 2) vv += c * j * (j - 1) * u ** i * v ** (j - 2);
    }
  }
  return [uu, uv, vv];
}

/** World point of a frame point. */
export function frameToWorld(fr: Frame, u: number, v: number): [number, number] {
  return [fr.ox + fr.scaleX * (u + fr.shear * v), fr.oy + fr.scaleY * v];
}

/** Frame point of a world point. */
export function worldToFrame(fr: Frame, x: number, y: number): [number, number] {
  const v = (y - fr.oy) / fr.scaleY;
  return [(x - fr.ox) / fr.scaleX - fr.shear * v, v];
}
