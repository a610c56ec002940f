// The Pixi side of dash stripes (sink-dash-pattern.ts): one small stripe texture per colour, width and
// pattern, kept for the sink's life, and the FillPattern objects of a frame (one per striped segment:
// the canvas renderer reads each pattern's transform when it draws, after the whole frame is built).
import { CanvasSource, DOMAdapter, FillPattern, Matrix, Texture } from 'pixi.js';
import { dashStripeMatrix, dashStripes, type DashStripes } from './sink-dash-pattern.ts';

/** Stripe textures by colour, pattern and width, kept for the sink's life, and this frame's patterns. */
export class StripePatterns {
  /** Stripe texels per CSS pixel: fine enough that a dash end is placed to a quarter of a pixel. */
  private static readonly TEXELS = 4;
  private readonly textures = new Map<string, { texture: Texture; stripes: DashStripes; texels: number; used: FillPattern[]; next: number }>();

  frameStart(): void {
    for (const t of this.textures.values()) t.next = 0;
  }

  destroy(): void {
    for (const t of this.textures.values()) t.texture.destroy(true);
    this.textures.clear();
  }

  /** A pattern laying the dashes along the screen segment, or null when stripes cannot show them. */
  along(color: string, dash: readonly number[], width: number, x0: number, y0: number, x1: number, y1: number): FillPattern | null {
    const key = `${color}|${width}|${dash.join(',')}`;
    let t = this.textures.get(key);
    if (!t) {
      const stripes = dashStripes(dash, width);
      if (!stripes || stripes.period > 4096) return null;
      const w = Math.max(1, Math.round(stripes.period * StripePatterns.TEXELS));
      const canvas = DOMAdapter.get().createCanvas(w, 1);
      const ctx = canvas.getContext('2d');
      if (!ctx) return null;
      ctx.fillStyle = color;
      const k = w / stripes.period;
      let at = 0;
      for (let i = 0; i < stripes.runs.length; i += 2) {
        ctx.fillRect(at * k, 0, stripes.runs[i] * k, 1);
        at += stripes.runs[i] + stripes.runs[i + 1];
      }
      t = { texture: new Texture({ source: new CanvasSource({ resource: canvas, resolution: 1 }) }), stripes, texels: k, used: [], next: 0 };
      this.textures.set(key, t);
    }
    const m = dashStripeMatrix(x0, y0, x1, y1, width, t.texels);
    if (!m) return null;
    // One pattern object per segment in a frame: the renderer reads each one's transform when it draws.
    let p = t.used[t.next];
    if (!p) {
      p = new FillPattern(t.texture, 'repeat');
      t.used.push(p);
    }
    t.next++;
    p.setTransform(new Matrix(m[0], m[1], m[2], m[3], m[4], m[5]));
    return p;
  }
}
