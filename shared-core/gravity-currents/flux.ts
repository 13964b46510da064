import { GRAVITY } from '../quantities';
import { positive, requireInRange } from '../core/range';
import { scalar, validityWarnings, type MethodInfo, type Scalar } from '../core/method';
import { note, outsideValidity, type Warning } from '../core/warning';
import { powerLawPiece, sampleFront, type FrontPiece, type FrontSeries } from './front-pieces';
import { viscousFrontCoefficientHuppert1982, type SpreadingGeometry } from './viscous';

export const CONSTANT_FLUX_RELEASE: MethodInfo = {
  id: 'constant-flux-release',
  title: 'Front of a constant-flux release on a horizontal floor: inertial then viscous',
  source:
    'Inertial phase: box model of Huppert & Simpson (1980), J. Fluid Mech. 99, 785–799, with Fr = 1.19 and volume q t (planar) or Q t (axisymmetric); viscous phase: Huppert, H.E. (1982), J. Fluid Mech. 121, 43–58 (α = 1; r_N = 0.715 (g′Q³/3ν)^(1/8) t^(1/2)).',
  equation:
    'inertial: x = (Fr² g′q)^(1/3) t, r = (4Fr/(3√π))^(1/2) (g′Q)^(1/4) t^(3/4); viscous: x = η_N (g′q³/3ν)^(1/5) t^(4/5), r = η_N (g′Q³/3ν)^(1/8) t^(1/2); the front follows the slower of the two',
  validity: { g_prime: { max: 1, unit: 'm/s2', note: 'Boussinesq laboratory currents' } },
};

export interface ConstantFluxInput {
  /** [m/s2] */ gPrime: number;
  /** [m2/s] inflow per unit width (planar) or [m3/s] inflow (axisymmetric) */ flux: number;
  geometry: SpreadingGeometry;
  /** [m2/s] */ kinematicViscosity: number;
}

/**
 * Phases of a constant-flux current: the inertial box law, then Huppert's (1982) viscous law once it is
 * the slower (the laws cross at the transition time, so the position is continuous).
 * @returns the pieces of the front model (positions from the source [m], times [s])
 */
export function constantFluxRelease(input: ConstantFluxInput): { pieces: FrontPiece[]; warnings: Warning[] } {
  const g = requireInRange('g_prime', input.gPrime, 'm/s2', { ...positive, max: GRAVITY });
  const q = requireInRange('flux', input.flux, input.geometry === 'planar' ? 'm2/s' : 'm3/s', {
    ...positive,
    max: 1e6,
  });
  const nu = requireInRange('kinematic_viscosity', input.kinematicViscosity, 'm2/s', { ...positive, max: 1 });
  const eta = viscousFrontCoefficientHuppert1982(1, input.geometry).value;
  const fr = 1.19;
  const [kI, bI, kV, bV] =
    input.geometry === 'planar'
      ? [Math.cbrt(fr * fr * g * q), 1, eta * ((g * q ** 3) / (3 * nu)) ** 0.2, 0.8]
      : [
          Math.sqrt((4 * fr) / (3 * Math.sqrt(Math.PI))) * (g * q) ** 0.25,
          0.75,
          eta * ((g * q ** 3) / (3 * nu)) ** 0.125,
          0.5,
        ];
  const tCross = (kV / kI) ** (1 / (bI - bV));
  const xCross = kI * tCross ** bI;
  const pieces: FrontPiece[] = [
    { ...powerLawPiece('inertial', kI, bI), tStart: 0, xStart: 0 },
    { ...powerLawPiece('viscous', kV, bV), tStart: tCross, xStart: xCross },
  ];
  return { pieces, warnings: validityWarnings(CONSTANT_FLUX_RELEASE, { g_prime: g }) };
}

/** Front position [m], speed [m/s] and phase vs time [s] for a constant-flux release, with arrival times. */
export function constantFluxSeries(
  input: ConstantFluxInput,
  times: readonly number[],
  distances: readonly number[] = [],
): FrontSeries {
  const { pieces, warnings } = constantFluxRelease(input);
  return sampleFront(pieces, times, distances, warnings);
}

export const BRITTER_LINDEN_1980: MethodInfo = {
  id: 'slope-current-britter-linden-1980',
  title: 'Front speed of a constant-flux gravity current down a slope (Britter & Linden 1980)',
  source:
    'Britter, R.E., Linden, P.F. (1980). The motion of the front of a gravity current travelling down an incline. J. Fluid Mech. 99, 531–543 (U_f/(g′q)^(1/3) = 1.5 ± 0.2 for 5° ≤ θ ≤ 90°; decelerating head for θ ≤ 0.5°).',
  equation: 'U_f = 1.5 (g′ q)^(1/3), laboratory scatter ±0.2 (g′q)^(1/3); q inflow per unit width',
  validity: { slope: { min: 5, max: 90, unit: 'deg', note: 'slopes of the experiments with a steady head' } },
};

/** A slope-current front speed with its laboratory band [m/s]. */
export interface SlopeFrontSpeed extends Scalar {
  low: number;
  high: number;
}

/**
 * Britter & Linden (1980) steady front speed of a line-source current on a slope, nearly independent of
 * the slope because entrainment grows with it.
 * @param gPrime [m/s2] source reduced gravity; @param flux [m2/s] inflow per unit width; @param slopeDeg [deg]
 * @returns U_f [m/s] @validity 5° ≤ θ ≤ 90° (warning outside; head decelerates below about 0.5°).
 */
export function frontSpeedSlopeBritterLinden1980(gPrime: number, flux: number, slopeDeg: number): SlopeFrontSpeed {
  const g = requireInRange('g_prime', gPrime, 'm/s2', { ...positive, max: GRAVITY });
  const q = requireInRange('flux', flux, 'm2/s', { ...positive, max: 1e4 });
  const th = requireInRange('slope', slopeDeg, 'deg', { ...positive, max: 90 });
  const b = Math.cbrt(g * q);
  const extra =
    th <= 0.5
      ? [
          outsideValidity(
            'decelerating-head',
            'On slopes below about 0.5° the head decelerates with distance (Britter & Linden 1980): no steady speed.',
            'slope',
          ),
        ]
      : [];
  extra.push(
    note(
      'head-entrainment',
      'The head grows by entrainment as it runs down the slope; the front moves at about 60 % of the following flow.',
    ),
  );
  return { ...scalar(BRITTER_LINDEN_1980, 1.5 * b, 'm/s', { slope: th }, extra), low: 1.3 * b, high: 1.7 * b };
}

/** Front position vs time on a slope: x = U_f t ('steady' phase), with arrival times [s] at distances [m]. */
export function slopeCurrentSeries(
  gPrime: number,
  flux: number,
  slopeDeg: number,
  times: readonly number[],
  distances: readonly number[] = [],
): FrontSeries {
  const u = frontSpeedSlopeBritterLinden1980(gPrime, flux, slopeDeg);
  return sampleFront([{ phase: 'steady', tStart: 0, xStart: 0, c: u.value, m: 0 }], times, distances, u.warnings);
}
