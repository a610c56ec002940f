// Curves with known real topology, each with its source. `view` is [xmin, ymin, xmax, ymax] drawn into
// 800 x 600 device pixels unless `pixels` says otherwise; `expect` counts open pieces, closed pieces and
// dots in that view, and `singular` lists singular points with the number of branch ends meeting there.
// Equations are exact text (parsed by src/poly/parse.ts); `scale` multiplies every coefficient after
// parsing (to test huge and tiny coefficients), `stretch` maps the curve F(x, y) to F(x/k, y/k).

import { formParse } from '../../../src/poly/parse.ts';
import type { TraceView } from '../../../shaders-free-render/trace.ts';

export interface TopologyCase {
  readonly name: string;
  readonly source: string;
  readonly eq: string;
  readonly view: readonly [number, number, number, number];
  readonly pixels?: readonly [number, number];
  readonly scale?: number;
  readonly stretch?: number;
  readonly open: number;
  readonly closed: number;
  readonly dots: number;
  readonly singular?: readonly { readonly at: readonly [number, number]; readonly ends: number }[];
  /** Radius in px around singular ends where branches may come closer than half a pixel (tangent branches). */
  readonly exclusionPx?: number;
}

const BOX3 = [-3, -3, 3, 3] as const;

export const TOPOLOGY_CASES: readonly TopologyCase[] = [
  // Conics (common practice: the real affine conics; Fulton, Algebraic Curves, ch. 1 for the pairs of lines).
  { name: 'circle', source: 'common practice', eq: 'x^2 + y^2 = 4', view: BOX3, open: 0, closed: 1, dots: 0 },
  { name: 'ellipse', source: 'common practice', eq: '4x^2 + 9y^2 = 36', view: [-4, -3, 4, 3], open: 0, closed: 1, dots: 0 },
  { name: 'hyperbola', source: 'common practice', eq: 'x^2 - y^2 = 1', view: BOX3, open: 2, closed: 0, dots: 0 },
  { name: 'hyperbola with both axes as asymptotes', source: 'common practice', eq: 'x y = 1', view: BOX3, open: 2, closed: 0, dots: 0 },
  { name: 'parabola (double point at infinity)', source: 'common practice: a parabola is tangent to the line at infinity', eq: '4y = x^2 - 3x', view: [-4, -4, 6, 6], open: 1, closed: 0, dots: 0 },
  { name: 'crossing line pair', source: 'Fulton, Algebraic Curves, ch. 3 (node of a line pair)', eq: '(x - y)(x + 2y - 1) = 0', view: BOX3, open: 4, closed: 0, dots: 0, singular: [{ at: [1 / 3, 1 / 3], ends: 4 }] },
  { name: 'conic with one real point', source: 'common practice: x^2 + 2y^2 = 0 is a conjugate line pair', eq: '(x - 1)^2 + 2(y + 1)^2 = 0', view: BOX3, open: 0, closed: 0, dots: 1, singular: [{ at: [1, -1], ends: 0 }] },
  // Reducible cubics (Fulton, ch. 3 and 5: line + conic, three lines).
  { name: 'three concurrent lines', source: 'common practice: an ordinary triple point has six branch ends', eq: '(x - 1)(x + y - 1)(2x - y - 2) = 0', view: BOX3, open: 6, closed: 0, dots: 0, singular: [{ at: [1, 0], ends: 6 }] },
  { name: 'three lines in general position', source: 'common practice', eq: '(x + y)(x - y)(x - 2y + 1) = 0', view: BOX3, open: 9, closed: 0, dots: 0, singular: [{ at: [0, 0], ends: 4 }, { at: [1, 1], ends: 4 }, { at: [-1 / 3, 1 / 3], ends: 4 }] },
  { name: 'line plus conic, secant', source: 'common practice (two nodes where the line cuts the circle)', eq: '(2y - x)(x^2 + y^2 - 5) = 0', view: BOX3, open: 5, closed: 0, dots: 0, singular: [{ at: [2, 1], ends: 4 }, { at: [-2, -1], ends: 4 }] },
  { name: 'line plus conic, tangent', source: 'common practice (a tacnode where the line touches the circle)', eq: '(y - 2)(x^2 + y^2 - 4) = 0', view: BOX3, open: 3, closed: 0, dots: 0, singular: [{ at: [0, 2], ends: 4 }], exclusionPx: 60 },
  { name: 'line plus conic, disjoint', source: 'common practice', eq: '(y - 3)(x^2 + y^2 - 4) = 0', view: [-4, -4, 4, 4], open: 1, closed: 1, dots: 0 },
  { name: 'conic plus line through an acnode', source: 'common practice: x^2 + y^2 = 0 has one real point', eq: '(x^2 + y^2)(x - 2) = 0', view: BOX3, open: 1, closed: 0, dots: 1, singular: [{ at: [0, 0], ends: 0 }] },
  // Singular irreducible cubics (Silverman–Tate, Rational Points on Elliptic Curves, ch. III.7 and
  // Fulton ch. 3: node, cusp, acnode).
  { name: 'nodal cubic', source: 'Silverman–Tate ch. III (node); (x-1)^2 (x+2) factored by hand', eq: 'y^2 = x^3 - 3x + 2', view: BOX3, open: 3, closed: 0, dots: 0, singular: [{ at: [1, 0], ends: 4 }] },
  { name: 'cuspidal cubic', source: 'Silverman–Tate ch. III (cusp)', eq: 'y^2 = (x - 1)^3', view: [-2, -3, 3, 3], open: 2, closed: 0, dots: 0, singular: [{ at: [1, 0], ends: 2 }] },
  { name: 'acnodal cubic', source: 'Fulton ch. 3 (isolated real point of a node with conjugate tangents)', eq: 'y^2 = (x - 1)^2 (x - 2)', view: [-1, -3, 4, 3], open: 1, closed: 0, dots: 1, singular: [{ at: [1, 0], ends: 0 }] },
  { name: 'folium', source: 'Descartes folium x^3 + y^3 = 3xy (Lawrence, A Catalog of Special Plane Curves, from memory)', eq: 'x^3 + y^3 = 3 x y', view: BOX3, open: 3, closed: 0, dots: 0, singular: [{ at: [0, 0], ends: 4 }] },
  { name: 'strophoid (vertical asymptote)', source: 'Lawrence, A Catalog of Special Plane Curves: right strophoid (from memory)', eq: 'y^2 (1 - x) = x^2 (1 + x)', view: [-2, -3, 2, 3], open: 3, closed: 0, dots: 0, singular: [{ at: [0, 0], ends: 4 }] },
  { name: 'cissoid (cusp and vertical asymptote)', source: 'Lawrence, A Catalog of Special Plane Curves: cissoid of Diocles (from memory)', eq: 'y^2 (2 - x) = x^3', view: [-1, -4, 3, 4], open: 2, closed: 0, dots: 0, singular: [{ at: [0, 0], ends: 2 }], exclusionPx: 10 },
  // Smooth cubics (Silverman–Tate ch. I: one real component when the cubic in x has one real root,
  // two when it has three).
  { name: 'smooth cubic, one component', source: 'Silverman–Tate ch. I; x^3 + 2x + 3 = (x + 1)(x^2 - x + 3)', eq: 'y^2 = x^3 + 2x + 3', view: [-3, -5, 4, 5], open: 1, closed: 0, dots: 0 },
  { name: 'smooth cubic, two components', source: 'Silverman–Tate ch. I; roots -2, 0, 2', eq: 'y^2 = x^3 - 4x', view: [-3, -4, 4, 4], open: 1, closed: 1, dots: 0 },
  { name: 'graph of a cubic polynomial', source: 'common practice', eq: 'y = x^3 - 3x', view: BOX3, open: 1, closed: 0, dots: 0 },
  { name: 'cubic with vertical and horizontal asymptotes', source: 'common practice: y^2 = 1 + 1/x', eq: 'x (y^2 - 1) = 1', view: [-4, -4, 4, 4], open: 3, closed: 0, dots: 0 },
  { name: 'cubic with a horizontal asymptote', source: 'common practice: y = 1/(x^2 + 1)', eq: 'y (x^2 + 1) = 1', view: [-4, -1, 4, 2], open: 1, closed: 0, dots: 0 },
  { name: 'x y^2 = 4, asymptotic to both axes', source: 'common practice', eq: 'x y^2 = 4', view: BOX3, open: 2, closed: 0, dots: 0 },
  // Tiny ovals (the oval of y^2 = x(x + 1/500)(x - 1) spans x in [-1/500, 0]).
  { name: 'oval below a pixel is a dot', source: 'common practice; oval width 0.002 at 200 px per unit', eq: 'y^2 = x (x + 1/500) (x - 1)', view: [-2, -1.5, 2, 1.5], open: 1, closed: 0, dots: 1 },
  { name: 'the same oval zoomed in', source: 'common practice', eq: 'y^2 = x (x + 1/500) (x - 1)', view: [-0.004, -0.003, 0.002, 0.0015], open: 0, closed: 1, dots: 0 },
  { name: 'oval of about two pixels', source: 'common practice', eq: 'x^2 + y^2 = 1/160000', view: [-1, -0.75, 1, 0.75], open: 0, closed: 1, dots: 0 },
  { name: 'oval of about half a pixel', source: 'common practice', eq: 'x^2 + y^2 = 1/2560000', view: [-1, -0.75, 1, 0.75], open: 0, closed: 0, dots: 1 },
  // Quartics and sextics.
  { name: 'quartic with four ovals', source: 'common practice: product of two crossing ellipses perturbed into the four lunes', eq: '(x^2 + 4y^2 - 4)(4x^2 + y^2 - 4) + 1 = 0', view: BOX3, open: 0, closed: 4, dots: 0 },
  { name: 'two nested circles', source: 'common practice', eq: '(x^2 + y^2 - 1)(x^2 + y^2 - 9/2) = 0', view: BOX3, open: 0, closed: 2, dots: 0 },
  { name: 'circle and an acnode', source: 'common practice', eq: '(x^2 + y^2)(x^2 + y^2 - 4) = 0', view: BOX3, open: 0, closed: 1, dots: 1, singular: [{ at: [0, 0], ends: 0 }] },
  { name: 'lemniscate of Bernoulli', source: 'Lawrence, A Catalog of Special Plane Curves (from memory): node with two loops', eq: '(x^2 + y^2)^2 = 2 (x^2 - y^2)', view: [-2, -1.5, 2, 1.5], open: 2, closed: 0, dots: 0, singular: [{ at: [0, 0], ends: 4 }] },
  { name: 'figure eight', source: 'Lawrence, A Catalog of Special Plane Curves: lemniscate of Gerono (from memory)', eq: 'x^4 = x^2 - y^2', view: [-1.5, -1, 1.5, 1], open: 2, closed: 0, dots: 0, singular: [{ at: [0, 0], ends: 4 }] },
  { name: 'cardioid', source: 'Lawrence, A Catalog of Special Plane Curves: cardioid, cusp at the origin (from memory)', eq: '(x^2 + y^2 - 2x)^2 = 4 (x^2 + y^2)', view: [-2, -4, 6, 4], open: 1, closed: 0, dots: 0, singular: [{ at: [0, 0], ends: 2 }] },
  { name: 'trifolium', source: 'Lawrence, A Catalog of Special Plane Curves: regular trifolium r = cos 3t (from memory)', eq: '(x^2 + y^2)^2 = x^3 - 3 x y^2', view: [-1.2, -1.2, 1.2, 1.2], open: 3, closed: 0, dots: 0, singular: [{ at: [0, 0], ends: 6 }] },
  { name: 'tacnode of two parabolas', source: 'Fulton, Algebraic Curves, ch. 3 (tacnode y^2 = x^4, from memory)', eq: 'y^2 = x^4', view: [-2, -3, 2, 3], open: 4, closed: 0, dots: 0, singular: [{ at: [0, 0], ends: 4 }], exclusionPx: 80 },
  { name: 'ordinary quadruple point', source: 'common practice: four lines through a point, eight branch ends', eq: 'x y (x - y)(x + 2y) = 0', view: BOX3, open: 8, closed: 0, dots: 0, singular: [{ at: [0, 0], ends: 8 }] },
  { name: 'smooth convex quartic', source: 'common practice', eq: 'x^4 + y^4 = 1', view: [-2, -1.5, 2, 1.5], open: 0, closed: 1, dots: 0 },
  { name: 'three disjoint circles (sextic)', source: 'common practice', eq: '(x^2 + y^2 - 1)((x - 3)^2 + y^2 - 1)((x + 3)^2 + y^2 - 1) = 0', view: [-5, -3, 5, 3], open: 0, closed: 3, dots: 0 },
  // Viewport edges.
  { name: 'circle just inside the left edge', source: 'common practice', eq: 'x^2 + y^2 = 1', view: [-1.000001, -2, 2, 2], open: 0, closed: 1, dots: 0 },
  { name: 'circle just cut by the left edge', source: 'common practice', eq: 'x^2 + y^2 = 1', view: [-0.99999, -2, 2, 2], open: 1, closed: 0, dots: 0 },
  { name: 'cubic near its vertical asymptote, zoomed', source: 'common practice: y^2 = 1 + 1/x near x = 0', eq: 'x (y^2 - 1) = 1', view: [-0.001, -100, 0.001, 100], open: 2, closed: 0, dots: 0 },
  // Scale (coefficients and coordinates from 1e-30 to 1e30).
  { name: 'nodal cubic, coefficients times 1e30', source: 'common practice (scaling F changes nothing)', eq: 'y^2 = x^3 - 3x + 2', scale: 1e30, view: BOX3, open: 3, closed: 0, dots: 0, singular: [{ at: [1, 0], ends: 4 }] },
  { name: 'nodal cubic, coefficients times 1e-30', source: 'common practice', eq: 'y^2 = x^3 - 3x + 2', scale: 1e-30, view: BOX3, open: 3, closed: 0, dots: 0, singular: [{ at: [1, 0], ends: 4 }] },
  { name: 'nodal cubic shrunk by 1e-12', source: 'common practice (F(x/k, y/k))', eq: 'y^2 = x^3 - 3x + 2', stretch: 1e-12, view: [-3e-12, -3e-12, 3e-12, 3e-12], open: 3, closed: 0, dots: 0, singular: [{ at: [1e-12, 0], ends: 4 }] },
  { name: 'two-component cubic grown by 1e9', source: 'common practice', eq: 'y^2 = x^3 - 4x', stretch: 1e9, view: [-3e9, -4e9, 4e9, 4e9], open: 1, closed: 1, dots: 0 },
  { name: 'ellipse with axes 1e15 and 1', source: 'common practice', eq: 'x^2 + 1000000000000000000000000000000 y^2 = 1000000000000000000000000000000', view: [-2e15, -2, 2e15, 2], open: 0, closed: 1, dots: 0 },
];

export function caseForm(c: TopologyCase): { degree: number; coeffs: number[] } {
  const f = formParse(c.eq).form;
  const k = c.stretch ?? 1;
  const coeffs: number[] = [];
  let idx = 0;
  for (let i = f.degree; i >= 0; i--) {
    for (let j = f.degree - i; j >= 0; j--) {
      // F(x/k, y/k) scaled by k^d keeps the numbers representable: the term x^i y^j gets k^(d - i - j).
      coeffs.push(Number(f.coeffs[idx++]) * (c.scale ?? 1) * k ** (f.degree - i - j));
    }
  }
  return { degree: f.degree, coeffs };
}

export function caseView(c: TopologyCase): TraceView {
  const [w, h] = c.pixels ?? [800, 600];
  return { xmin: c.view[0], ymin: c.view[1], xmax: c.view[2], ymax: c.view[3], width: w, height: h };
}

