import { InputError } from '../core/errors';
import { nonNegative, requireInRange } from '../core/range';
import type { Scalar } from '../core/method';
import { caution, note } from '../core/warning';
import { densityPureWaterTanaka2001, TANAKA_2001 } from './fresh-density';
import { densitySeawaterEos80, EOS80 } from './eos80';
import { densitySeawaterTeos10, TEOS10_75 } from './teos10';
import { densityWithSediment, SEDIMENT_MIXTURE } from './sediment';
import { densityBrineSharqawy2010, referenceSalinityFromPractical } from './brine';
import { qty } from '../core/quantity-text';

export type EquationOfState = 'fresh' | 'eos80' | 'teos10';
export const EQUATIONS_OF_STATE: readonly EquationOfState[] = ['fresh', 'eos80', 'teos10'];
export const DENSITY_METHODS = { fresh: TANAKA_2001, eos80: EOS80, teos10: TEOS10_75 } as const;

export interface WaterState {
  /** [degC, ITS-90] */
  temperature: number;
  /** practical salinity [PSU], default 0 */
  salinity?: number;
  /** suspended sediment [kg/m3], default 0 */
  sediment?: number;
  /** sea pressure [dbar], default 0 (potential density referenced to the surface) */
  pressure?: number;
  /** default: fresh when salinity is 0, else eos80 */
  eos?: EquationOfState;
  /** grain density [kg/m3], default 2650 */
  particleDensity?: number;
}

/** The equation of state used when none is given: fresh for S = 0, EOS-80 otherwise. */
export function defaultEos(salinity: number): EquationOfState {
  return salinity > 0 ? 'eos80' : 'fresh';
}

/** The highest practical salinity of a seawater equation of state (its descriptor's validity) [PSU]. */
export function seawaterSalinityLimit(eos: 'eos80' | 'teos10'): number {
  return DENSITY_METHODS[eos].validity.salinity?.max ?? 42;
}

/** Brine beyond a seawater equation of state: Sharqawy et al. (2010) at the reference-composition salinity, 1 atm. */
function brineDensity(eos: 'eos80' | 'teos10', salinity: number, temperature: number, pressure: number): Scalar {
  const r = densityBrineSharqawy2010(referenceSalinityFromPractical(salinity), temperature);
  r.warnings.push(
    note(
      'brine-equation-of-state',
      `Salinity ${qty(salinity, 'PSU')} is beyond the ${qty(seawaterSalinityLimit(eos), 'PSU')} of ${DENSITY_METHODS[eos].title}: the density is from the brine correlation of Sharqawy et al. (2010), valid to 160 g/kg, ±0.1 %.`,
      'salinity',
    ),
  );
  if (temperature > 40)
    r.warnings.push(
      caution(
        'hot-brine-density',
        `Above ${qty(40, 'degC')} the brine correlation departs from the TEOS-10 Gibbs function of hot concentrates by more than its ±0.1 % (0.16 % at ${qty(60, 'degC')} and 70 g/kg): a density difference between brine and sea water carries that error.`,
        'temperature',
      ),
    );
  if (pressure > 0)
    r.warnings.push(
      note('pressure-ignored', 'The brine correlation is at atmospheric pressure; pressure is ignored.', 'pressure'),
    );
  return r;
}

/**
 * Density of fresh water, seawater or sediment-laden water: picks the chosen equation of state
 * (Tanaka et al. 2001, EOS-80 or TEOS-10; beyond their salinity range the brine correlation of Sharqawy et al. 2010)
 * and adds the suspended sediment by mixture mass balance.
 * The fresh-water formula ignores salinity and pressure, so it refuses a non-zero salinity.
 * @returns density [kg/m3] with the warnings of every method used
 */
export function waterDensity(state: WaterState): Scalar {
  const salinity = requireInRange('salinity', state.salinity ?? 0, 'PSU', { ...nonNegative, max: 70 });
  const sediment = requireInRange('sediment', state.sediment ?? 0, 'kg/m3', nonNegative);
  const pressure = requireInRange('pressure', state.pressure ?? 0, 'dbar', { ...nonNegative, max: 12000 });
  const eos = state.eos ?? defaultEos(salinity);
  let base: Scalar;
  if (eos === 'fresh') {
    if (salinity > 0)
      throw new InputError(
        'salinity',
        salinity,
        'PSU',
        '0 for eos = fresh',
        'the fresh-water equation of state takes no salt; choose eos80 or teos10',
      );
    base = densityPureWaterTanaka2001(state.temperature);
    if (pressure > 0)
      base.warnings.push(
        note('pressure-ignored', 'eos = fresh ignores pressure; the density is at 1 atm.', 'pressure'),
      );
  } else if ((eos === 'eos80' || eos === 'teos10') && salinity > seawaterSalinityLimit(eos)) {
    base = brineDensity(eos, salinity, state.temperature, pressure);
  } else if (eos === 'eos80') {
    base = densitySeawaterEos80(salinity, state.temperature, pressure);
  } else if (eos === 'teos10') {
    base = densitySeawaterTeos10(salinity, state.temperature, pressure);
  } else {
    throw new InputError(
      'eos',
      eos,
      '',
      EQUATIONS_OF_STATE.join(', '),
      `choose one of ${EQUATIONS_OF_STATE.join(', ')}`,
    );
  }
  if (sediment === 0) return base;
  const mix = densityWithSediment(base.value, sediment, state.particleDensity ?? 2650);
  return {
    value: mix.value,
    unit: 'kg/m3',
    method: `${base.method}+${SEDIMENT_MIXTURE.id}`,
    warnings: [...base.warnings, ...mix.warnings],
  };
}
