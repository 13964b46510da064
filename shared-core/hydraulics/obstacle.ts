import { requireInRange } from '../core/range';
import { note, outsideValidity, type Warning } from '../core/warning';
import type { MethodInfo } from '../core/method';

export const STRATIFIED_OBSTACLE_FLOW: MethodInfo = {
  id: 'stratified-obstacle-flow',
  title: 'Uniformly stratified flow over an obstacle: Froude numbers, blocking and lee-wave length',
  source:
    'Blocking: Sheppard, P.A. (1956). Airflow over mountains. Q. J. R. Meteorol. Soc. 82, 528–529 (energy argument: fluid from below ' +
    'the dividing streamline H_s = h(1 − U/(Nh)) cannot pass over; blocked when Nh/U > 1), confirmed in towing-tank experiments by ' +
    'Snyder, W.H., Thompson, R.S., Eskridge, R.E., Lawson, R.E., Castro, I.P., Lee, J.T., Hunt, J.C.R., Ogawa, Y. (1985). J. Fluid Mech. ' +
    '152, 249–288. Lee waves: Baines, P.G. (1995). Topographic Effects in Stratified Flows. Cambridge Univ. Press, Ch. 5 ' +
    '(λ = 2πU/N; in a channel of depth H, mode-n lee waves need U/(NH) < 1/(nπ), λ_n = 2π/√(N²/U² − (nπ/H)²)); Gill (1982) §8.8.',
  equation: 'Fr_h = U/(Nh); Fr_H = U/(NH); blocked when Nh/U > 1; H_s = h(1 − Fr_h); λ = 2πU/N',
  validity: {},
};

/** Screening description of uniformly stratified flow (constant U and N) over a 2-D or isolated obstacle. */
export interface ObstacleFlow {
  /** obstacle Froude number U/(N h) [1] */
  froude: number;
  /** depth Froude number U/(N H) [1] */
  froudeDepth: number;
  /** Nh/U [1] (the inverse obstacle Froude number) */
  nondimensionalHeight: number;
  blocked: boolean;
  /** height of the dividing streamline above the base, h(1 − U/(Nh)), 0 when not blocked [m] */
  dividingStreamlineHeight: number;
  /** lee-wave length 2πU/N [m] */
  leeWavelength: number;
  /** mode-1 lee-wave length in a channel of depth H, undefined when U/(NH) ≥ 1/π [m] */
  channelLeeWavelength?: number;
  method: string;
  warnings: Warning[];
}

/**
 * Stratified flow over an obstacle.
 * @param velocity [m/s] U upstream; @param buoyancyFrequency [1/s] N; @param obstacleHeight [m] h; @param depth [m] H (total)
 * @returns Froude numbers [1], blocking, dividing-streamline height [m], lee-wave lengths [m]
 * @source Sheppard (1956); Snyder et al. (1985); Baines (1995) Ch. 5
 * @validity uniform U and N, inviscid; the dividing-streamline criterion was tested on 3-D hills (Snyder et al. 1985); for long 2-D ridges upstream blocking also begins at Nh/U of order 1 (Baines 1995)
 */
export function stratifiedObstacleFlow(
  velocity: number,
  buoyancyFrequency: number,
  obstacleHeight: number,
  depth: number,
): ObstacleFlow {
  const U = requireInRange('velocity', velocity, 'm/s', { min: 1e-6, max: 100 });
  const N = requireInRange('buoyancy_frequency', buoyancyFrequency, '1/s', { min: 1e-6, max: 1 });
  const H = requireInRange('depth', depth, 'm', { min: 1e-3, max: 11000 });
  const h = requireInRange('obstacle_height', obstacleHeight, 'm', { min: 1e-3, max: H, maxExclusive: true });
  const froude = U / (N * h),
    froudeDepth = U / (N * H);
  const blocked = froude < 1;
  const kz1 = Math.PI / H;
  const kx2 = (N / U) ** 2 - kz1 ** 2;
  const warnings: Warning[] = [];
  if (kx2 <= 0)
    warnings.push(
      note(
        'no-channel-lee-waves',
        `U/(NH) = ${froudeDepth.toPrecision(3)} ≥ 1/π: the flow is faster than the first internal mode, so no stationary lee waves fit in the depth; 2πU/N is only the deep-water scale.`,
      ),
    );
  if (h > 0.5 * H)
    warnings.push(
      outsideValidity(
        'obstacle-fills-depth',
        'The obstacle fills more than half the depth: the flow is controlled by the constriction (two-layer or channel hydraulics), beyond this screening.',
        'obstacle_height',
      ),
    );
  return {
    froude,
    froudeDepth,
    nondimensionalHeight: 1 / froude,
    blocked,
    dividingStreamlineHeight: blocked ? h * (1 - froude) : 0,
    leeWavelength: (2 * Math.PI * U) / N,
    channelLeeWavelength: kx2 > 0 ? (2 * Math.PI) / Math.sqrt(kx2) : undefined,
    method: STRATIFIED_OBSTACLE_FLOW.id,
    warnings,
  };
}
