import { GRAVITY } from '../quantities';
import { positive, requireInRange } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';
import { note } from '../core/warning';

export const FISCHER_1972: MethodInfo = {
  id: 'estuarine-richardson-fischer-1972',
  title: 'Estuarine Richardson number (Fischer 1972)',
  source:
    'Fischer, H.B. (1972). Mass transport mechanisms in partially stratified estuaries. J. Fluid Mech. 53, 671–687; classes: Fischer, H.B., List, E.J., Koh, R.C.Y., Imberger, J., Brooks, N.H. (1979). Mixing in Inland and Coastal Waters, Academic Press, §7.2.',
  equation:
    'Ri_E = g′ Q_f / (W U_t³); strongly stratified above 0.8, well mixed below 0.08, partially mixed between (rules of thumb)',
  validity: {},
};

/** Plain-word stratification classes of an estuary, by Ri_E. */
export type EstuaryClass = 'strongly stratified' | 'partially mixed' | 'well mixed';
export const RICHARDSON_THRESHOLDS = { wellMixedBelow: 0.08, stratifiedAbove: 0.8 } as const;

export interface EstuarineRichardson {
  richardson: Scalar;
  estuaryClass: EstuaryClass;
}

/** Class of an estuary from Ri_E (Fischer et al. 1979, §7.2; rules of thumb). */
export function estuaryClass(ri: number): EstuaryClass {
  if (ri > RICHARDSON_THRESHOLDS.stratifiedAbove) return 'strongly stratified';
  if (ri < RICHARDSON_THRESHOLDS.wellMixedBelow) return 'well mixed';
  return 'partially mixed';
}

/**
 * Estuarine Richardson number Ri_E = g′Q_f/(W U_t³): buoyancy input by the river over tidal stirring.
 * @param gPrime [m/s2] sea vs river; @param riverDischarge [m3/s] Q_f; @param width [m] W;
 * @param tidalVelocity [m/s] U_t, root-mean-square tidal velocity
 * @returns Ri_E [1] and its class @source Fischer (1972); Fischer et al. (1979) §7.2.
 */
export function estuarineRichardsonFischer1972(
  gPrime: number,
  riverDischarge: number,
  width: number,
  tidalVelocity: number,
): EstuarineRichardson {
  const g = requireInRange('g_prime', gPrime, 'm/s2', { ...positive, max: GRAVITY });
  const q = requireInRange('river_discharge', riverDischarge, 'm3/s', { ...positive, max: 1e6 });
  const w = requireInRange('width', width, 'm', { ...positive, max: 1e6 });
  const u = requireInRange('tidal_velocity', tidalVelocity, 'm/s', { min: 1e-3, max: 10 });
  const ri = (g * q) / (w * u ** 3);
  const extra = [
    note(
      'rule-of-thumb-classes',
      'The class thresholds 0.08 and 0.8 are rules of thumb (Fischer et al. 1979); the transition is gradual.',
    ),
  ];
  return { richardson: scalar(FISCHER_1972, ri, '1', {}, extra), estuaryClass: estuaryClass(ri) };
}
