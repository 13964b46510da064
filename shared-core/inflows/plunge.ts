import { nonNegative, positive, requireInRange } from '../core/range';
import type { Warning } from '../core/warning';
import { scalar, validityWarnings, type MethodInfo, type Scalar } from '../core/method';

export const PLUNGE_AKIYAMA_STEFAN_1984: MethodInfo = {
  id: 'plunge-depth-akiyama-stefan1984',
  title: 'Plunge depth of a dense river inflow',
  source:
    'Akiyama, J., Stefan, H.G. (1984). Plunging flow into a reservoir: theory. J. Hydraul. Eng. 110(4), 484–499 (plunge densimetric ' +
    'Froude number F_p = q/√(g′h_p³), eq. for h_p); default F_p = 0.5 ⇔ h_p = 1.6 (q²/g′)^⅓ as given by Fischer, H.B., List, E.J., ' +
    'Koh, R.C.Y., Imberger, J., Brooks, N.H. (1979). Mixing in Inland and Coastal Waters, Academic Press, Ch. 6.',
  equation: 'h_p = (q² / (g′ F_p²))^⅓, q = Q/B',
  validity: {
    plunge_froude: {
      min: 0.2,
      max: 0.8,
      unit: '1',
      note: 'range of laboratory and field plunge Froude numbers',
    },
  },
  provenance:
    'The plunge coefficient 1.6 and the Froude-number range are as quoted in the cited works; not compared with the original data.',
};

/** Default plunge densimetric Froude number (Fischer et al. 1979, h_p ≈ 1.6 (q²/g′)^⅓). */
export const DEFAULT_PLUNGE_FROUDE = 0.5;

/**
 * Depth at which a denser river inflow plunges beneath the reservoir surface.
 * h_p = (q²/(g′F_p²))^⅓ with q = Q/B.
 * @param discharge [m3/s]; @param width [m] of the inflow channel at the plunge line; @param gPrime [m/s2] between inflow and surface water
 * @param plungeFroude [1] plunge densimetric Froude number, default 0.5
 * @returns [m] plunge depth
 * @source Akiyama & Stefan (1984); Fischer et al. (1979)
 * @validity 0.2 ≤ F_p ≤ 0.8; a gently sloping, prismatic approach channel
 */
export function plungeDepthAkiyamaStefan1984(
  discharge: number,
  width: number,
  gPrime: number,
  plungeFroude = DEFAULT_PLUNGE_FROUDE,
): Scalar {
  const q =
    requireInRange('discharge', discharge, 'm3/s', { ...positive, max: 1e5 }) /
    requireInRange('width', width, 'm', { ...positive, max: 1e5 });
  const g = requireInRange('g_prime', gPrime, 'm/s2', { ...positive, max: 20 });
  const fp = requireInRange('plunge_froude', plungeFroude, '1', { ...positive, max: 5 });
  return scalar(PLUNGE_AKIYAMA_STEFAN_1984, Math.cbrt((q * q) / (g * fp * fp)), 'm', { plunge_froude: fp });
}

export const PLUNGE_INITIAL_MIXING: MethodInfo = {
  id: 'plunge-initial-mixing',
  title: 'Initial mixing of the inflow with reservoir water at the plunge line',
  source:
    'Akiyama, J., Stefan, H.G. (1984). Plunging flow into a reservoir: theory. J. Hydraul. Eng. 110(4), 484–499 (initial mixing ' +
    'ratio Φ = entrained / inflow discharge at the plunge line); Fischer et al. (1979) Ch. 6. Conservation of mass and constituents. ' +
    'Default Φ = 0.1 (measured values scatter between about 0 and 0.3).',
  equation: 'Q_u = (1 + Φ) Q_in; c_u = (c_in + Φ c_surface) / (1 + Φ) for density, temperature and every constituent',
  validity: {
    initial_mixing: { min: 0, max: 0.5, unit: '1', note: 'reported range of plunge-line mixing' },
  },
  provenance:
    'The default Φ = 0.1 and its range are typical values as commonly quoted; not compared with a primary data set.',
};

export interface MixedInflow {
  /** discharge after the plunge-line mixing [m3/s] */
  discharge: number;
  /** the mixed value of each given property (same keys as the input) */
  values: Record<string, number>;
  warnings: Warning[];
}

/**
 * Mixes surface water into the inflow at the plunge line with ratio Φ (entrained / inflow discharge).
 * @param discharge [m3/s] inflow; @param inflow property values (density [kg/m3], temperature [degC], …)
 * @param surface the same properties of the reservoir water at the plunge line; @param mixing Φ [1]
 */
export function mixAtPlunge(
  discharge: number,
  inflow: Record<string, number>,
  surface: Record<string, number>,
  mixing = 0.1,
): MixedInflow {
  const q = requireInRange('discharge', discharge, 'm3/s', { ...positive, max: 1e5 });
  const phi = requireInRange('initial_mixing', mixing, '1', { ...nonNegative, max: 5 });
  const values: Record<string, number> = {};
  for (const [k, v] of Object.entries(inflow)) values[k] = (v + phi * (surface[k] ?? v)) / (1 + phi);
  return {
    discharge: q * (1 + phi),
    values,
    warnings: validityWarnings(PLUNGE_INITIAL_MIXING, { initial_mixing: phi }),
  };
}
