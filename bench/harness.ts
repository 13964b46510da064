/** A tiny benchmark harness: runs a function repeatedly for a time budget and reports the median batch time. */
export interface BenchResult {
  name: string;
  /** median time per call [µs] */
  microseconds: number;
  calls: number;
}

export function bench(name: string, fn: () => unknown, budgetMs = 600): BenchResult {
  for (let i = 0; i < 3; i++) fn(); // warm up
  let batch = 1;
  for (;;) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) fn();
    if (performance.now() - t0 > 20) break;
    batch *= 2;
  }
  const samples: number[] = [];
  const end = performance.now() + budgetMs;
  while (performance.now() < end || samples.length < 5) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) fn();
    samples.push(((performance.now() - t0) * 1000) / batch);
  }
  samples.sort((a, b) => a - b);
  return { name, microseconds: samples[Math.floor(samples.length / 2)], calls: samples.length * batch };
}

/** Prints a comparison line: ours against the general-purpose baseline measured in the same run. */
export function report(task: string, ours: BenchResult, baseline: BenchResult, note = ''): string {
  const ratio = baseline.microseconds / ours.microseconds;
  const fmt = (r: BenchResult) =>
    `${r.microseconds < 1000 ? r.microseconds.toFixed(1) + ' µs' : (r.microseconds / 1000).toFixed(2) + ' ms'}`;
  return `${task.padEnd(44)} ours ${fmt(ours).padStart(10)}   baseline (${baseline.name}) ${fmt(baseline).padStart(10)}   speed-up ×${ratio.toFixed(1)}${note ? '   ' + note : ''}`;
}

/** Median wall time [ms] of `runs` single calls of fn, each on a fresh value from setup (not timed). */
export function medianMs<T>(runs: number, setup: (run: number) => T, fn: (value: T) => unknown): number {
  const times: number[] = [];
  for (let run = 0; run < runs; run++) {
    const value = setup(run);
    const t0 = performance.now();
    fn(value);
    times.push(performance.now() - t0);
  }
  return median(times);
}

/** The same for an asynchronous fn. */
export async function medianMsAsync(runs: number, fn: (run: number) => Promise<unknown>): Promise<number> {
  const times: number[] = [];
  for (let run = 0; run < runs; run++) {
    const t0 = performance.now();
    await fn(run);
    times.push(performance.now() - t0);
  }
  return median(times);
}

export function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** One measured number of the JSON output with its line of the text table. */
export interface Measured {
  values: Record<string, number>;
  lines: string[];
}

/** "12.3 ms" or "850 µs" */
export const ms = (t: number) => (t < 1 ? `${(t * 1000).toFixed(0)} µs` : `${t.toFixed(t < 100 ? 2 : 0)} ms`);
