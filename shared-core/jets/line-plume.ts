import { requireInRange, positive, nonNegative } from '../core/range';
import { validityWarnings, type MethodInfo } from '../core/method';
import { caution, outsideValidity, type Warning } from '../core/warning';

export const LINE_PLUME_RSB1989: MethodInfo = {
  id: 'line-plume',
  title: 'Multiport diffuser as a line plume in linear stratification and current',
  source:
    'Roberts, P.J.W., Snyder, W.H., Baumgartner, D.J. (1989). Ocean outfalls. I: Submerged wastefield formation. ' +
    'J. Hydraul. Eng. 115(1), 1–25 (zero current: z_e = 2.5 l_b, z_m = 1.7 l_b, h_e = 1.5 l_b, S_m qN/b^⅔ = 0.86; ' +
    'current perpendicular to the diffuser, F > 0.1: S_m qN/b^⅔ = 2.19 F^⅙ − 0.52; coefficients from memory).',
  equation:
    'b = g′q, l_b = b^⅓/N, F = u³/b; z_e = 2.5 l_b; S_m = (qN/b^⅔)⁻¹·{0.86 (F ≤ 0.1); 2.19F^⅙ − 0.52 (F > 0.1)}',
  validity: {
    froude_current: { min: 0, max: 100, unit: '1', note: 'F = u³/b of the experiments' },
  },
};

export interface LinePlumeResult {
  /** buoyancy flux per unit length b = g′q [m3/s3] */
  buoyancyFlux: number;
  /** l_b = b^⅓/N [m] */
  lb: number;
  /** F = u³/b [1] */
  froudeCurrent: number;
  /** top of the wastefield above the diffuser [m] */
  riseHeight: number;
  /** height of minimum dilution [m] and wastefield thickness [m] (zero-current values) */
  heightMinDilution: number;
  thickness: number;
  /** minimum (centreline) dilution at the end of the near field [1] */
  dilution: number;
  warnings: Warning[];
}

/**
 * Near-field wastefield of a long multiport diffuser in linear stratification (Roberts, Snyder & Baumgartner 1989).
 * @param q [m2/s] discharge per unit diffuser length; @param gPrime [m/s2] effluent reduced gravity (>0, rising);
 * @param N [1/s] buoyancy frequency; @param u [m/s] current perpendicular to the diffuser
 * @returns rise height [m], minimum dilution [1]
 * @source RSB 1989 Part I, Figs. and equations as cited in LINE_PLUME_RSB1989
 * @validity closely spaced ports (merged line plume), F ≤ 100, current perpendicular to the diffuser
 */
export function linePlumeRobertsSnyderBaumgartner1989(q: number, gPrime: number, N: number, u = 0): LinePlumeResult {
  const qq = requireInRange('discharge_per_length', q, 'm2/s', { ...positive, max: 100 });
  const g = requireInRange('g_prime', gPrime, 'm/s2', { ...positive, max: 5 });
  const n = requireInRange('buoyancy_frequency', N, '1/s', { ...positive, max: 2 });
  const ua = requireInRange('current', u, 'm/s', { ...nonNegative, max: 10 });
  const b = g * qq;
  const lb = Math.cbrt(b) / n;
  const F = ua ** 3 / b;
  const scaleS = b ** (2 / 3) / (qq * n);
  const coeff = F <= 0.1 ? 0.86 : 2.19 * F ** (1 / 6) - 0.52;
  const warnings = validityWarnings(LINE_PLUME_RSB1989, { froude_current: F });
  if (F > 0.1)
    warnings.push(
      caution(
        'rise-height-zero-current',
        'With a current (F > 0.1) the rise height is given for zero current; Roberts, Snyder & Baumgartner (1989) found the wastefield rises less in strong currents, so the value is an upper estimate.',
        'current',
      ),
    );
  const dilution = Math.max(1, coeff * scaleS);
  if (coeff * scaleS < 1)
    warnings.push(
      outsideValidity(
        'dilution-below-one',
        'The formula gives a dilution below 1: the discharge is far outside the experiments; 1 is reported.',
      ),
    );
  return {
    buoyancyFlux: b,
    lb,
    froudeCurrent: F,
    riseHeight: 2.5 * lb,
    heightMinDilution: 1.7 * lb,
    thickness: 1.5 * lb,
    dilution,
    warnings,
  };
}

/**
 * A multiport diffuser seen as a line source: discharge per unit length q = Q_port/spacing [m2/s].
 * Neighbouring round plumes merge where their width reaches the spacing (see the 'plumes merge' event of
 * buoyantJetTrajectory); diffuserPlume() (diffuser.ts) follows the merged plume as a line plume from there.
 */
export function diffuserLineSource(portDischarge: number, spacing: number): number {
  return (
    requireInRange('port_discharge', portDischarge, 'm3/s', positive) /
    requireInRange('port_spacing', spacing, 'm', positive)
  );
}
