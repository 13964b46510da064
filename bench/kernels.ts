import { solveOde } from '../shared-core/numerics/ode';
import { makeProfile } from '../shared-core/profile/profile';
import { waterDensity } from '../shared-core/water/density';
import { bench, report } from './harness';
import { mathjsSolveOde } from './jet';

/** Text-table lines of the numerical kernels: our ODE solver and profile builder against general-purpose ones. */
export function benchKernels(): string[] {
  // ODE: a damped oscillator over 20 s to rtol 1e-8, same problem for both integrators.
  const rhs = (_t: number, y: readonly number[]) => [y[1], -y[0] - 0.1 * y[1]];
  const ours = bench('solveOde', () => solveOde(rhs, 0, [1, 0], 20, { rtol: 1e-8, atol: 1e-10 }));
  const base = bench('mathjs solveODE', () => mathjsSolveOde((t, y) => rhs(t, y), [0, 20], [1, 0], { tol: 1e-8 }));
  const check = solveOde(rhs, 0, [1, 0], 20, { rtol: 1e-8, atol: 1e-10 });

  // Profile: density of a 2000-row EOS-80 profile, ours vs the generic per-point dispatcher.
  const n = 2000;
  const depth = Array.from({ length: n }, (_, i) => i * 0.05);
  const temperature = depth.map((d) => 24 - 14 / (1 + Math.exp(-(d - 10))));
  const salinity = depth.map((d) => 30 + d * 0.02);
  return [
    report(
      'ODE, damped oscillator, 20 s, tol 1e-8',
      ours,
      base,
      `(${check.evaluations} evaluations, status ${check.status})`,
    ),
    report(
      'Profile of 2000 rows: validate + density',
      bench('makeProfile', () => makeProfile({ depth, temperature, salinity })),
      bench('per-point waterDensity', () =>
        depth.map((_, i) => waterDensity({ temperature: temperature[i], salinity: salinity[i] }).value),
      ),
      '(baseline skips validation)',
    ),
  ];
}
