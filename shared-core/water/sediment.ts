import { nonNegative, requireInRange } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';

export const SEDIMENT_MIXTURE: MethodInfo = {
  id: 'density-sediment-mixture',
  title: 'Density of a water–sediment suspension (volume-fraction mixture)',
  source:
    'Mass balance of a two-phase mixture: ρ_m = ρ_w + C (1 − ρ_w/ρ_s); e.g. Parker, G., Garcia, M., Fukushima, Y., ' +
    'Yu, W. (1987). Experiments on turbidity currents over an erodible bed. J. Hydraul. Res. 25(1), 123–147, §2.',
  equation: 'ρ_m = ρ_w + C (1 − ρ_w / ρ_s),  C = mass concentration of solids [kg/m³]',
  validity: {
    sediment: { min: 0, max: 100, unit: 'kg/m3', note: 'dilute suspension (volume fraction below ≈ 4 %) assumed' },
  },
};

/**
 * Added density of suspended sediment: returns the mixture density.
 * @param waterDensity density of the carrier water [kg/m3]
 * @param concentration suspended-solids mass concentration [kg/m3] (1 mg/L = 0.001 kg/m3)
 * @param particleDensity grain density [kg/m3], default 2650 (quartz)
 * @returns mixture density [kg/m3]
 * @source mixture mass balance, see SEDIMENT_MIXTURE.source.
 * @validity dilute suspensions, C ≤ 100 kg/m3 (warns above).
 */
export function densityWithSediment(waterDensity: number, concentration: number, particleDensity = 2650): Scalar {
  const rw = requireInRange('water density', waterDensity, 'kg/m3', { min: 900, max: 1300 });
  const c = requireInRange('sediment', concentration, 'kg/m3', { ...nonNegative, max: particleDensity });
  const rs = requireInRange('particle density', particleDensity, 'kg/m3', { min: rw, minExclusive: true, max: 8000 });
  return scalar(SEDIMENT_MIXTURE, rw + c * (1 - rw / rs), 'kg/m3', { sediment: c });
}
