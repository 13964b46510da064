import { qty } from '../core/quantity-text';
import { create, erfDependencies } from 'mathjs';
import type { MethodInfo } from '../core/method';
import { nonNegative, positive, requireInRange } from '../core/range';
import { note, outsideValidity, type Warning } from '../core/warning';

const math = create({ erfDependencies });

/**
 * Typical 4/3-law coefficient α of ε = α L^(4/3): 0.01 cm^(2/3)/s (from memory of the value quoted by
 * Fischer et al. 1979 ch. 9), i.e. 0.01 · 0.01^(2/3) ≈ 4.64e-4 m^(2/3)/s.
 */
export const DEFAULT_FAR_FIELD_ALPHA = 0.01 * 0.01 ** (2 / 3);

/** Below this current the plume is no steady wastefield (slack water, tidal reversal): common practice, no source. */
export const SLACK_CURRENT = 0.05;

/**
 * Beyond this travel time the current cannot be taken as steady: half the M2 tidal period (12.42 h); the
 * threshold itself is common practice, no source.
 */
export const STEADY_TRAVEL_TIME = (12.42 / 2) * 3600;

export const FAR_FIELD_BROOKS_1960: MethodInfo = {
  id: 'far-field',
  title: 'Far-field spreading of a wastefield by the 4/3-law',
  source:
    'Brooks, N.H. (1960). Diffusion of sewage effluent in an ocean current. Proc. 1st Int. Conf. Waste Disposal in the ' +
    'Marine Environment; as presented in Fischer, H.B., List, E.J., Koh, R.C.Y., Imberger, J., ' +
    'Brooks, N.H. (1979). Mixing in Inland and Coastal Waters. Academic Press, ch. 9 (the 4/3-law solution for a ' +
    'wastefield in a uniform current: centreline concentration c_max/c₀ = erf√(3/2 / ((1 + ⅔βx/b)³ − 1)), ' +
    'field width L/b = (1 + ⅔βx/b)^(3/2), β = 12ε₀/(u b)).',
  equation: 'S = 1 / erf√(3/2 / ((1 + ⅔βx/b)³ − 1)), L = b (1 + ⅔βx/b)^(3/2), β = 12 α b^(4/3) / (u b)',
  validity: {
    current: {
      min: SLACK_CURRENT,
      unit: 'm/s',
      note: 'a steady current; slower currents mean slack water or tidal reversal (common practice, no source)',
    },
    alpha: {
      unit: 'm^(2/3)/s',
      note: `default ${DEFAULT_FAR_FIELD_ALPHA.toPrecision(3)} = 0.01 cm^(2/3)/s, a typical coastal value (Fischer et al. 1979)`,
    },
  },
  provenance:
    'The default α = 0.01 cm^(2/3)/s is the typical coastal value as commonly quoted from Fischer et al. (1979); not compared with the book.',
};

/** The 4/3-law field at one distance: centreline dilution factor [1] and field width [m]. */
export interface FarFieldPoint {
  dilution: number;
  width: number;
}

export interface FarFieldSpreading extends FarFieldPoint {
  warnings: Warning[];
}

/**
 * The closed form of Brooks (1960) without checks: with k = ⅔βx/b = 8 α x / (u b^(2/3)),
 * (1 + k)³ − 1 = k (3 + 3k + k²) is evaluated in that form so that small k loses no digits.
 */
export function brooksField(width: number, current: number, distance: number, alpha: number): FarFieldPoint {
  const k = (8 * alpha * distance) / (current * width ** (2 / 3));
  if (k === 0) return { dilution: 1, width };
  const z = Math.sqrt(1.5 / (k * (3 + k * (3 + k))));
  return { dilution: 1 / (math.erf(z) as number), width: width * (1 + k) ** 1.5 };
}

/**
 * Lateral spreading of an established wastefield downstream of the end of the near field, by the 4/3-law
 * ε = α L^(4/3) (ε grows with the field width L; ε₀ = α b^(4/3) at the start). The lateral diffusion
 * equation u ∂c/∂x = ε ∂²c/∂y² with a top-hat start of width b (σ₀² = b²/12, L = 2√3 σ) gives
 *   L/b = (1 + ⅔βx/b)^(3/2), β = 12 ε₀/(u b),
 *   c_max/c₀ = erf√(3/2 / ((1 + ⅔βx/b)³ − 1)),
 * and the far-field centreline dilution factor S = c₀/c_max ≥ 1. S → 1 as x → 0; for large x,
 * erf z ≈ 2z/√π gives S ≈ √(π/6) (⅔βx/b)^(3/2): the factor grows like x^(3/2).
 * Assumes a steady uniform current, no vertical mixing, no decay and no boundary within reach of the field.
 * @param width b [m]: wastefield width at the end of the near field
 * @param current u [m/s]
 * @param distance x [m]: downstream of the end of the near field
 * @param alpha α [m^(2/3)/s]: the 4/3-law coefficient
 * @returns centreline dilution factor S [1] (multiplies the near-field dilution) and field width L [m]
 * @source Brooks (1960); Fischer et al. (1979) ch. 9
 * @validity steady current ≥ 0.05 m/s over a travel time of less than half a tidal period (common practice, no source)
 */
export function farFieldSpreadingBrooks1960(
  width: number,
  current: number,
  distance: number,
  alpha: number = DEFAULT_FAR_FIELD_ALPHA,
): FarFieldSpreading {
  const b = requireInRange('width', width, 'm', positive);
  const u = requireInRange('current', current, 'm/s', positive);
  const x = requireInRange('distance', distance, 'm', nonNegative);
  const a = requireInRange('alpha', alpha, 'm^(2/3)/s', positive);
  const warnings: Warning[] = [];
  if (u < SLACK_CURRENT)
    warnings.push(
      outsideValidity(
        'slack-current',
        `A current of ${qty(u, 'm/s', 3)} is too weak for a steady wastefield (slack water or tidal reversal, below about ${qty(SLACK_CURRENT, 'm/s')}: common practice, no source); the far-field dilution is an extrapolation.`,
        'current',
      ),
    );
  if (x === 0)
    warnings.push(note('no-far-field', 'The distance is zero: no far-field mixing, the factor is 1.', 'distance'));
  else if (x / u > STEADY_TRAVEL_TIME)
    warnings.push(
      outsideValidity(
        'far-field-long-travel',
        `The travel time ${qty(x / u / 3600, 'h', 2)} exceeds half a tidal period: the current cannot be taken as steady and the 4/3-law's validity is doubtful (common practice, no source).`,
        'distance',
      ),
    );
  return { ...brooksField(b, u, x, a), warnings };
}
