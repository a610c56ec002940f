// The baseline the tracer is measured against (tests/bench/trace.bench.ts): plain marching squares on the
// device-pixel grid. F is sampled at every pixel corner, each cell whose corners change sign gets one or
// two segments (a saddle is split by the sign at the cell centre), and segments that share a cell edge
// are joined; an isolated real point or an oval between samples is simply not seen. Not used for drawing.
import { floatFormCheck, formAffine, type FloatForm } from './frame.ts';
import type { TraceView } from './trace.ts';

export interface MarchingResult {
  readonly segments: number;
  /** Connected components of the segment set. */
  readonly components: number;
}

export function marchingSquares(form: FloatForm, view: TraceView): MarchingResult {
  floatFormCheck(form);
  const d = form.degree;
  const b = formAffine(form);
  const dpr = view.dpr ?? 1;
  const w = Math.max(1, Math.round(view.width * dpr));
  const h = Math.max(1, Math.round(view.height * dpr));
  const dx = (view.xmax - view.xmin) / w;
  const dy = (view.ymax - view.ymin) / h;
  const vals = new Float64Array((w + 1) * (h + 1));
  const row = new Float64Array(d + 1);
  for (let r = 0; r <= h; r++) {
    const y = view.ymin + r * dy;
    // Coefficients in x of F(x, y) for this row, then Horner in x at every corner.
    for (let i = 0; i <= d; i++) {
      let s = 0;
      for (let j = d - i; j >= 0; j--) s = s * y + b[i][j];
      row[i] = s;
    }
    for (let c = 0; c <= w; c++) {
      const x = view.xmin + c * dx;
      let s = 0;
      for (let i = d; i >= 0; i--) s = s * x + row[i];
      vals[r * (w + 1) + c] = s;
    }
  }
  // Edge ids: horizontal edge (r, c) -> r * w + c; vertical edge (r, c) -> H0 + r * (w + 1) + c.
  const H0 = (h + 1) * w;
  const parent = new Int32Array(H0 + h * (w + 1)).fill(-1);
  const find = (a: number): number => {
    while (parent[a] !== a) a = parent[a] = parent[parent[a]];
    return a;
  };
  const touch = (a: number): void => {
    if (parent[a] < 0) parent[a] = a;
  };
  const join = (a: number, b2: number): void => {
    touch(a);
    touch(b2);
    parent[find(a)] = find(b2);
  };
  let segments = 0;
  const evalAt = (x: number, y: number): number => {
    let s = 0;
    for (let i = d; i >= 0; i--) {
      let t = 0;
      for (let j = d - i; j >= 0; j--) t = t * y + b[i][j];
      s = s * x + t;
    }
    return s;
  };
  for (let r = 0; r < h; r++) {
    for (let c = 0; c < w; c++) {
      const k = r * (w + 1) + c;
      const a0 = vals[k] > 0 ? 1 : 0; // bottom left
      const a1 = vals[k + 1] > 0 ? 1 : 0; // bottom right
      const a2 = vals[k + w + 2] > 0 ? 1 : 0; // top right
      const a3 = vals[k + w + 1] > 0 ? 1 : 0; // top left
      const code = a0 | (a1 << 1) | (a2 << 2) | (a3 << 3);
      if (code === 0 || code === 15) continue;
      const bottom = r * w + c;
      const top = (r + 1) * w + c;
      const left = H0 + r * (w + 1) + c;
      const right = left + 1;
      const crossed: number[] = [];
      if (a0 !== a1) crossed.push(bottom);
      if (a1 !== a2) crossed.push(right);
      if (a2 !== a3) crossed.push(top);
      if (a3 !== a0) crossed.push(left);
      if (crossed.length === 2) {
        join(crossed[0], crossed[1]);
        segments++;
      } else {
        const centre = evalAt(view.xmin + (c + 0.5) * dx, view.ymin + (r + 0.5) * dy) > 0 ? 1 : 0;
        // Saddle: the centre's sign decides which corners are connected through the cell.
        if (centre === a0) {
          join(bottom, right);
          join(top, left);
        } else {
          join(bottom, left);
          join(right, top);
        }
        segments += 2;
      }
    }
  }
  let components = 0;
  for (let e = 0; e < parent.length; e++) if (parent[e] >= 0 && find(e) === e) components++;
  return { segments, components };
}
