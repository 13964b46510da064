import { parentPort, workerData } from 'node:worker_threads';
import { buoyantJetTrajectory, type BuoyantJetInput } from '../shared-core/jets/buoyant-jet';

/** A Monte Carlo worker: runs the demo jet for each drawn (velocity, effluent density) and returns how many ran. */
const base: BuoyantJetInput = workerData.input;
const port = parentPort!;

function runDraws(draws: readonly [number, number][]): number {
  let sum = 0;
  for (const [velocity, effluentDensity] of draws) {
    const t = buoyantJetTrajectory({ ...base, velocity, effluentDensity });
    sum += t.path.dilutionAverage[t.path.dilutionAverage.length - 1];
  }
  return sum;
}

runDraws(Array.from({ length: 300 }, () => [base.velocity, base.effluentDensity])); // warm up before saying ready
port.postMessage({ ready: true });
port.on('message', (draws: [number, number][]) => port.postMessage({ count: draws.length, sum: runDraws(draws) }));
