// `trace EQ --view XMIN,YMIN,XMAX,YMAX --pixels W,H`: the real picture of a curve in a view, as the
// canvas draws it: exact landmarks from the core (src/poly/curve-landmarks.ts), then the tracer
// (shaders-free-render). Polylines and dots are in world coordinates; "ends" gives each open piece's two
// ends and how they end; "ms" is the time of landmarks plus trace.
import type { Verb } from '../verb.ts';
import { InvalidInput, NinefoldError } from '../../exact/errors.ts';
import { formParse } from '../../poly/parse.ts';
import { curveLandmarks, formFloatCoefficients } from '../../poly/curve-landmarks.ts';
import { optionString, positionalAt, type Args } from '../args.ts';
import { curvePrepare, curveTrace } from '../../../shaders-free-render/trace.ts';
import { cubicComponents } from '../../cubic/factor.ts';
import { formMul, type Form } from '../../poly/form.ts';

/** The curve as a set: a cubic with a repeated component is drawn through its reduced form. */
function formReducedForDrawing(f: Form): Form {
  if (f.degree !== 3) return f;
  const parts = cubicComponents(f).components;
  if (parts.every((c) => c.multiplicity === 1)) return f;
  return parts.map((c) => c.form).reduce((a, b) => formMul(a, b));
}

function numbersOption(args: Args, name: string, count: number, fallback: number[]): number[] {
  const text = optionString(args, name);
  if (text === undefined) return fallback;
  const parts = text.split(',').map((s) => s.trim());
  if (parts.length !== count) {
    throw new InvalidInput(`--${name} needs ${count} numbers separated by commas, found "${text}"`, `--${name}`);
  }
  return parts.map((p, i) => {
    if (!/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(p)) {
      throw new InvalidInput(`--${name}: number ${i + 1} is not a number: "${p}"`, `--${name}`);
    }
    const v = Number(p);
    if (!Number.isFinite(v)) throw new InvalidInput(`--${name}: number ${i + 1} is out of range: "${p}"`, `--${name}`);
    return v;
  });
}

export const trace: Verb = {
  name: 'trace',
  usage:
    'trace EQ [--view XMIN,YMIN,XMAX,YMAX] [--pixels W,H] [--dpr R] [--float] — the drawn curve: {"polylines": [[x0, y0, x1, y1, ...]], "closed", "ends", "dots": [[x, y]], "landmarks", "reduced", "vertices", "ms"}',
  switches: ['float'],
  run(args) {
    const text = positionalAt(args, 0, 'the equation of the curve');
    if (args.positional.length > 1) {
      throw new InvalidInput(`one equation only; found an extra argument "${args.positional[1]}" (quote the equation if it has spaces)`, 'argument 2');
    }
    const [xmin, ymin, xmax, ymax] = numbersOption(args, 'view', 4, [-4, -3, 4, 3]);
    if (!(xmin < xmax) || !(ymin < ymax)) throw new InvalidInput('--view needs XMIN < XMAX and YMIN < YMAX', '--view');
    const [width, height] = numbersOption(args, 'pixels', 2, [800, 600]);
    if (!(width >= 1 && height >= 1 && width <= 20000 && height <= 20000) || !Number.isInteger(width) || !Number.isInteger(height)) {
      throw new InvalidInput('--pixels needs two whole numbers between 1 and 20000', '--pixels');
    }
    const [dpr] = numbersOption(args, 'dpr', 1, [1]);
    if (!(dpr > 0 && dpr <= 8)) throw new InvalidInput('--dpr must be between 0 and 8', '--dpr');
    const parsed = formParse(text, 'argument 1').form;
    const form = formReducedForDrawing(parsed);
    if (form.degree < 1) throw new InvalidInput('the equation has no variables left: it is not a curve', 'argument 1');
    const t0 = performance.now();
    const exact = args.options.get('float') === true ? null : curveLandmarks(form);
    const prepared = curvePrepare({ degree: form.degree, coeffs: formFloatCoefficients(form) }, exact);
    let tr;
    try {
      tr = curveTrace(prepared, { xmin, ymin, xmax, ymax, width, height, dpr });
    } catch (e) {
      if (e instanceof NinefoldError) throw e;
      throw new InvalidInput(e instanceof Error ? e.message : String(e), '--view');
    }
    const ms = performance.now() - t0;
    return {
      polylines: tr.polylines.map((p) => p.points),
      closed: tr.polylines.map((p) => p.closed),
      ends: tr.polylines.map((p) => p.ends),
      dots: tr.dots,
      landmarks: exact && {
        shear: `${exact.shearExact[0]}/${exact.shearExact[1]}`,
        critical: exact.critical,
        criticalMultiplicity: exact.criticalMultiplicity,
        singularLines: exact.singularLines,
        atInfinity: exact.atInfinity,
      },
      vertices: tr.stats.vertices,
      /** True when a repeated component was drawn once (the curve as a set). */
      reduced: form !== parsed,
      ms: Math.round(ms * 1000) / 1000,
    };
  },
};
