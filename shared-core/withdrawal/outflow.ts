import type { MethodInfo } from '../core/method';
import type { Warning } from '../core/warning';
import { interpolateAt, type Profile } from '../profile/profile';
import { DepthCursor } from './depth-cursor';
import { LayerShape } from './layer-shape';
import type { ProfileWithdrawal, ProfileWithdrawalOptions } from './measured';
import { layerMean, portLayer, type PortLayer } from './port-layer';

export const WITHDRAWAL_VELOCITY: MethodInfo = {
  id: 'withdrawal-velocity-bohan-grace1973',
  title: 'Velocity distribution in the withdrawal layer and flow-weighted outflow quality',
  source:
    'Bohan, J.P., Grace, J.L. Jr. (1973). Selective withdrawal from man-made lakes. Tech. Rep. H-73-4, U.S. Army Engineer ' +
    'Waterways Experiment Station (normalised velocity v/v_max = 1 − (Δρ/Δρ_limit)² on each side of the port). ' +
    'Outflow quality: conservation of mass and of each constituent, c̄ = ∫ v c dd / ∫ v dd (Fischer et al. 1979, Ch. 6).',
  equation:
    'v/v_max = 1 − max((Δρ/Δρ_limit)², (a/a_limit)²), Δρ = |ρ(d) − ρ_port|, a = |d − d_port| (the two terms coincide in linear stratification); a side cut by the surface or the bed: v/v_max = 1 − (a/δ)²; c̄ = ∫ v c dd / ∫ v dd',
  validity: {},
  provenance:
    'The velocity shape is as commonly quoted from Bohan & Grace (1973); not compared with the original report.',
};

/** v/v_max in [0, 1] at depth d [m] of a port's withdrawal layer (the shape of LayerShape). */
export function relativeVelocity(p: Profile, w: ProfileWithdrawal, d: number): number {
  return new LayerShape(w, interpolateAt(p.depth, p.density, w.portDepth)).at(d, interpolateAt(p.depth, p.density, d));
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

/**
 * Velocity distribution of one port's withdrawal layer on a measured profile, for charts and for the outflow quality.
 * @param p profile; @param portDepth [m]; @param discharge [m3/s]; @param layer the port's layer, when already worked out
 * @returns depth [m], v/v_max [1], flux per depth [m2/s] (trapezoid integral = discharge)
 */
export function withdrawalVelocityProfile(
  p: Profile,
  portDepth: number,
  discharge: number,
  o: ProfileWithdrawalOptions,
  layer: PortLayer = portLayer(p, portDepth, discharge, o),
): WithdrawalVelocityProfile {
  const { limits, depth, rel, area } = layer;
  if (!(limits.bottomDepth - limits.topDepth > 0))
    return { depth: [portDepth], relativeVelocity: [1], fluxPerDepth: [0], limits };
  const fluxPerDepth = rel.map((s) => (area > 0 ? (discharge * s) / area : 0));
  return { depth, relativeVelocity: rel, fluxPerDepth, limits };
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
  /** every profile column (temperature, salinity, sediment, density and the extras), flow-weighted; only temperature
   * and density when asked for those alone */
  columns: OutflowColumn[];
  limits: ProfileWithdrawal;
  warnings: Warning[];
}

/** Which columns an outflow averages: every one, or temperature and density alone (what the optimiser needs). */
export type OutflowColumns = 'all' | 'temperature-density';

/** The profile's columns by name, read in place (profileColumns() copies them). */
function columnsOf(p: Profile, which: OutflowColumns): { name: string; unit: string; values: readonly number[] }[] {
  if (which === 'temperature-density')
    return [
      { name: 'temperature', unit: 'degC', values: p.temperature },
      { name: 'density', unit: 'kg/m3', values: p.density },
    ];
  return [
    { name: 'temperature', unit: 'degC', values: p.temperature },
    { name: 'salinity', unit: 'PSU', values: p.salinity },
    { name: 'sediment', unit: 'kg/m3', values: p.sediment },
    { name: 'density', unit: 'kg/m3', values: p.density },
    ...p.extra,
  ];
}

/**
 * Flow-weighted quality of one port's outflow: c̄ = ∫ v c dd / ∫ v dd for every column of the profile (trapezoid rule
 * on the layer's nodes, gathered into one weight per profile sample). A closed port (discharge 0) reports the values at
 * the port depth. @param layer the port's layer, when already worked out
 */
export function portOutflow(
  p: Profile,
  portDepth: number,
  discharge: number,
  o: ProfileWithdrawalOptions,
  which: OutflowColumns = 'all',
  layer: PortLayer = portLayer(p, portDepth, discharge, o),
): PortOutflow {
  const atPort = new DepthCursor(p.depth).seek(portDepth);
  const columns = columnsOf(p, which).map((c) => ({
    name: c.name,
    unit: c.unit,
    value: layer.area > 0 ? layerMean(layer, c.values) : atPort.value(c.values),
  }));
  return {
    portDepth,
    discharge,
    temperature: columns[0].value,
    density: columns.find((c) => c.name === 'density')!.value,
    columns,
    limits: layer.limits,
    warnings: layer.limits.warnings,
  };
}
