import { InputError } from '../core/errors';
import { requireInRange, positive, nonNegative } from '../core/range';
import { validityWarnings, type MethodInfo } from '../core/method';
import { caution, outsideValidity, type Warning } from '../core/warning';

export const LINE_PLUME_RSB1989: MethodInfo = {
  id: 'line-plume',
  title: 'Multiport diffuser as a line plume in linear stratification and current',
  source:
    'Roberts, P.J.W., Snyder, W.H., Baumgartner, D.J. (1989). Ocean outfalls. I: Submerged wastefield formation. ' +
    'J. Hydraul. Eng. 115(1), 1–25 (zero current: z_e = 2.5 l_b, z_m = 1.7 l_b, h_e = 1.5 l_b, S_m qN/b^⅔ = 0.86; ' +
    'current perpendicular to the diffuser, F > 0.1: S_m qN/b^⅔ = 2.19 F^⅙ − 0.52). ' +
    'Unstratified water (N = 0), zero current: the wastefield forms at the surface with minimum dilution ' +
    'S_m q/(b^⅓H) = 0.27: Roberts, P.J.W. (1979). Line plume and ocean outfall dispersion. J. Hydraul. Div. ASCE ' +
    '105(HY4), 313–331.',
  equation:
    'b = g′q, l_b = b^⅓/N, F = u³/b; z_e = 2.5 l_b; S_m = (qN/b^⅔)⁻¹·{0.86 (F ≤ 0.1); 2.19F^⅙ − 0.52 (F > 0.1)}; ' +
    'N = 0: z_e = H, S_m = 0.27 b^⅓H/q (zero-current value, kept as a lower bound in a current)',
  validity: {
    froude_current: { min: 0, max: 100, unit: '1', note: 'F = u³/b of the experiments' },
  },
  provenance:
    'The coefficients of Roberts, Snyder & Baumgartner (1989) and of Roberts (1979) are as commonly quoted, not compared ' +
    'with the papers.',
};

export interface LinePlumeResult {
  /** buoyancy flux per unit length b = g′q [m3/s3] */
  buoyancyFlux: number;
  /** l_b = b^⅓/N [m] (Infinity in unstratified water) */
  lb: number;
  /** F = u³/b [1] */
  froudeCurrent: number;
  /** top of the wastefield above the diffuser [m] */
  riseHeight: number;
  /** height of minimum dilution [m] and wastefield thickness [m] (zero-current values; stratified water only) */
  heightMinDilution?: number;
  thickness?: number;
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
  // weaker stratification than 1e-6 1/s is no stratification: give N = 0 (unstratified water) instead
  const n = requireInRange('buoyancy_frequency', N, '1/s', { min: 1e-6, max: 2 });
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
  return {
    ...dilutionAtLeastOne(coeff * scaleS, warnings),
    buoyancyFlux: b,
    lb,
    froudeCurrent: F,
    riseHeight: 2.5 * lb,
    heightMinDilution: 1.7 * lb,
    thickness: 1.5 * lb,
  };
}

/**
 * Near-field wastefield of a long multiport diffuser in unstratified water: the line plume rises to the surface, where the
 * minimum dilution of the wastefield is S_m = 0.27 b^⅓H/q at zero current (Roberts 1979). A current raises the dilution
 * (Roberts 1979); the zero-current value is kept, with a caution, as a lower bound.
 * @param q [m2/s] discharge per unit length; @param gPrime [m/s2] reduced gravity (>0, rising);
 * @param waterDepth [m] height of the water surface above the diffuser; @param u [m/s] current
 * @returns rise height = water depth [m], minimum dilution [1]
 * @source Roberts (1979), as cited in LINE_PLUME_RSB1989
 * @validity closely spaced ports (merged line plume), uniform water
 */
export function linePlumeUnstratifiedRoberts1979(
  q: number,
  gPrime: number,
  waterDepth: number,
  u = 0,
): LinePlumeResult {
  const qq = requireInRange('discharge_per_length', q, 'm2/s', { ...positive, max: 100 });
  const g = requireInRange('g_prime', gPrime, 'm/s2', { ...positive, max: 5 });
  const H = requireInRange('water_depth', waterDepth, 'm', { ...positive, max: 11000 });
  const ua = requireInRange('current', u, 'm/s', { ...nonNegative, max: 10 });
  const b = g * qq;
  const F = ua ** 3 / b;
  const warnings = validityWarnings(LINE_PLUME_RSB1989, { froude_current: F });
  if (F > 0.1)
    warnings.push(
      caution(
        'unstratified-current-lower-bound',
        'In unstratified water the zero-current dilution is reported; a current across the diffuser raises it (Roberts 1979), so the value is a lower bound.',
        'current',
      ),
    );
  return {
    ...dilutionAtLeastOne((0.27 * (Math.cbrt(b) * H)) / qq, warnings),
    buoyancyFlux: b,
    lb: Infinity,
    froudeCurrent: F,
    riseHeight: H,
  };
}

/** The dilution, at least 1, with a warning when the formula gave less. */
function dilutionAtLeastOne(S: number, warnings: Warning[]): { dilution: number; warnings: Warning[] } {
  if (S >= 1) return { dilution: S, warnings };
  return {
    dilution: 1,
    warnings: [
      ...warnings,
      outsideValidity(
        'dilution-below-one',
        'The formula gives a dilution below 1: the discharge is far outside the experiments; 1 is reported.',
      ),
    ],
  };
}

/**
 * The line-plume estimate of the calc method: unstratified water (N = 0) by Roberts (1979), which needs the water depth;
 * linear stratification by Roberts, Snyder & Baumgartner (1989), with a caution when the wastefield would reach the surface.
 */
export function linePlume(q: number, gPrime: number, N: number, u = 0, waterDepth?: number): LinePlumeResult {
  if (N === 0) {
    if (waterDepth === undefined)
      throw new InputError(
        'water_depth',
        '(missing)',
        'm',
        '> 0 m',
        'unstratified water (buoyancy_frequency = 0) needs the water depth above the diffuser',
      );
    return linePlumeUnstratifiedRoberts1979(q, gPrime, waterDepth, u);
  }
  const r = linePlumeRobertsSnyderBaumgartner1989(q, gPrime, N, u);
  if (waterDepth === undefined || r.riseHeight < requireInRange('water_depth', waterDepth, 'm', positive)) return r;
  const surfaces = caution(
    'wastefield-reaches-surface',
    'The stratified rise height exceeds the water depth: the wastefield reaches the surface, where the stratified formulas no longer apply.',
    'water_depth',
  );
  return { ...r, warnings: [...r.warnings, surfaces] };
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
