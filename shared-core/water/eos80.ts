import { requireInRange } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';

export const EOS80: MethodInfo = {
  id: 'density-eos80',
  title: 'UNESCO EOS-80 seawater density',
  source:
    'Millero, F.J., Poisson, A. (1981). International one-atmosphere equation of state of seawater. Deep-Sea Res. 28A, 625–629; ' +
    'Millero, F.J., Chen, C.T., Bradshaw, A., Schleicher, K. (1980) secant bulk modulus; as printed in ' +
    'Fofonoff, N.P., Millard, R.C. (1983). Algorithms for computation of fundamental properties of seawater. ' +
    'UNESCO Technical Papers in Marine Science 44, pp. 15–22.',
  equation: 'ρ(S,t,p) = ρ(S,t,0) / (1 − p/K(S,t,p)), with t on IPTS-68 and p in bar',
  validity: {
    salinity: { min: 0, max: 42, unit: 'PSU', note: 'range of the 1981 fit' },
    temperature: { min: -2, max: 40, unit: 'degC' },
    pressure: { min: 0, max: 10000, unit: 'dbar' },
  },
};

/** Density of standard mean ocean water at 1 atm, Bigg (1967), t on IPTS-68 [kg/m3]. */
function smowDensity(t: number): number {
  return 999.842594 + t * (6.793952e-2 + t * (-9.09529e-3 + t * (1.001685e-4 + t * (-1.120083e-6 + t * 6.536332e-9))));
}

/** One-atmosphere density ρ(S, t, 0), Millero & Poisson (1981); t on IPTS-68 [kg/m3]. */
function density1atm(s: number, t: number): number {
  const b = 8.24493e-1 + t * (-4.0899e-3 + t * (7.6438e-5 + t * (-8.2467e-7 + t * 5.3875e-9)));
  const c = -5.72466e-3 + t * (1.0227e-4 + t * -1.6546e-6);
  return smowDensity(t) + b * s + c * s ** 1.5 + 4.8314e-4 * s * s;
}

/** Secant bulk modulus K(S, t, p) [bar], p in bar, t on IPTS-68. */
function secantBulkModulus(s: number, t: number, p: number): number {
  const kw = 19652.21 + t * (148.4206 + t * (-2.327105 + t * (1.360477e-2 + t * -5.155288e-5)));
  const aw = 3.239908 + t * (1.43713e-3 + t * (1.16092e-4 + t * -5.77905e-7));
  const bw = 8.50935e-5 + t * (-6.12293e-6 + t * 5.2787e-8);
  const k0 =
    kw +
    s * (54.6746 + t * (-0.603459 + t * (1.09987e-2 + t * -6.167e-5))) +
    s ** 1.5 * (7.944e-2 + t * (1.6483e-2 + t * -5.3009e-4));
  const a = aw + s * (2.2838e-3 + t * (-1.0981e-5 + t * -1.6078e-6)) + 1.91075e-4 * s ** 1.5;
  const b = bw + s * (-9.9348e-7 + t * (2.0816e-8 + t * 9.1697e-10));
  return k0 + a * p + b * p * p;
}

/**
 * Seawater density, UNESCO EOS-80: ρ = ρ(S,t,0) / (1 − p/K(S,t,p)).
 * Temperature is converted from ITS-90 to IPTS-68 (t68 = 1.00024 t90) before use.
 * @param salinity practical salinity [PSU]
 * @param temperature in-situ temperature [degC, ITS-90]
 * @param pressure sea pressure [dbar]
 * @returns in-situ density [kg/m3]
 * @source Millero & Poisson (1981); Fofonoff & Millard (1983), UNESCO Tech. Pap. Mar. Sci. 44.
 * @validity S 0–42, t −2–40 °C, p 0–10 000 dbar.
 */
export function densitySeawaterEos80(salinity: number, temperature: number, pressure = 0): Scalar {
  const s = requireInRange('salinity', salinity, 'PSU', { min: 0, max: 70 });
  const t90 = requireInRange('temperature', temperature, 'degC', { min: -3, max: 60 });
  const p = requireInRange('pressure', pressure, 'dbar', { min: 0, max: 12000 });
  const t = 1.00024 * t90;
  const bar = p / 10;
  const rho = density1atm(s, t) / (1 - bar / secantBulkModulus(s, t, bar));
  return scalar(EOS80, rho, 'kg/m3', { salinity: s, temperature: t90, pressure: p });
}
