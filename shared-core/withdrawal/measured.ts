import { InputError } from '../core/errors';
import { qty } from '../core/quantity-text';
import { nonNegative, positive, requireInRange } from '../core/range';
import type { MethodInfo } from '../core/method';
import { GRAVITY } from '../quantities';
import { brentRoot } from '../numerics/roots';
import { caution, type Warning } from '../core/warning';
import { profileBottom, type Profile } from '../profile/profile';
import { DepthCursor, firstIndex } from './depth-cursor';
import {
  halfThicknessLineSinkImberger1976,
  halfThicknessPointSinkImbergerPatterson1990,
  reachesHalfThickness,
  type WithdrawalRegime,
} from './layer';
import type { SinkKind } from './two-layer';

export const WITHDRAWAL_MEASURED_PROFILE: MethodInfo = {
  id: 'withdrawal-limits-bohan-grace1973',
  title: 'Withdrawal-layer limits on a measured (non-linear) profile',
  source:
    'Bohan, J.P., Grace, J.L. Jr. (1973). Selective withdrawal from man-made lakes; hydraulic laboratory investigation. ' +
    'Tech. Rep. H-73-4, U.S. Army Engineer Waterways Experiment Station, Vicksburg (each limit found separately from the density ' +
    'difference between the port and that limit); layer formulas of Imberger et al. (1976) and Imberger & Patterson (1990) with the ' +
    'mean buoyancy frequency between the port and the limit.',
  equation:
    'upper limit a_u: a_u = δ(N_u), N_u² = g (ρ_port − ρ(d_port − a_u)) / (ρ_port a_u); lower limit likewise with ρ(d_port + a_l) − ρ_port; ' +
    'δ(N) the linear-stratification half-thickness; a limit that would pass the surface or the bed stops there',
  validity: {},
};

export interface ProfileWithdrawalOptions {
  sink: SinkKind;
  /** slot width [m], line sink only */
  width?: number;
  /** reservoir length at the intake level [m]; without it the inertial regime is used */
  length?: number;
  /** depth of the bed at the intake [m]; default: the deepest profile sample */
  bottomDepth?: number;
  /** kinematic viscosity and thermal diffusivity [m2/s] for the viscous regime */
  nu?: number;
  kappa?: number;
}

/** One side (above or below the port) of a withdrawal layer on a measured profile. */
export interface SideLimit {
  /** distance from the port to the limit [m] */
  distance: number;
  /** |ρ(limit) − ρ(port)| [kg/m3] */
  densityDifference: number;
  /** mean buoyancy frequency between port and limit [1/s]; 0 where the water is neutral or unstable */
  n: number;
  /** half-thickness the formula gives for that N [m]; Infinity when N = 0; ≥ distance when cut */
  unboundedHalfThickness: number;
  /** the surface (upper side) or the bed (lower side) stops the layer */
  cutByBoundary: boolean;
  regime: WithdrawalRegime;
}

export interface ProfileWithdrawal {
  portDepth: number;
  discharge: number;
  /** depth of the upper and lower limits [m] */
  topDepth: number;
  bottomDepth: number;
  upper: SideLimit;
  lower: SideLimit;
  method: string;
  warnings: Warning[];
}

const BED_DEPTH = { ...positive, max: 11000 };
const DISCHARGE = { ...nonNegative, max: 1e5 };
const SLOT_WIDTH = { ...positive, max: 1e5 };
const RESERVOIR_LENGTH = { ...positive, max: 1e6 };

/** Validated options shared by the profile methods. */
export function checkProfileOptions(
  p: Profile,
  portDepth: number,
  discharge: number,
  o: ProfileWithdrawalOptions,
): { bed: number } {
  const bed = requireInRange('bottom_depth', o.bottomDepth ?? profileBottom(p), 'm', BED_DEPTH);
  requireInRange('port_depth', portDepth, 'm', { min: 0, max: bed });
  requireInRange('discharge', discharge, 'm3/s', DISCHARGE);
  if (o.sink === 'line') {
    if (o.width === undefined)
      throw new InputError('width', '(missing)', 'm', '> 0 m', 'a line sink needs the slot width across the channel');
    requireInRange('width', o.width, 'm', SLOT_WIDTH);
  }
  if (o.length !== undefined) requireInRange('reservoir_length', o.length, 'm', RESERVOIR_LENGTH);
  return { bed };
}

/** Half-thickness of the linear-stratification formula for the sink [m]; Infinity for N ≤ 0. */
export function linearHalfThickness(
  n: number,
  discharge: number,
  o: ProfileWithdrawalOptions,
): { d: number; regime: WithdrawalRegime } {
  if (!(n > 0)) return { d: Infinity, regime: 'inertial' };
  const r =
    o.sink === 'line'
      ? halfThicknessLineSinkImberger1976(discharge / (o.width as number), n, o.length, o.nu)
      : halfThicknessPointSinkImbergerPatterson1990(discharge, n, o.length, o.nu, o.kappa);
  return { d: r.halfThickness, regime: r.regime };
}

