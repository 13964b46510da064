import { GRAVITY } from '../quantities';
import { buoyancyFrequencySquared } from '../water/buoyancy';
import type { MethodInfo } from '../core/method';
import { caution, note, type Warning } from '../core/warning';
import { interpolateAt, type Profile } from './profile';

/** N² on the intervals between samples, at the interval mid-depths [1/s2]. */
export interface N2Profile {
  depth: number[];
  n2: number[];
}

/** Squared buoyancy frequency between consecutive samples, N² = (g/ρ̄) Δρ/Δd (depth positive down). */
export function n2Profile(p: Profile): N2Profile {
  const depth: number[] = [],
    n2: number[] = [];
  for (let i = 1; i < p.depth.length; i++) {
    depth.push((p.depth[i - 1] + p.depth[i]) / 2);
    n2.push(buoyancyFrequencySquared(p.density[i - 1], p.density[i], p.depth[i - 1], p.depth[i]));
  }
  return { depth, n2 };
}

/** |N²| below this counts as neutral [1/s2] (≈ 0.001 kg/m³ per m in fresh water; common practice, no source). */
export const NEUTRAL_N2 = 1e-6;

export type Stability = 'stable' | 'neutral' | 'unstable';

export interface StabilityFlag {
  top: number;
  bottom: number;
  n2: number;
  stability: Stability;
}

/** Static stability of each interval from the sign of N²; 'unstable' marks a density inversion. */
export function stabilityFlags(p: Profile): StabilityFlag[] {
  const { n2 } = n2Profile(p);
  return n2.map((v, i) => ({
    top: p.depth[i],
    bottom: p.depth[i + 1],
    n2: v,
    stability: v > NEUTRAL_N2 ? 'stable' : v < -NEUTRAL_N2 ? 'unstable' : 'neutral',
  }));
}

export const MIXED_LAYER_THRESHOLD: MethodInfo = {
  id: 'mixed-layer-density-threshold',
  title: 'Mixed-layer depth by a density threshold',
  source:
    'de Boyer Montégut, C., Madec, G., Fischer, A.S., Lazar, A., Iudicone, D. (2004). Mixed layer depth over the global ocean: ' +
    'an examination of profile data and a profile-based climatology. J. Geophys. Res. 109, C12003, §2.2 (Δσ = 0.03 kg/m³).',
  equation: 'MLD = shallowest depth where ρ(d) − ρ(d_ref) ≥ Δρ, d_ref the shallowest sample, Δρ = 0.03 kg/m³',
  validity: {},
};

/**
 * Mixed-layer depth [m]: the shallowest depth where density exceeds the shallowest sample's by Δρ,
 * interpolated linearly. Returns the bottom depth when the column is mixed throughout.
 */
export function mixedLayerDepth(p: Profile, deltaRho = 0.03): { value: number; mixedToBottom: boolean } {
  const ref = p.density[0];
  for (let i = 1; i < p.depth.length; i++) {
    if (p.density[i] - ref >= deltaRho) {
      const a = p.density[i - 1] - ref,
        b = p.density[i] - ref;
      const f = b === a ? 0 : (deltaRho - a) / (b - a);
      return {
        value: p.depth[i - 1] + Math.max(0, Math.min(1, f)) * (p.depth[i] - p.depth[i - 1]),
        mixedToBottom: false,
      };
    }
  }
  return { value: p.depth[p.depth.length - 1], mixedToBottom: true };
}

export const THERMOCLINE_MAX_GRADIENT: MethodInfo = {
  id: 'thermocline-max-gradient',
  title: 'Thermocline (pycnocline) depth at the maximum density gradient',
  source:
    'Read, J.S., Hamilton, D.P., Jones, I.D., Muraoka, K., Winslow, L.A., Kroiss, R., Wu, C.H., Gaiser, E. (2011). ' +
    'Derivation of lake mixing and stratification indices from high-resolution lake buoy data. Environ. Modell. Softw. 26, 1325–1336, §2.2 ' +
    '(depth of max dρ/dz; a gradient below 0.1 kg/m³ per m means no thermocline).',
  equation: 'd_th = mid-depth of the interval with the largest Δρ/Δd',
  validity: {},
};

