import { GRAVITY } from '../quantities';
import { positive, requireInRange } from '../core/range';
import type { MethodInfo, Scalar } from '../core/method';
import { caution, type Warning } from '../core/warning';

export type DensityReference = 'lower' | 'upper' | 'mean';

export const REDUCED_GRAVITY: MethodInfo = {
  id: 'reduced-gravity',
  title: 'Reduced gravity',
  source:
    'Turner, J.S. (1973). Buoyancy Effects in Fluids. Cambridge Univ. Press, §1.2; Simpson, J.E. (1997). Gravity Currents, 2nd ed., Ch. 1.',
  equation: 'g′ = g (ρ_lower − ρ_upper) / ρ_ref, ρ_ref = ρ_lower, ρ_upper or their mean',
  validity: {},
};

/**
 * Reduced gravity g′ = g (ρ_lower − ρ_upper)/ρ_ref.
 * The Boussinesq form uses any ρ_ref (the choice moves g′ by at most Δρ/ρ); non-Boussinesq methods need the
 * reference their source names (usually the ambient, i.e. lower, density for dense currents).
 * @param rhoUpper [kg/m3] lighter fluid; @param rhoLower [kg/m3] heavier fluid
 * @returns g′ [m/s2], negative when the "upper" fluid is denser (unstable)
 */
export function reducedGravity(rhoUpper: number, rhoLower: number, reference: DensityReference = 'lower'): Scalar {
  const r1 = requireInRange('rho_upper', rhoUpper, 'kg/m3', { min: 500, max: 3000 });
  const r2 = requireInRange('rho_lower', rhoLower, 'kg/m3', { min: 500, max: 3000 });
  const ref = reference === 'lower' ? r2 : reference === 'upper' ? r1 : (r1 + r2) / 2;
  const g = (GRAVITY * (r2 - r1)) / ref;
  const warnings: Warning[] = [];
  if (r2 < r1)
    warnings.push(
      caution(
        'unstable-layering',
        'rho_lower is less than rho_upper: the layering is unstable and g′ is negative.',
        'rho_lower',
      ),
    );
  if (Math.abs(r2 - r1) / ref > 0.1) {
    warnings.push(
      caution(
        'non-boussinesq',
        `Δρ/ρ = ${(Math.abs(r2 - r1) / ref).toFixed(3)} exceeds 0.1: the Boussinesq approximation does not hold; use methods that take the density ratio.`,
      ),
    );
  }
  return { value: g, unit: 'm/s2', method: REDUCED_GRAVITY.id, warnings };
}

export const DENSIMETRIC_FROUDE: MethodInfo = {
  id: 'densimetric-froude',
  title: 'Densimetric Froude number',
  source:
    'Fischer, H.B., List, E.J., Koh, R.C.Y., Imberger, J., Brooks, N.H. (1979). Mixing in Inland and Coastal Waters. Academic Press, §6.2.',
  equation: 'Fr = U / √(g′ L)',
  validity: {},
};

/** Densimetric Froude number Fr = U/√(g′L) [1]. g′ and L must be positive. */
export function densimetricFroude(velocity: number, gPrime: number, length: number): Scalar {
  const u = requireInRange('velocity', velocity, 'm/s', { min: -1e3, max: 1e3 });
  const g = requireInRange('g_prime', gPrime, 'm/s2', { ...positive, max: 20 });
  const l = requireInRange('length', length, 'm', { ...positive, max: 1e6 });
  const fr = Math.abs(u) / Math.sqrt(g * l);
  const warnings =
    fr < 1e-3
      ? [
          caution(
            'buoyancy-dominated',
            'Fr < 0.001: the flow is dominated by buoyancy; check the velocity.',
            'velocity',
          ),
        ]
      : [];
  return { value: fr, unit: '1', method: DENSIMETRIC_FROUDE.id, warnings };
}

/**
 * Squared buoyancy frequency between two depths, N² = (g/ρ̄)(ρ_deep − ρ_shallow)/(d_deep − d_shallow) [1/s2]
 * (depth positive down; stable when positive). Source: Turner (1973) §1.2; Gill (1982) §3.7.
 */
export function buoyancyFrequencySquared(
  rhoShallow: number,
  rhoDeep: number,
  depthShallow: number,
  depthDeep: number,
): number {
  return (GRAVITY * (rhoDeep - rhoShallow)) / (((rhoShallow + rhoDeep) / 2) * (depthDeep - depthShallow));
}
