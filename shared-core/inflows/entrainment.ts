import { nonNegative, requireInRange } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';

export const ENTRAINMENT_ELLISON_TURNER_1959: MethodInfo = {
  id: 'entrainment-ellison-turner1959',
  title: 'Entrainment into a dense bottom current (Ellison & Turner 1959 data)',
  source:
    'Ellison, T.H., Turner, J.S. (1959). Turbulent entrainment in stratified flows. J. Fluid Mech. 6, 423–448 (laboratory data, Fig. 8); ' +
    'fitted as E = (0.08 − 0.1 Ri)/(1 + 5 Ri) for Ri < 0.8, E = 0 beyond, by Turner, J.S. (1986). Turbulent entrainment: the development ' +
    'of the entrainment assumption, and its application to geophysical flows. J. Fluid Mech. 173, 431–471.',
  equation: 'E = w_e/U = (0.08 − 0.1 Ri)/(1 + 5 Ri), Ri = g′h cosθ/U²; E = 0 for Ri ≥ 0.8',
  validity: { Ri: { min: 0, max: 0.8, unit: '1', note: 'range of the laboratory data' } },
  provenance:
    'The fitted form is as commonly quoted from Turner (1986); its equation number was not compared with the original.',
};

export const ENTRAINMENT_PARKER_1987: MethodInfo = {
  id: 'entrainment-parker1987',
  title: 'Entrainment into a dense bottom current (Parker et al. 1987)',
  source:
    'Parker, G., Garcia, M., Fukushima, Y., Yu, W. (1987). Experiments on turbidity currents over an erodible bed. ' +
    'J. Hydraul. Res. 25(1), 123–147 (entrainment relation): E = 0.075/(1 + 718 Ri^2.4)^0.5, fitted to their data and Ellison & Turner (1959).',
  equation: 'E = 0.075 / √(1 + 718 Ri^2.4)',
  validity: { Ri: { min: 0, max: 2, unit: '1', note: 'range of the laboratory data' } },
  provenance:
    'The relation is as commonly quoted from Parker et al. (1987); its equation number was not compared with the original.',
};

export type EntrainmentLaw = 'parker1987' | 'ellison-turner1959';
export const ENTRAINMENT_LAWS: readonly EntrainmentLaw[] = ['parker1987', 'ellison-turner1959'];

/**
 * Entrainment coefficient E = w_e/U of a dense current (Ellison & Turner 1959, Turner 1986 fit).
 * @param ri [1] bulk Richardson number g′h cosθ/U²; @returns E [1], 0 for Ri ≥ 0.8
 */
export function entrainmentEllisonTurner1959(ri: number): Scalar {
  const r = requireInRange('Ri', ri, '1', { ...nonNegative, max: 1e6 });
  return scalar(ENTRAINMENT_ELLISON_TURNER_1959, r >= 0.8 ? 0 : (0.08 - 0.1 * r) / (1 + 5 * r), '1', { Ri: r });
}

/**
 * Entrainment coefficient E = w_e/U of a dense current (Parker et al. 1987, eq. 17).
 * @param ri [1] bulk Richardson number; @returns E [1]
 */
export function entrainmentParker1987(ri: number): Scalar {
  const r = requireInRange('Ri', ri, '1', { ...nonNegative, max: 1e6 });
  return scalar(ENTRAINMENT_PARKER_1987, 0.075 / Math.sqrt(1 + 718 * r ** 2.4), '1', { Ri: r });
}

/** The entrainment law by name, without validity warnings (for integrations). */
export function entrainment(law: EntrainmentLaw, ri: number): number {
  return law === 'parker1987'
    ? 0.075 / Math.sqrt(1 + 718 * Math.max(0, ri) ** 2.4)
    : ri >= 0.8
      ? 0
      : (0.08 - 0.1 * ri) / (1 + 5 * ri);
}
