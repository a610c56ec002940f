// The data model of a construction: what a scene file stores and what the canvas draws.
//
// A construction is a list of objects (curves, points, lines, checks). Each object has
//   - an `id` (unique in the construction, never reused after deletion; e.g. "p7"),
//   - a `label` shown on the canvas and in the sidebar (free text, e.g. "P", "O", "E"),
//   - a `style` (colour, visibility, label visibility; stroke pattern for curves and lines),
//   - its `construction`: a `kind` naming how it is built, the ids of its `parents` in a fixed order, and
//     exact `params` as strings (rationals "-17/4", points "X:Y:Z", integers "5", equations as typed).
//     Never floats: a scene file reproduces every value exactly.
// That part is plain JSON (`ConstructionDoc`). The computed values (`ObjectValue`) are not stored: they
// are recomputed from the parents in order, each with a status
//   exact       — a point of P^2(Q), a line or curve with integer coefficients, a decided check;
//   algebraic   — a real point with algebraic coordinates (defining polynomial + isolating interval),
//                 refinable to any precision, not rational;
//   approximate — floats only, e.g. everything depending on a free point while it is being dragged.
// A value that cannot be built (two equal points asked for their line) is an `ObjectFailure` with the
// message in words; the object stays in the construction and comes back when its parents allow it.
//
// Canonical form: `objects` is in construction order — every parent appears before its children — and
// ids are unique. `constructionValidate` (graph.ts) enforces both on load.
import type { Form } from '../poly/form.ts';
import type { Line, Point } from '../plane/point.ts';

export type ObjectId = string;

/** What an object is, independent of how it was built. */
export type ObjectType = 'curve' | 'point' | 'line' | 'check';

export type Status = 'exact' | 'algebraic' | 'approximate';

/** How an object is built. Each kind fixes its parents (by type and order) and its params. */
export type ConstructionKind =
  // curves
  | 'curve-equation' //       parents []; params { equation } as typed ("y^2 = x^3 - 3x + 5"), degree 1..6
  | 'conic-through-five' //   parents [5 points]
  | 'cubic-through-nine' //   parents [9 points]
  | 'pencil-member' //        parents [8 points]; params { member: "s:t" } — the member s·F1 + t·F2 of the pencil
  | 'curve-weierstrass' //    parents [curve C, point O]: the Weierstrass model of the smooth cubic C from its rational
  //                          point O, as a plane cubic: the reduced minimal model's long form
  //                          Y²Z + a1·XYZ + a3·YZ² = X³ + a2·X²Z + a4·XZ² + a6·Z³ (what the maps go to)
  // points
  | 'point-free' //           parents []; params { at: "X:Y:Z" }
  | 'point-on-curve' //       parents [curve]; params { at: "X:Y:Z" } (a rational point of the curve), or
  //                          params { x: "rational", near: "rational" }: the real point of the curve on the
  //                          vertical line at x whose ordinate is nearest `near` (algebraic in general)
  | 'point-meet' //           parents [a, b] (line or curve each); params { index: "k", near?: "X:Y:Z" } — one
  //                          real meet point, kept by identity (the rule is below, MEET IDENTITY)
  | 'point-third' //          parents [curve, P, Q]: the third point P*Q of the chord (tangent when P = Q)
  | 'point-sum' //            parents [curve, O, P, Q]: P + Q with base point O
  | 'point-multiple' //       parents [curve, O, P]; params { n: "integer" }: nP with base point O
  | 'point-negative' //       parents [curve, O, P]: −P with base point O
  | 'point-ninth' //          parents [8 points]: the ninth base point of the pencil of cubics through them
  | 'point-parameter' //      parents [curve]; params { at: "s:t" }: the point with parameter (s:t) of a
  //                          nodal or cuspidal cubic's parametrisation through its singular point
  | 'point-weierstrass-image' // parents [curve C, point O, point P]: the image of P on the Weierstrass model of C
  //                          with base point O (src/cubic/weierstrass.ts); O goes to (0:1:0)
  // lines
  | 'line-through-two' //     parents [P, Q]
  | 'line-tangent' //         parents [curve, P]: the tangent at a smooth point P of the curve
  | 'line-equation' //        parents []; params { at: "a:b:c" } — the line aX + bY + cZ = 0
  // checks (each re-evaluated after every change)
  | 'check-collinear' //      parents [3 or more points]
  | 'check-concurrent' //     parents [3 or more lines]
  | 'check-on-curve' //       parents [P, curve]
  | 'check-equal' //          parents [P, Q]
  | 'check-nine' //           parents [9 points]: do they form the base of a pencil of cubics?
  | 'check-associative'; //   parents [curve, O, P, Q, R]: (P+Q)+R = P+(Q+R)

