// Grid and axis ticks with labels that stay readable at every zoom: the step is 1, 2 or 5 times a power
// of ten chosen for about one tick per `spacingPx` pixels, each tick value is an integer multiple of the
// step (no accumulated rounding), and labels carry exactly the digits the step needs, switching to
// exponent notation for very large or very small steps (common practice for plot axes).

export interface Tick {
  readonly value: number;
  readonly label: string;
  /** True for every fifth (or second) tick, drawn a little stronger. */
  readonly major: boolean;
}

export function tickStep(worldPerPx: number, spacingPx = 90): { step: number; exponent: number; mantissa: 1 | 2 | 5 } {
  const raw = worldPerPx * spacingPx;
  const exponent = Math.floor(Math.log10(raw));
  const base = 10 ** exponent;
  const r = raw / base;
  const mantissa: 1 | 2 | 5 = r < 1.5 ? 1 : r < 3.5 ? 2 : 5;
  return { step: mantissa * base, exponent, mantissa };
}

/** Ticks in [lo, hi] for a scale of worldPerPx world units per pixel. */
export function ticksIn(lo: number, hi: number, worldPerPx: number, spacingPx = 90): Tick[] {
  if (!(hi > lo) || !(worldPerPx > 0)) return [];
  const { step, exponent, mantissa } = tickStep(worldPerPx, spacingPx);
  const k0 = Math.ceil(lo / step);
  const k1 = Math.floor(hi / step);
  const out: Tick[] = [];
  // Beyond 2^50 steps from zero consecutive ticks are no longer distinct doubles: no labels there.
  if (k1 - k0 > 1000 || Math.max(Math.abs(k0), Math.abs(k1)) > 2 ** 50) return out;
  const majorEvery = mantissa === 2 ? 5 : 2;
  for (let k = k0; k <= k1; k++) {
    out.push({ value: k * step, label: tickLabel(k, mantissa, exponent), major: k % majorEvery === 0 });
  }
  return out;
}

/** The label of k * mantissa * 10^exponent, with no digit the step does not justify. */
export function tickLabel(k: number, mantissa: number, exponent: number): string {
  const n = k * mantissa;
  if (n === 0) return '0';
  if (exponent >= 6 || exponent <= -5) {
    // n * 10^exponent with n an integer: write n's digits as a mantissa.
    const digits = Math.abs(n).toString();
    const e = exponent + digits.length - 1;
    const lead = digits.length > 1 ? `${digits[0]}.${digits.slice(1).replace(/0+$/, '')}` : digits;
    const m = lead.endsWith('.') ? lead.slice(0, -1) : lead;
    return `${n < 0 ? '−' : ''}${m}e${e}`;
  }
  let text = exponent >= 0 ? (n * 10 ** exponent).toFixed(0) : (n / 10 ** -exponent).toFixed(-exponent);
  if (text.includes('.')) text = text.replace(/0+$/, '').replace(/\.$/, '');
  return text.startsWith('-') ? `−${text.slice(1)}` : text;
}
