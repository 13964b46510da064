import { requireInRange } from '../core/range';
import type { Warning } from '../core/warning';
import { GRAVITY } from '../quantities';
import type { Profile } from '../profile/profile';
import { waterDensity } from '../water/density';
import { DEFAULT_PLUNGE_FROUDE, mixAtPlunge, plungeDepthAkiyamaStefan1984 } from './plunge';
import { underflowEllisonTurner1959, type UnderflowResult } from './underflow';
import type { EntrainmentLaw } from './entrainment';

export interface RiverInflow {
  discharge: number;
  /** width at the plunge line and of the underflow [m] */
  width: number;
  temperature: number;
  salinity?: number;
  /** suspended sediment [kg/m3] */
  sediment?: number;
  bedSlope: number;
  plungeFroude?: number;
  /** plunge-line mixing ratio Φ [1], default 0.1 */
  initialMixing?: number;
  dragCoefficient?: number;
  law?: EntrainmentLaw;
  distanceToPoint?: number;
}

export interface RiverInflowResult {
  /** inflow density [kg/m3] (the profile's equation of state, with sediment) */
  inflowDensity: number;
  /** g′ between inflow and surface water, referenced to the surface (ambient) density [m/s2] */
  gPrime: number;
  plungeDepth: number;
  /** discharge, density and temperature after plunge-line mixing */
  mixed: { discharge: number; density: number; temperature: number };
  underflow: UnderflowResult;
  warnings: Warning[];
}

/**
 * Chains the plunge (Akiyama & Stefan 1984), plunge-line mixing and the entraining underflow (Ellison & Turner 1959) for a
 * river entering a reservoir whose profile is measured. g′ uses the surface water density as reference.
 */
export function riverInflowPath(p: Profile, r: RiverInflow): RiverInflowResult {
  const rho = waterDensity({
    temperature: r.temperature,
    salinity: r.salinity ?? 0,
    sediment: r.sediment ?? 0,
    eos: p.eos,
  });
  const rhoSurf = p.density[0];
  const gPrime = requireInRange('g_prime', (GRAVITY * (rho.value - rhoSurf)) / rhoSurf, 'm/s2', {
    min: 0,
    minExclusive: true,
  });
  const plunge = plungeDepthAkiyamaStefan1984(r.discharge, r.width, gPrime, r.plungeFroude ?? DEFAULT_PLUNGE_FROUDE);
  const mixed = mixAtPlunge(
    r.discharge,
    { density: rho.value, temperature: r.temperature },
    { density: rhoSurf, temperature: p.temperature[0] },
    r.initialMixing ?? 0.1,
  );
  const underflow = underflowEllisonTurner1959(p, {
    discharge: mixed.discharge,
    width: r.width,
    density: mixed.values.density,
    temperature: mixed.values.temperature,
    startDepth: Math.min(plunge.value, p.depth[p.depth.length - 1]),
    bedSlope: r.bedSlope,
    dragCoefficient: r.dragCoefficient,
    law: r.law,
    distanceToPoint: r.distanceToPoint,
  });
  return {
    inflowDensity: rho.value,
    gPrime,
    plungeDepth: plunge.value,
    mixed: { discharge: mixed.discharge, density: mixed.values.density, temperature: mixed.values.temperature },
    underflow,
    warnings: [...rho.warnings, ...plunge.warnings, ...mixed.warnings, ...underflow.warnings],
  };
}
