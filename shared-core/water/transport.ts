import { requireInRange } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';
import { uniqueWarnings } from '../core/warning';
import { densityPureWaterKell1975 } from './fresh-density';

export const VISCOSITY_KESTIN_1978: MethodInfo = {
  id: 'viscosity-kestin1978',
  title: 'Kestin, Sokolov & Wakeham (1978) viscosity of liquid water',
  source:
    'Kestin, J., Sokolov, M., Wakeham, W.A. (1978). Viscosity of liquid water in the range −8 °C to 150 °C. ' +
    'J. Phys. Chem. Ref. Data 7(3), 941–948, Eq. (9), μ20 = 1.002 mPa·s; kinematic viscosity ν = μ/ρ with ρ from Kell (1975).',
  equation:
    'log10(μ/μ20) = (20 − t)/(t + 96) · [1.2378 − 1.303e-3 (20 − t) + 3.06e-6 (20 − t)² + 2.55e-8 (20 − t)³];  ν = μ/ρ',
  validity: { temperature: { min: 0, max: 100, unit: 'degC', note: 'pure water at atmospheric pressure' } },
};

/**
 * Dynamic viscosity of pure water [Pa s].
 * @param temperature [degC]
 * @source Kestin, Sokolov & Wakeham (1978), Eq. (9).
 * @validity 0–100 °C (the correlation was fitted from −8 to 150 °C; within 0.1 % of the CRC table here).
 */
export function dynamicViscosityKestin1978(temperature: number): Scalar {
  const t = requireInRange('temperature', temperature, 'degC', { min: -8, max: 150 });
  const d = 20 - t;
  const log10Ratio = (d / (t + 96)) * (1.2378 + d * (-1.303e-3 + d * (3.06e-6 + d * 2.55e-8)));
  return scalar(VISCOSITY_KESTIN_1978, 1.002e-3 * 10 ** log10Ratio, 'Pa s', { temperature: t });
}

/** Kinematic viscosity of pure water ν = μ/ρ [m2/s] (Kestin et al. 1978 with Kell 1975). */
export function kinematicViscosityWater(temperature: number): Scalar {
  const mu = dynamicViscosityKestin1978(temperature);
  const rho = densityPureWaterKell1975(temperature);
  return { ...mu, value: mu.value / rho.value, unit: 'm2/s' };
}

export const CONDUCTIVITY_RAMIRES_1995: MethodInfo = {
  id: 'thermal-conductivity-ramires1995',
  title: 'Ramires et al. (1995) thermal conductivity of water',
  source:
    'Ramires, M.L.V., Nieto de Castro, C.A., Nagasaka, Y., Nagashima, A., Assael, M.J., Wakeham, W.A. (1995). ' +
    'Standard reference data for the thermal conductivity of water. J. Phys. Chem. Ref. Data 24(3), 1377–1381, Eq. (3).',
  equation: 'k = 0.6065 [−1.48445 + 4.12292 (T/298.15) − 1.63866 (T/298.15)²] W/(m K), T in K',
  validity: { temperature: { min: 1, max: 97, unit: 'degC', note: '274–370 K at 0.1 MPa' } },
};

/** Thermal conductivity of water [W/(m K)], Ramires et al. (1995) Eq. (3); valid 274–370 K. */
export function thermalConductivityRamires1995(temperature: number): Scalar {
  const t = requireInRange('temperature', temperature, 'degC', { min: -5, max: 150 });
  const r = (t + 273.15) / 298.15;
  return scalar(CONDUCTIVITY_RAMIRES_1995, 0.6065 * (-1.48445 + 4.12292 * r - 1.63866 * r * r), 'W/(m K)', {
    temperature: t,
  });
}

export const CP_MILLERO_1973: MethodInfo = {
  id: 'specific-heat-millero1973',
  title: 'Millero et al. (1973) specific heat of water at 1 atm (S = 0 terms of EOS-80)',
  source:
    'Millero, F.J., Perron, G., Desnoyers, J.E. (1973). Heat capacity of seawater solutions from 5 to 35 °C and 0.5 to 22 ‰ ' +
    'chlorinity. J. Geophys. Res. 78, 4499–4507; pure-water terms as printed in Fofonoff & Millard (1983), UNESCO Tech. Pap. Mar. Sci. 44, p. 31.',
  equation: 'c_p0 = 4217.4 − 3.720283 t + 0.1412855 t² − 2.654387e-3 t³ + 2.093236e-5 t⁴ J/(kg K)',
  validity: { temperature: { min: 0, max: 40, unit: 'degC' } },
};

/** Specific heat capacity of fresh water at 1 atm [J/(kg K)]; Millero et al. (1973); valid 0–40 °C. */
export function specificHeatMillero1973(temperature: number): Scalar {
  const t = requireInRange('temperature', temperature, 'degC', { min: -5, max: 100 });
  const cp = 4217.4 + t * (-3.720283 + t * (0.1412855 + t * (-2.654387e-3 + t * 2.093236e-5)));
  return scalar(CP_MILLERO_1973, cp, 'J/(kg K)', { temperature: t });
}

/** Thermal diffusivity of water κ = k/(ρ c_p) [m2/s] from the three correlations above. */
export function thermalDiffusivityWater(temperature: number): Scalar {
  const k = thermalConductivityRamires1995(temperature);
  const rho = densityPureWaterKell1975(temperature);
  const cp = specificHeatMillero1973(temperature);
  const warnings = uniqueWarnings([...k.warnings, ...cp.warnings]);
  return { value: k.value / (rho.value * cp.value), unit: 'm2/s', method: 'thermal-diffusivity', warnings };
}
