import { requireInRange } from '../core/range';
import type { MethodInfo } from '../core/method';
import { solveOde } from '../numerics/ode';

export type SpreadingGeometry = 'planar' | 'axisymmetric';

export const HUPPERT_1982: MethodInfo = {
  id: 'viscous-current-huppert-1982',
  title: 'Viscous gravity current on a horizontal floor (Huppert 1982)',
  source:
    'Huppert, H.E. (1982). The propagation of two-dimensional and axisymmetric viscous gravity currents over a rigid horizontal surface. J. Fluid Mech. 121, 43–58, eqs. (2.13)/(3.8) and the similarity solutions of §2–3.',
  equation:
    'planar x_N = η_N (g′ q³ / 3ν)^(1/5) t^((3α+1)/5); axisymmetric r_N = η_N (g′ Q³ / 3ν)^(1/8) t^((3α+1)/8); volume q t^α or Q t^α; η_N from the similarity ODE',
  validity: {
    alpha: {
      min: 0,
      max: 3,
      unit: '1',
      note: 'volume ∝ t^α; viscous regime late for α below 7/4 (planar) or 3 (axisymmetric)',
    },
  },
};

/** Result of the similarity-ODE shooting for the front coefficient η_N. */
export interface SimilarityCoefficient {
  /** η_N [1] */
  value: number;
  /** status of the ODE integration and its right-hand-side evaluations */
  status: string;
  evaluations: number;
}

/**
 * Front coefficient η_N of Huppert's (1982) viscous similarity solution, found by integrating
 * γφ − βyφ′ = y^(−j)(y^j φ³ φ′)′ inward from the front (φ³ ≈ 3βy_N(y_N − y)) and scaling by the volume.
 * α = 0: η_N = 1.411 (planar), 0.894 (axisymmetric); α = 1 axisymmetric: 0.715.
 * @param alpha [1] volume ∝ t^α; @param geometry planar (per unit width) or axisymmetric
 * @returns η_N [1] @source Huppert (1982) §2–3.
 */
export function viscousFrontCoefficientHuppert1982(alpha: number, geometry: SpreadingGeometry): SimilarityCoefficient {
  // the validity range is the hard range: the similarity ODE has no meaning beyond it
  const a = requireInRange('alpha', alpha, '1', HUPPERT_1982.validity.alpha);
  const j = geometry === 'planar' ? 0 : 1;
  const beta = j === 0 ? (3 * a + 1) / 5 : (3 * a + 1) / 8;
  const gamma = j === 0 ? a - beta : a - 2 * beta;
  const eps = 1e-7,
    yMin = 1e-7;
  const y0 = 1 - eps,
    phi0 = Math.cbrt(3 * beta * eps);
  // state [φ, w = y^j φ³ φ′, volume from the front inward]; independent variable s = 1 − y
  const rhs = (s: number, u: readonly number[]): number[] => {
    const y = 1 - s,
      [phi, w] = u;
    const yj = j === 0 ? 1 : y;
    const dphi = w / (yj * phi ** 3);
    return [-dphi, -yj * (gamma * phi - beta * y * dphi), (j === 0 ? 1 : 2 * Math.PI * y) * phi];
  };
  const w0 = (j === 0 ? 1 : y0) * -beta * y0 * phi0;
  const sol = solveOde(rhs, eps, [phi0, w0, 0], 1 - yMin, { rtol: 1e-10, atol: 1e-13, maxSteps: 100000 });
  const volume = sol.y[sol.y.length - 1][2];
  const value = volume ** (j === 0 ? -3 / 5 : -3 / 8);
  return { value, status: sol.status, evaluations: sol.evaluations };
}
