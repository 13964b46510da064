import { requireInRange } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';

export const TANAKA_2001: MethodInfo = {
  id: 'density-fresh-tanaka2001',
  title: 'Tanaka et al. (2001) density of air-free pure water',
  source:
    'Tanaka, M., Girard, G., Davis, R., Peuto, A., Bignell, N. (2001). Recommended table for the density of ' +
    'water between 0 °C and 40 °C based on recent experimental reports. Metrologia 38, 301–309, Eq. (1).',
  equation: 'ρ = a5 [1 − (t + a1)² (t + a2) / (a3 (t + a4))]',
  validity: { temperature: { min: 0, max: 40, unit: 'degC', note: 'range of the recommended table' } },
};

/**
 * Density of air-free pure water (SMOW isotopic composition) at 101.325 kPa.
 * ρ = a5 [1 − (t + a1)²(t + a2) / (a3 (t + a4))],
 * a1 = −3.983035 °C, a2 = 301.797 °C, a3 = 522528.9 °C², a4 = 69.34881 °C, a5 = 999.974950 kg/m³.
 * @param temperature [degC, ITS-90]
 * @returns density [kg/m3]
 * @source Tanaka et al. (2001), Metrologia 38, 301–309, Eq. (1).
 * @validity 0–40 °C (uncertainty ≈ 0.001 kg/m³); warns outside, refuses below −10 or above 100 °C.
 */
export function densityPureWaterTanaka2001(temperature: number): Scalar {
  const t = requireInRange('temperature', temperature, 'degC', { min: -10, max: 100 });
  const a1 = -3.983035,
    a2 = 301.797,
    a3 = 522528.9,
    a4 = 69.34881,
    a5 = 999.97495;
  const rho = a5 * (1 - ((t + a1) ** 2 * (t + a2)) / (a3 * (t + a4)));
  return scalar(TANAKA_2001, rho, 'kg/m3', { temperature: t });
}

export const KELL_1975: MethodInfo = {
  id: 'density-fresh-kell1975',
  title: 'Kell (1975) density of pure water',
  source:
    'Kell, G.S. (1975). Density, thermal expansivity, and compressibility of liquid water from 0 °C to 150 °C. ' +
    'J. Chem. Eng. Data 20(1), 97–105, Eq. (16).',
  equation:
    'ρ = (999.83952 + 16.945176 t − 7.9870401e-3 t² − 46.170461e-6 t³ + 105.56302e-9 t⁴ − 280.54253e-12 t⁵) / (1 + 16.879850e-3 t)',
  validity: { temperature: { min: 0, max: 150, unit: 'degC', note: 'range of the fit' } },
};

/**
 * Density of pure water at 1 atm, Kell (1975) rational polynomial on IPTS-68 (t68 = 1.00024 t90).
 * @param temperature [degC, ITS-90]
 * @returns density [kg/m3]
 * @source Kell (1975), J. Chem. Eng. Data 20, 97–105, Eq. (16); denominator coefficient 16.879850e-3.
 * @validity 0–150 °C.
 */
export function densityPureWaterKell1975(temperature: number): Scalar {
  const t90 = requireInRange('temperature', temperature, 'degC', { min: -10, max: 150 });
  const t = 1.00024 * t90;
  const num =
    999.83952 + t * (16.945176 + t * (-7.9870401e-3 + t * (-46.170461e-6 + t * (105.56302e-9 + t * -280.54253e-12))));
  return scalar(KELL_1975, num / (1 + 16.87985e-3 * t), 'kg/m3', { temperature: t90 });
}
