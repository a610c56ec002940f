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

/**
 * Median CPU time in ms of one call of fn (process.cpuUsage, µs resolution). PARI's gettime() is CPU time
 * too, so a ratio to it is like for like even when other work shares the machine. Each of `reps` samples
 * runs fn repeatedly for at least `minMs` of CPU time (0: one call per sample) after `warm` warm-up calls.
 */
export function medianCpuMs(fn: () => unknown, reps = 5, warm = 1, minMs = 10): number {
  const cpu = () => {
    const u = process.cpuUsage();
    return (u.user + u.system) / 1000;
  };
  for (let i = 0; i < warm; i++) fn();
  const samples: number[] = [];
  for (let r = 0; r < reps; r++) {
    const t0 = cpu();
    let n = 0;
    let t = t0;
    do {
      fn();
      n++;
      t = cpu();
    } while (t - t0 < minMs);
    samples.push((t - t0) / n);
  }
  return median(samples);
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
