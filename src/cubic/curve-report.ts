// The whole description of a cubic behind the `curve` verb: singular points and components (ours),
// invariants and real components (src/cubic/invariants.ts), flexes (src/cubic/flex.ts).
//
// Canonical form: each part is exactly what its module returns; nothing is recomputed or rounded here.
import type { Form } from '../poly/form.ts';
import { formPrimitive } from '../poly/form.ts';
import { cubicFlexes, type CubicFlexes } from './flex.ts';
import { cubicInvariants, cubicRealComponents, type CubicInvariants } from './invariants.ts';
import { cubicSingularPoints, type CubicSingularities } from './singular.ts';

export interface CubicReport {
  readonly curve: Form;
  readonly singularities: CubicSingularities;
  readonly invariants: CubicInvariants;
  /** 1 or 2 for a smooth cubic, null for a singular one. */
  readonly realComponents: 1 | 2 | null;
  readonly flexes: CubicFlexes;
}

export function cubicReport(f0: Form): CubicReport {
  const f = formPrimitive(f0);
  return {
    curve: f,
    singularities: cubicSingularPoints(f),
    invariants: cubicInvariants(f),
    realComponents: cubicRealComponents(f),
    flexes: cubicFlexes(f),
  };
}
