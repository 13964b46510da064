import type { MethodInfo } from '../core/method';
import { interpolateAt, profileColumns, type Profile } from '../profile/profile';
import {
  withdrawalLimitsBohanGrace1973,
  type ProfileWithdrawal,
  type ProfileWithdrawalOptions,
  type SideLimit,
} from './measured';

export const WITHDRAWAL_VELOCITY: MethodInfo = {
  id: 'withdrawal-velocity-bohan-grace1973',
  title: 'Velocity distribution in the withdrawal layer and flow-weighted outflow quality',
  source:
    'Bohan, J.P., Grace, J.L. Jr. (1973). Selective withdrawal from man-made lakes. Tech. Rep. H-73-4, U.S. Army Engineer ' +
    'Waterways Experiment Station (normalised velocity v/v_max = 1 − (Δρ/Δρ_limit)² on each side of the port; form from memory). ' +
    'Outflow quality: conservation of mass and of each constituent, c̄ = ∫ v c dd / ∫ v dd (Fischer et al. 1979, Ch. 6).',
  equation:
    'v/v_max = 1 − max((Δρ/Δρ_limit)², (a/a_limit)²), Δρ = |ρ(d) − ρ_port|, a = |d − d_port| (the two terms coincide in linear stratification); a side cut by the surface or the bed: v/v_max = 1 − (a/δ)²; c̄ = ∫ v c dd / ∫ v dd',
  validity: {},
};

/**
 * Normalised velocity v/v_max in [0, 1] at depth d for a port's withdrawal layer:
 * 1 − max((Δρ/Δρ_limit)², (a/a_limit)²). In linear stratification both terms are the same parabola (Bohan & Grace 1973);
 * in neutral (mixed) water the distance term keeps the velocity falling away from the port, so a port drawing from a
 * mixed layer does not draw its far end as strongly as its own level. A side stopped by the surface or the bed falls off
 * over its unbounded half-thickness, but at most over the longer of the two sides (so neutral water, whose unbounded
 * half-thickness is infinite, is weighted like the layer on the other side; continuous as N → 0).
 */
export function relativeVelocity(p: Profile, w: ProfileWithdrawal, d: number): number {
  if (d < w.topDepth || d > w.bottomDepth) return 0;
  const [side, other]: SideLimit[] = d < w.portDepth ? [w.upper, w.lower] : [w.lower, w.upper];
  const a = Math.abs(d - w.portDepth);
  if (side.distance === 0) return 1;
  const reach = side.cutByBoundary
    ? Math.min(side.unboundedHalfThickness, Math.max(side.distance, other.distance))
    : side.distance;
  let s = 1 - (a / reach) ** 2;
  if (!side.cutByBoundary && side.densityDifference > 0) {
    const rhoPort = interpolateAt(p.depth, p.density, w.portDepth);
    const drho = Math.abs(interpolateAt(p.depth, p.density, d) - rhoPort);
    s = Math.min(s, 1 - (drho / side.densityDifference) ** 2);
  }
  return Math.min(1, Math.max(0, s));
}

/** Chart data of one port's withdrawal: velocity shape and flux per unit depth against depth. */
export interface WithdrawalVelocityProfile {
  /** depths from the upper to the lower limit [m], positive down */
  depth: number[];
  /** v/v_max [1] */
  relativeVelocity: number[];
  /** outflow drawn per metre of depth [m2/s]; its integral over depth is the port discharge */
  fluxPerDepth: number[];
  limits: ProfileWithdrawal;
}

const GRID = 401;

/**
 * Velocity distribution of one port's withdrawal layer on a measured profile, for charts and for the outflow quality.
 * @param p profile; @param portDepth [m]; @param discharge [m3/s]
 * @returns depth [m], v/v_max [1], flux per depth [m2/s] (trapezoid integral = discharge)
 */
export function withdrawalVelocityProfile(
  p: Profile,
  portDepth: number,
  discharge: number,
  o: ProfileWithdrawalOptions,
): WithdrawalVelocityProfile {
  const limits = withdrawalLimitsBohanGrace1973(p, portDepth, discharge, o);
  const span = limits.bottomDepth - limits.topDepth;
  if (!(span > 0)) return { depth: [portDepth], relativeVelocity: [1], fluxPerDepth: [0], limits };
  // uniform grid plus the profile samples and the port, so the trapezoid rule never straddles a kink of the profile
  const nodes = [
    ...Array.from({ length: GRID }, (_, i) => limits.topDepth + (span * i) / (GRID - 1)),
    portDepth,
    ...p.depth.filter((d) => d > limits.topDepth && d < limits.bottomDepth),
  ];
  const depth = [...new Set(nodes.sort((a, b) => a - b))];
  const rel = depth.map((d) => relativeVelocity(p, limits, d));
  const area = trapezoid(depth, rel);
  const fluxPerDepth = rel.map((s) => (area > 0 ? (discharge * s) / area : 0));
  return { depth, relativeVelocity: rel, fluxPerDepth, limits };
}

function trapezoid(x: readonly number[], y: readonly number[]): number {
  let s = 0;
  for (let i = 1; i < x.length; i++) s += 0.5 * (y[i] + y[i - 1]) * (x[i] - x[i - 1]);
  return s;
}

/** Flow-weighted value of one profile column in a port's outflow. */
export interface OutflowColumn {
  name: string;
  unit: string;
  value: number;
}

export interface PortOutflow {
  portDepth: number;
  discharge: number;
  /** flow-weighted temperature [degC] and density [kg/m3] */
  temperature: number;
  density: number;
  /** every profile column (temperature, salinity, sediment, density and the extras), flow-weighted */
  columns: OutflowColumn[];
  limits: ProfileWithdrawal;
  warnings: string[];
}

/**
 * Flow-weighted quality of one port's outflow: c̄ = ∫ v c dd / ∫ v dd for every column of the profile.
 * A closed port (discharge 0) reports the values at the port depth.
 */
export function portOutflow(
  p: Profile,
  portDepth: number,
  discharge: number,
  o: ProfileWithdrawalOptions,
): PortOutflow {
  const v = withdrawalVelocityProfile(p, portDepth, discharge, o);
  const weight = trapezoid(v.depth, v.relativeVelocity);
  const columns = profileColumns(p).map((c) => {
    const at = (d: number) => interpolateAt(p.depth, c.values, d);
    const value =
      weight > 0
        ? trapezoid(
            v.depth,
            v.depth.map((d, i) => v.relativeVelocity[i] * at(d)),
          ) / weight
        : at(portDepth);
    return { name: c.name, unit: c.unit, value };
  });
  const get = (name: string) => columns.find((c) => c.name === name)!.value;
  return {
    portDepth,
    discharge,
    temperature: get('temperature'),
    density: get('density'),
    columns,
    limits: v.limits,
    warnings: v.limits.warnings,
  };
}
