// SVG figure -> PNG at a chosen resolution, through resvg (@resvg/resvg-js, a maintained renderer).
// Node only (a native module): the CLI and the tests use it; the page rasterises in the browser instead.
import { Resvg } from '@resvg/resvg-js';
import { InvalidInput } from '../exact/errors.ts';

export const PNG_MAX_PIXELS = 12_000;

/** PNG bytes of an SVG whose size is given in points, at `dpi` dots per inch (1 pt = 1/72 in). */
export function svgToPng(svg: string, dpi: number): Uint8Array {
  if (!Number.isFinite(dpi) || dpi < 10 || dpi > 2400) throw new InvalidInput(`the resolution must be between 10 and 2400 dpi, found ${dpi}`, '--dpi');
  const m = /<svg[^>]*\swidth="([\d.]+)pt"[^>]*\sheight="([\d.]+)pt"/.exec(svg);
  if (!m) throw new InvalidInput('the SVG has no width and height in points', 'svg');
  const widthPx = Math.round((Number(m[1]) / 72) * dpi);
  const heightPx = Math.round((Number(m[2]) / 72) * dpi);
  if (widthPx > PNG_MAX_PIXELS || heightPx > PNG_MAX_PIXELS) {
    throw new InvalidInput(`${widthPx} x ${heightPx} pixels is too large (at most ${PNG_MAX_PIXELS} a side): lower --dpi`, '--dpi');
  }
  const r = new Resvg(svg, {
    fitTo: { mode: 'width', value: Math.max(1, widthPx) },
    background: '#ffffff',
    font: { loadSystemFonts: true, defaultFontFamily: 'DejaVu Serif' },
  });
  return r.render().asPng();
}
