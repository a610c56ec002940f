// `weierstrass EQ --point O [--map P]`: the Weierstrass model of the smooth cubic with O sent to
// infinity, its invariants and minimal model, and the maps; with --map, the image of P.
import type { Verb } from '../verb.ts';
import { InvalidInput } from '../../exact/errors.ts';
import { ratToString } from '../../exact/rational.ts';
import { formToText } from '../../poly/print.ts';
import { pointToString } from '../../plane/parse-point.ts';
import { weierstrassMap, weierstrassModel } from '../../cubic/weierstrass.ts';
import { modelToShort } from '../../cubic/curve-model.ts';
import { argCubic, argsNoMore, modelPointJson, optionSmoothPoint } from '../cubic-args.ts';

export const weierstrass: Verb = {
  name: 'weierstrass',
  usage: 'weierstrass EQ --point O [--map P] — Weierstrass model with O at infinity, invariants, minimal model, maps: {"a", "c4", "c6", "discriminant", "j", "minimal", "forward", "inverse"}',
  run(args) {
    const f = argCubic(args);
    argsNoMore(args, 1);
    const o = optionSmoothPoint(args, f, 'point');
    if (o === undefined) throw new InvalidInput('--point is needed: the rational point O that goes to infinity', '--point');
    const model = weierstrassModel(f, o);
    const p = optionSmoothPoint(args, f, 'map');
    if (p !== undefined) {
      const image = weierstrassMap(model, p, '--map');
      return { image: modelPointJson(image), short: modelPointJson(modelToShort(model.a, image)) };
    }
    const l = model.lines;
    const lineText = (t: readonly bigint[]) => formToText({ degree: 1, coeffs: t }) + ' = 0';
    const inverse = model.flex
      ? 'O is a flex, so the forward map is a linear change of coordinates; the inverse is its inverse matrix (the point at infinity goes back to O).'
      : `O is not a flex; O' = ${pointToString(l.second!)} is the third point of the tangent ${lineText(l.tangent)} at O. A model point (x, y) goes back by a construction: x picks a line through O' in the pencil spanned by ${lineText(l.xLine)} and that tangent; on this line y = T'·M/T² (T' = ${lineText(l.secondTangent!)}, M = ${lineText(l.yLine)}) is linear in the position, which picks the point. The point at infinity goes back to O.`;
    return {
      base: pointToString(o),
      flex: model.flex,
      a: model.a,
      c4: model.c4,
      c6: model.c6,
      discriminant: model.discriminant,
      j: ratToString(model.j),
      minimal: model.minimal,
      ...(model.minimalNote ? { minimalNote: model.minimalNote } : {}),
      short: { equation: `y^2 = x^3 + (${model.short.A})x + (${model.short.B})`, A: model.short.A, B: model.short.B },
      forward: model.forward.map((h) => formToText(h)),
      inverse,
      lines: {
        tangent: lineText(l.tangent),
        x: lineText(l.xLine),
        y: lineText(l.yLine),
        ...(l.second ? { second: pointToString(l.second), secondTangent: lineText(l.secondTangent!) } : {}),
      },
    };
  },
};