// MEET IDENTITY. A 'point-meet' names one real meet point of its two parents, chosen when it is
// computed exactly by the first rule that applies:
//   1. coming out of a drag (its last value is approximate): the exact real meet point nearest that
//      float position, so the point that was followed during the drag is the one kept after the drop;
//   2. params.near ("X:Y:Z", integers; written by `constructionMeetsSettle` in meet-identity.ts from the
//      point's position when a drag ends): the exact real meet point nearest it, provided it is within a
//      quarter of the least distance between two of the meet points (else near names none of them);
//   3. params.index ("k"): the k-th real meet point in the order of src/cubic/meet.ts (rational points by
//      height, then real algebraic ones by their float coordinates). Files without "near" load as before.
// "Nearest" is the angle between the points as unit vectors of R³ (projective: points at infinity
// need no special case). During a drag the point is followed by continuity from its last position
// (float-meet.ts), never by index.

export interface Construction {
  readonly kind: ConstructionKind;
  readonly parents: readonly ObjectId[];
  readonly params: Readonly<Record<string, string>>;
}

export type StrokePattern = 'solid' | 'dashed' | 'dotted';

export interface Style {
  /** CSS colour, "#rrggbb". */
  readonly colour: string;
  readonly visible: boolean;
  readonly showLabel: boolean;
  /** Curves and lines only; points encode their status by shape instead. */
  readonly stroke?: StrokePattern;
  /** Stroke width in CSS pixels (curves and lines). */
  readonly width?: number;
}

export interface ConstructionObject {
  readonly id: ObjectId;
  readonly type: ObjectType;
  readonly label: string;
  readonly style: Style;
  readonly construction: Construction;
  /** Set on helper objects a tool made on the way (the chord drawn by a sum); deleted with their owner. */
  readonly helperOf?: ObjectId;
}

/** The serialisable construction: what a scene file holds (E8 wraps it with version and view). */
export interface ConstructionDoc {
  readonly objects: readonly ConstructionObject[];
  /** The curve whose report the sidebar shows and on which point tools act by default. */
  readonly activeCurve: ObjectId | null;
  /** Next free id number: ids are `${prefix}${n}` and never reused. */
  readonly nextId: number;
}

// ---- computed values (not serialised) ----

/** How an algebraic (real, irrational) point is known exactly. */
export interface AlgebraicDescription {
  /** In words, with the defining polynomial and isolating interval, e.g. "x is the root of x^2 - x - 1 in [1, 2]". */
  readonly text: string;
  /** The core's exact description (a meet point of src/cubic/meet.ts, a real algebraic number of
   * src/exact/algebraic.ts), kept for refinement to any precision. */
  readonly exact: unknown;
}

/** Floating approximation of a projective point, for drawing: affine (x, y) when finite, else a direction. */
export interface PointApprox {
  readonly x: number;
  readonly y: number;
  /** false for a point at infinity; (x, y) is then its direction. */
  readonly finite: boolean;
}

export interface PointValue {
  readonly type: 'point';
  readonly status: Status;
  /** Present when status = exact. */
  readonly exact?: Point;
  /** Present when the value was computed exactly as a real algebraic point. */
  readonly algebraic?: AlgebraicDescription;
  readonly approx: PointApprox;
  /** Intersection multiplicity, for meet points. */
  readonly multiplicity?: number;
  /** Parameter points only: the singular point and the pencil basis D1, D2 of the parametrisation, as
   * unit float triples, kept so the float version follows the point while its curve moves. */
  readonly pencil?: { readonly singular: readonly number[]; readonly basis: readonly [readonly number[], readonly number[]] };
}

export interface LineValue {
  readonly type: 'line';
  readonly status: Status;
  readonly exact?: Line;
  /** a, b, c of aX + bY + cZ = 0 in floats (always present). */
  readonly approx: readonly [number, number, number];
}

export interface CurveValue {
  readonly type: 'curve';
  /** Exact when built from exact parents; approximate while a parent point is dragged (or algebraic). */
  readonly status: Status;
  /** Present when status = exact: the primitive integer form. */
  readonly form?: Form;
  /** Float coefficients in the order of `form.coeffs`, for the tracer. */
  readonly approx: readonly number[];
}

export type Verdict = 'holds' | 'fails' | 'undecided';

export interface CheckValue {
  readonly type: 'check';
  readonly status: Status;
  readonly verdict: Verdict;
  /** The claim in words, e.g. "P, Q, R are collinear". */
  readonly claim: string;
  /** The exact certificate (a determinant, a residual, a point) as text; on algebraic data the
   * precision used, e.g. "decided at 60 bits". */
  readonly certificate: string;
  /** A plain-words remark, e.g. on a special nine-point configuration. */
  readonly remark?: string;
}

export interface ObjectFailure {
  readonly type: 'failure';
  readonly message: string;
  /** The parent or param responsible, when known. */
  readonly where: string;
}

export type ObjectValue = PointValue | LineValue | CurveValue | CheckValue | ObjectFailure;

/** The computed side of a construction: one value per object id. */
export type ValueMap = ReadonlyMap<ObjectId, ObjectValue>;
