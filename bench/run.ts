/**
 * `npm run bench`: speed of gprime's numerical kernels as ratios against a general-purpose baseline
 * measured in the same run (mathjs's solveODE and eigs, a dense generic approach). Times depend on the
 * machine; the ratios are what to compare between runs.
 */
import * as math from 'mathjs';
import { solveOde } from '../shared-core/numerics/ode';
import { makeProfile } from '../shared-core/profile/profile';
import { waterDensity } from '../shared-core/water/density';
import { verticalModesFromN2, constantN2Column } from '../shared-core/internal-waves/modes';
import { bench, report } from './harness';

const lines: string[] = [];

// 1. ODE: a damped oscillator over 20 s to rtol 1e-8, same problem for both integrators.
const rhs = (_t: number, y: readonly number[]) => [y[1], -y[0] - 0.1 * y[1]];
const ours = bench('solveOde', () => solveOde(rhs, 0, [1, 0], 20, { rtol: 1e-8, atol: 1e-10 }));
// mathjs types omit solveODE although the library exports it
const solveODE = (
  math as unknown as {
    solveODE: (f: (t: number, y: number[]) => number[], span: number[], y0: number[], o: object) => unknown;
  }
).solveODE;
const base = bench('mathjs solveODE', () => solveODE((t, y) => rhs(t, y), [0, 20], [1, 0], { tol: 1e-8 }));
const check = solveOde(rhs, 0, [1, 0], 20, { rtol: 1e-8, atol: 1e-10 });
lines.push(
  report(
    'ODE, damped oscillator, 20 s, tol 1e-8',
    ours,
    base,
    `(${check.evaluations} evaluations, status ${check.status})`,
  ),
);

// 2. Profile: density of a 2000-row EOS-80 profile, ours vs the generic per-point dispatcher.
const n = 2000;
const depth = Array.from({ length: n }, (_, i) => i * 0.05);
const temperature = depth.map((d) => 24 - 14 / (1 + Math.exp(-(d - 10))));
const salinity = depth.map((d) => 30 + d * 0.02);
lines.push(
  report(
    'Profile of 2000 rows: validate + density',
    bench('makeProfile', () => makeProfile({ depth, temperature, salinity })),
    bench('per-point waterDensity', () =>
      depth.map((_, i) => waterDensity({ temperature: temperature[i], salinity: salinity[i] }).value),
    ),
    '(baseline skips validation)',
  ),
);

// 3. Vertical modes: 3 modes on 120 cells, Sturm bisection vs a dense general eigen-solver (all modes).
const levels = 120,
  H = 40,
  N = 0.02;
const col = constantN2Column(N, H);
const dense = () => {
  const h = H / levels;
  const a = Array.from({ length: levels - 1 }, (_, i) =>
    Array.from({ length: levels - 1 }, (_, j) =>
      i === j ? 2 / (h * h * N * N) : Math.abs(i - j) === 1 ? -1 / (h * h * N * N) : 0,
    ),
  );
  return math.eigs(math.matrix(a)).values;
};
lines.push(
  report(
    `Vertical modes, ${levels} cells, 3 modes`,
    bench('verticalModesFromN2', () => verticalModesFromN2(col, H, { modes: 3, cells: levels })),
    bench('mathjs eigs (dense)', dense, 1500),
  ),
);

console.log('gprime benchmarks (median per call)\n' + lines.join('\n'));
