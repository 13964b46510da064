import { requireInRange } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';

export const SHARQAWY_2010: MethodInfo = {
  id: 'density-brine-sharqawy2010',
  title: 'Seawater and brine density at atmospheric pressure, to 160 g/kg',
  source:
    'Sharqawy, M.H., Lienhard, J.H. V, Zubair, S.M. (2010). Thermophysical properties of seawater: a review of existing ' +
    'correlations and data. Desalination and Water Treatment 16, 354–380, eq. (8) (fit to Isdale & Morris 1972 and Millero & ' +
    'Poisson 1981; pure water fitted to IAPWS-95); accuracy ±0.1 %.',
  equation:
    'ρ = ρ_w(t) + S(802.0 − 2.001 t + 1.677e-2 t² − 3.060e-5 t³ − 1.613e-5 S t²), ρ_w = 999.9 + 2.034e-2 t − 6.162e-3 t² + ' +
    '2.261e-5 t³ − 4.657e-8 t⁴; S in kg/kg (reference-composition salinity), t in °C (ITS-90), p = 0.1 MPa',
  validity: {
    absolute_salinity: { min: 0, max: 160, unit: 'g/kg', note: 'range of the fitted data' },
    temperature: { min: 0, max: 180, unit: 'degC', note: 'range of the fitted data' },
  },
  provenance:
    'Validity (0–180 °C, 0–160 g/kg) and accuracy (±0.1 %) as restated with the correlation in a published seawater ' +
    'property library (EES seawater functions); the coefficients agree with several independent public implementations; ' +
    'not compared with the printed paper.',
};

/** Practical salinity → reference-composition absolute salinity [g/kg] (Millero et al. 2008: S_R = 35.16504/35 · S_P). */
export const referenceSalinityFromPractical = (practicalSalinity: number) => (35.16504 / 35) * practicalSalinity;

/**
 * Density of seawater and concentrated brine at atmospheric pressure (Sharqawy, Lienhard & Zubair 2010, eq. 8).
 * ρ = ρ_w(t) + S (b1 + b2 t + b3 t² + b4 t³ + b5 S t²), S in kg/kg.
 * @param absoluteSalinity reference-composition salinity [g/kg]; @param temperature [degC, ITS-90]
 * @returns density [kg/m3] at 0.1 MPa
 * @source Sharqawy et al. (2010), Desalination and Water Treatment 16, 354–380, eq. (8)
 * @validity 0–160 g/kg, 0–180 °C (above the boiling point at the saturation pressure); accuracy ±0.1 %
 */
export function densityBrineSharqawy2010(absoluteSalinity: number, temperature: number): Scalar {
  const sa = requireInRange('absolute_salinity', absoluteSalinity, 'g/kg', { min: 0, max: 300 });
  const t = requireInRange('temperature', temperature, 'degC', { min: -3, max: 200 });
  const s = sa / 1000;
  const pure = 999.9 + t * (2.034e-2 + t * (-6.162e-3 + t * (2.261e-5 + t * -4.657e-8)));
  const salt = s * (802.0 + t * (-2.001 + t * (1.677e-2 + t * -3.06e-5)) - 1.613e-5 * s * t * t);
  return scalar(SHARQAWY_2010, pure + salt, 'kg/m3', { absolute_salinity: sa, temperature: t });
}
