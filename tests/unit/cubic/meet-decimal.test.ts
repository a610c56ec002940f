import { describe, expect, it } from 'vitest';
import { lineCurveMeet } from '../../../src/cubic/meet.ts';
import { algebraicMeetPointDecimals } from '../../../src/cubic/meet-decimal.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';

const curve = (t: string) => formParse(t).form;

describe('algebraicMeetPointDecimals (digits decided by interval refinement)', () => {
  it('x^2 + y^2 = 3 on y = x: (±sqrt(3/2), ±sqrt(3/2)) to 20 digits (sqrt(3/2) = 1.22474487139158904909864..., PARI/GP sqrt)', () => {
    const m = lineCurveMeet(curve('x^2 + y^2 = 3'), [1n, -1n, 0n]);
    const got = m.points.map((p) => algebraicMeetPointDecimals(p.algebraic!, 20).affine);
    expect(got).toEqual([
      ['-1.2247448713915890491', '-1.2247448713915890491'],
      ['1.2247448713915890491', '1.2247448713915890491'],
    ]);
  });
  it('a coordinate that is exactly zero is printed as 0 (x = 0 on x^2 + y^2 = 3)', () => {
    const m = lineCurveMeet(curve('x^2 + y^2 = 3'), [1n, 0n, 0n]);
    for (const p of m.points) expect(algebraicMeetPointDecimals(p.algebraic!, 12).affine![0]).toBe('0');
  });
  it('a point at infinity has no affine chart: x^2 - 2y^2 = 1 meets Z = 0 at (±sqrt(2) : 1 : 0)', () => {
    const m = lineCurveMeet(curve('x^2 - 2y^2 = 1'), [0n, 0n, 1n]);
    const d = m.points.map((p) => algebraicMeetPointDecimals(p.algebraic!, 15));
    expect(d.map((x) => x.affine)).toEqual([null, null]);
    expect(d.map((x) => x.projective).sort()).toEqual([
      ['1', '-0.707106781186548', '0'],
      ['1', '0.707106781186548', '0'],
    ]);
  });
  it('refuses a silly digit count', () => {
    const m = lineCurveMeet(curve('x^2 + y^2 = 3'), [1n, -1n, 0n]);
    expect(() => algebraicMeetPointDecimals(m.points[0].algebraic!, 0)).toThrow(InvalidInput);
  });
});
