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