/** Density gradient below which no thermocline is reported [kg/m3 per m] (Read et al. 2011). */
export const MIN_THERMOCLINE_GRADIENT = 0.1;

/** Thermocline depth [m] at the largest density gradient; `weak` when that gradient is below 0.1 kg/m³/m. */
export function thermoclineDepth(p: Profile): { value: number; gradient: number; weak: boolean } {
  let best = 0,
    bestGrad = -Infinity;
  for (let i = 1; i < p.depth.length; i++) {
    const g = (p.density[i] - p.density[i - 1]) / (p.depth[i] - p.depth[i - 1]);
    if (g > bestGrad) {
      bestGrad = g;
      best = i;
    }
  }
  return {
    value: (p.depth[best - 1] + p.depth[best]) / 2,
    gradient: bestGrad,
    weak: bestGrad < MIN_THERMOCLINE_GRADIENT,
  };
}

export const TWO_LAYER_FIT: MethodInfo = {
  id: 'two-layer-least-squares',
  title: 'Equivalent two-layer fit (least-squares step, mass-conserving)',
  source:
    'Least-squares segmentation of a profile into two constant segments: Hawkins, D.M. (1976). Point estimation of the ' +
    'parameters of piecewise regression models. Appl. Statist. 25(1), 51–57. The layer densities are the depth-weighted means, ' +
    'so the column mass ∫ρ dd is conserved exactly; g′ = g(ρ2 − ρ1)/ρ2 (Turner 1973 §1.2).',
  equation: 'h1 = argmin ∫(ρ − ρ_step)² dd; ρ1, ρ2 = depth-means above and below h1; g′ = g(ρ2 − ρ1)/ρ2',
  validity: {},
};

export interface TwoLayerFit {
  /** interface depth below the surface = upper-layer thickness (the upper layer reaches the surface) [m] */
  upperThickness: number;
  lowerThickness: number;
  rhoUpper: number;
  rhoLower: number;
  gPrime: number;
  warnings: Warning[];
}

/**
 * Reduces a profile to two homogeneous layers. The profile is resampled on a uniform grid of `cells` cells
 * (linear between samples); the interface minimises the squared deviation of the step from the profile.
 * Caution: a two-layer reduction overestimates first-mode internal wave speeds for smooth thermoclines.
 */
export function twoLayerFit(p: Profile, cells = 400): TwoLayerFit {
  const top = p.depth[0],
    bottom = p.depth[p.depth.length - 1],
    dz = (bottom - top) / cells;
  const rho = Array.from({ length: cells }, (_, i) => interpolateAt(p.depth, p.density, top + (i + 0.5) * dz));
  const s1 = [0],
    s2 = [0];
  for (const r of rho) {
    s1.push(s1[s1.length - 1] + r);
    s2.push(s2[s2.length - 1] + r * r);
  }
  const sse = (a: number, b: number) => s2[b] - s2[a] - (s1[b] - s1[a]) ** 2 / (b - a);
  let bestK = 1,
    best = Infinity;
  for (let k = 1; k < cells; k++) {
    const e = sse(0, k) + sse(k, cells);
    if (e < best - 1e-12) {
      best = e;
      bestK = k;
    }
  }
  const rhoUpper = (s1[bestK] - s1[0]) / bestK,
    rhoLower = (s1[cells] - s1[bestK]) / (cells - bestK);
  const warnings: Warning[] = [];
  const contrast = rhoLower - rhoUpper;
  if (contrast < 0.01)
    warnings.push(
      caution(
        'nearly-mixed',
        `The fitted layers differ by only ${contrast.toFixed(4)} kg/m³: the column is nearly mixed and a two-layer model is not meaningful.`,
      ),
    );
  warnings.push(
    note(
      'two-layer-overestimates-speed',
      'A two-layer reduction of a smooth profile overestimates first-mode internal wave speeds by a few % to ≈10 %; where the profile is measured, the vertical-mode solution is the reference.',
    ),
  );
  return {
    upperThickness: top + bestK * dz,
    lowerThickness: (cells - bestK) * dz,
    rhoUpper,
    rhoLower,
    gPrime: (GRAVITY * contrast) / rhoLower,
    warnings,
  };
}
