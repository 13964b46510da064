import { Worker } from 'node:worker_threads';
import type { BuoyantJetInput } from '../shared-core/jets/buoyant-jet';
import { prepareJetRun } from '../shared-core/jets/trace';
import { normalQuantile, seededRandom } from '../shared-core/uncertainty/sampling';
import { demoJetInput } from './demo';
import type { Measured } from './harness';

const DRAWS = 2000;
/** relative standard uncertainty of the exit velocity (the discharge) and of the effluent's density deficit */
const RELATIVE_SD = 0.03;

/** Seeded normal draws of (velocity, effluent density) around the demo jet. */
function drawInputs(input: BuoyantJetInput, count: number): [number, number][] {
  const random = seededRandom(20260914);
  const z = () => normalQuantile(Math.min(1 - 1e-9, Math.max(1e-9, random())));
  const deficit = prepareJetRun(input).rhoRef - input.effluentDensity; // against the ambient at the port
  return Array.from({ length: count }, () => [
    input.velocity * (1 + RELATIVE_SD * z()),
    input.effluentDensity - RELATIVE_SD * deficit * z(),
  ]);
}

function startWorker(input: BuoyantJetInput): Promise<Worker> {
  const worker = new Worker(new URL('./worker-boot.mjs', import.meta.url), {
    workerData: { module: './mc-worker.ts', input },
  });
  return new Promise((ready, fail) => {
    worker.once('message', () => ready(worker));
    worker.once('error', fail);
  });
}

const runOn = (worker: Worker, draws: [number, number][]) =>
  new Promise<number>((done, fail) => {
    worker.once('message', (m: { count: number }) => done(m.count));
    worker.once('error', fail);
    worker.postMessage(draws);
  });

/** Wall time [ms] of all draws split evenly over `count` warmed-up workers. */
async function timeWith(count: number, input: BuoyantJetInput, draws: [number, number][]): Promise<number> {
  const workers = await Promise.all(Array.from({ length: count }, () => startWorker(input)));
  const share = Math.ceil(draws.length / count);
  const t0 = performance.now();
  const done = await Promise.all(workers.map((w, i) => runOn(w, draws.slice(i * share, (i + 1) * share))));
  const elapsed = performance.now() - t0;
  await Promise.all(workers.map((w) => w.terminate()));
  if (done.reduce((a, b) => a + b, 0) !== draws.length) throw new Error('a Monte Carlo worker lost draws');
  return elapsed;
}

/**
 * Monte Carlo of the demo jet in node worker_threads: exit velocity and effluent density deficit each varied with a
 * 3 % standard uncertainty (seeded), the same draws on 1 and on 2 workers.
 */
export async function benchMonteCarlo(): Promise<Measured> {
  const input = demoJetInput();
  const draws = drawInputs(input, DRAWS);
  const one = await timeWith(1, input, draws);
  const two = await timeWith(2, input, draws);
  const perSecond = (DRAWS / two) * 1000;
  return {
    values: { mc_jet_samples_per_s: perSecond, mc_speedup_2_workers: one / two },
    lines: [
      `${'Monte Carlo, demo jet, worker threads'.padEnd(44)} ${DRAWS} draws: 1 worker ${(one / 1000).toFixed(2)} s, 2 workers ${(two / 1000).toFixed(2)} s   ${perSecond.toFixed(0)} draws/s, speed-up ×${(one / two).toFixed(2)}`,
    ],
  };
}
