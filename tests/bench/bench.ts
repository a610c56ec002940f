// Shared pieces of the benchmarks: a timer that reports medians, and the shape of a suite's result.
// Benchmarks print figures; they are never asserted as timed tests.

export interface BenchFigure {
  /** What was measured, in words. */
  readonly label: string;
  /** Numbers, each named with its unit (e.g. { ninefoldMs: 1.2, pariMs: 0.8, ratio: 1.5 }). */
  readonly values: Record<string, number | string>;
}

export interface BenchSuite {
  readonly name: string;
  run(): Promise<BenchFigure[]>;
}

/** Median wall time in ms of `fn` over `reps` runs after `warm` warm-up runs. */
export function medianMs(fn: () => unknown, reps = 7, warm = 2): number {
  for (let i = 0; i < warm; i++) fn();
  const times: number[] = [];
  for (let i = 0; i < reps; i++) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
  }
  return median(times);
}

export function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

export function percentile(xs: readonly number[], p: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor((p / 100) * s.length))];
}