function sideLimit(
  p: Profile,
  portDepth: number,
  discharge: number,
  o: ProfileWithdrawalOptions,
  sign: -1 | 1,
  maxDistance: number,
): SideLimit {
  const cursor = new DepthCursor(p.depth);
  const rhoPort = cursor.seek(portDepth).value(p.density);
  // the scan walks away from the port and the root search stays in one step of it: the cursor moves a little each time
  const drho = (a: number) => sign * (cursor.seek(portDepth + sign * a).value(p.density) - rhoPort);
  const nAt = (a: number) => {
    const n2 = (GRAVITY * drho(a)) / (rhoPort * a);
    return n2 > 0 ? Math.sqrt(n2) : 0;
  };
  const side = (a: number, cut: boolean): SideLimit => {
    const n = nAt(a),
      lin = linearHalfThickness(n, discharge, o);
    return {
      distance: a,
      densityDifference: Math.abs(drho(a)),
      n,
      unboundedHalfThickness: lin.d,
      cutByBoundary: cut,
      regime: lin.regime,
    };
  };
  if (maxDistance <= 0)
    return {
      distance: 0,
      densityDifference: 0,
      n: 0,
      unboundedHalfThickness: 0,
      cutByBoundary: true,
      regime: 'inertial',
    };
  if (discharge === 0) return side(Math.min(maxDistance, 1e-9), false);
  const f = (a: number) => {
    const d = linearHalfThickness(nAt(a), discharge, o).d;
    return Number.isFinite(d) ? a - d : -maxDistance;
  };
  // the scan tests f(a) ≥ 0 in its root-free form; Brent's method then finds the root of f within the step
  const reached =
    o.sink === 'line'
      ? reachesHalfThickness('line', discharge / (o.width as number), o.length, o.nu)
      : reachesHalfThickness('point', discharge, o.length, o.nu, o.kappa);
  const steps = 400;
  const k = firstReachingStep(p.depth, portDepth, sign, maxDistance, steps, rhoPort, drho, reached);
  if (k === 0) return side(maxDistance, true);
  const a = (maxDistance * k) / steps,
    prev = k === 1 ? maxDistance * 1e-9 : (maxDistance * (k - 1)) / steps;
  return side(brentRoot(f, prev, a, 1e-9 * maxDistance) ?? a, false);
}

/**
 * The first of `steps` equal steps of distance from the port (1 … steps) at which the layer reaches, a ≥ δ(N), or 0 when
 * none does. Between two profile samples Δρ is linear in the distance, so over the steps inside one such stretch it is
 * largest at one end; as a ≥ δ(N) grows with a and with N, a stretch that cannot reach with its largest N² (taken at its
 * nearest step) at its farthest step is passed over whole, and the others are tested step by step.
 */
function firstReachingStep(
  depths: readonly number[],
  portDepth: number,
  sign: -1 | 1,
  maxDistance: number,
  steps: number,
  rhoPort: number,
  drho: (a: number) => number,
  reached: (a: number, n2: number) => boolean,
): number {
  const distanceAt = (k: number) => (maxDistance * k) / steps;
  const n2At = (a: number, densityDifference = drho(a)) => (GRAVITY * densityDifference) / (rhoPort * a);
  let j = sign > 0 ? firstIndex(depths, (d) => d > portDepth) : firstIndex(depths, (d) => d >= portDepth) - 1;
  for (let k = 1; k <= steps;) {
    const a0 = distanceAt(k);
    while (j >= 0 && j < depths.length && sign * (depths[j] - portDepth) <= a0) j += sign;
    const end = j >= 0 && j < depths.length ? sign * (depths[j] - portDepth) : Infinity;
    let last = k;
    while (last < steps && distanceAt(last + 1) <= end) last++;
    const n2Max = n2At(a0, Math.max(drho(a0), drho(distanceAt(last))));
    if (reached(distanceAt(last), n2Max)) {
      for (; k <= last; k++) if (reached(distanceAt(k), n2At(distanceAt(k)))) return k;
    } else k = last + 1;
  }
  return 0;
}

/**
 * Limits of the withdrawal layer of one port on a measured profile (Bohan & Grace 1973 procedure): each limit is where
 * the linear-stratification half-thickness, taken with the mean N between port and limit, equals the distance to it.
 * The surface and the bed stop a limit (flagged `cutByBoundary`); no correction for the squeezed flow is applied.
 * @param p measured profile; @param portDepth [m] below the surface; @param discharge [m3/s]
 * @returns limits [m], the N and density difference of each side, and warnings
 */
export function withdrawalLimitsBohanGrace1973(
  p: Profile,
  portDepth: number,
  discharge: number,
  o: ProfileWithdrawalOptions,
): ProfileWithdrawal {
  const { bed } = checkProfileOptions(p, portDepth, discharge, o);
  const upper = sideLimit(p, portDepth, discharge, o, -1, portDepth);
  const lower = sideLimit(p, portDepth, discharge, o, 1, bed - portDepth);
  const warnings: Warning[] = [];
  if (upper.cutByBoundary && portDepth > 0 && discharge > 0)
    warnings.push(
      caution(
        'layer-reaches-surface',
        `The withdrawal layer of the port at ${qty(portDepth, 'm')} reaches the surface: water is drawn from the surface down.`,
      ),
    );
  if (lower.cutByBoundary && bed > portDepth && discharge > 0)
    warnings.push(
      caution(
        'layer-reaches-bed',
        `The withdrawal layer of the port at ${qty(portDepth, 'm')} reaches the bed at ${qty(bed, 'm')}.`,
      ),
    );
  if (p.depth[0] > 0 && portDepth - upper.distance < p.depth[0])
    warnings.push(
      caution(
        'layer-above-shallowest-sample',
        `The layer reaches above the shallowest sample (${qty(p.depth[0], 'm')}); the shallowest values are used up to the surface.`,
      ),
    );
  return {
    portDepth,
    discharge,
    topDepth: portDepth - upper.distance,
    bottomDepth: portDepth + lower.distance,
    upper,
    lower,
    method: WITHDRAWAL_MEASURED_PROFILE.id,
    warnings: [...p.warnings, ...warnings],
  };
}
