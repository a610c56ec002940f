// From typed text to a curve the tracer can draw: the exact parse, the normalised equation and degree for
// the report, exact landmarks from the core, and the tracer's prepared curve (reused for every pan and
// zoom). Failures come back as a message and a column, never as a thrown error.
import { NinefoldError, ParseError } from '../../exact/errors.ts';
import { curveLandmarks, formFloatCoefficients } from '../../poly/curve-landmarks.ts';
import { formParse } from '../../poly/parse.ts';
import { formToText } from '../../poly/print.ts';
import { curvePrepare, type PreparedCurve } from '../../../shaders-free-render/trace.ts';
import { cubicComponents } from '../../cubic/factor.ts';
import { formMul, type Form } from '../../poly/form.ts';

/** The curve as a set: a cubic with a repeated component is drawn through its reduced form. */
function formReducedForDrawing(f: Form): Form {
  if (f.degree !== 3) return f;
  const parts = cubicComponents(f).components;
  if (parts.every((c) => c.multiplicity === 1)) return f;
  return parts.map((c) => c.form).reduce((a, b) => formMul(a, b));
}

export interface CurveReady {
  readonly ok: true;
  readonly text: string;
  readonly degree: number;
  readonly equation: string;
  readonly prepared: PreparedCurve;
  /** Why the curve is drawn without exact landmarks, when it is. */
  readonly note: string | null;
  readonly landmarkMs: number;
}

export interface CurveRefused {
  readonly ok: false;
  readonly text: string;
  readonly message: string;
  /** 1-based column of the problem in the text, when there is one. */
  readonly column: number | null;
}

export type CurveSource = CurveReady | CurveRefused;

export function curveSourceRead(text: string): CurveSource {
  let parsed;
  try {
    parsed = formParse(text, 'equation');
  } catch (e) {
    if (e instanceof ParseError) return { ok: false, text, message: e.message, column: e.column };
    if (e instanceof NinefoldError) return { ok: false, text, message: e.message, column: null };
    throw e;
  }
  const form = parsed.form;
  if (form.degree < 1) return { ok: false, text, message: 'this equation has no x or y left in it: it is not a curve', column: null };
  const t0 = performance.now();
  let landmarks = null;
  let note: string | null = null;
  const drawn = formReducedForDrawing(form);
  if (drawn !== form) note = 'a repeated component is drawn once';
  try {
    landmarks = curveLandmarks(drawn);
  } catch (e) {
    if (!(e instanceof NinefoldError)) throw e;
    note = `drawn without exact landmarks: ${e.message}`;
  }
  const landmarkMs = performance.now() - t0;
  const prepared = curvePrepare({ degree: drawn.degree, coeffs: formFloatCoefficients(drawn) }, landmarks);
  const equation = `${formToText(form, { affine: !parsed.homogeneous })} = 0`;
  return { ok: true, text, degree: form.degree, equation, prepared, note, landmarkMs };
}
