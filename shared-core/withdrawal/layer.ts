import { InputError } from '../core/errors';
import { positive, requireInRange } from '../core/range';
import { validityWarnings, type MethodInfo } from '../core/method';
import { caution, note, outsideValidity, type Warning } from '../core/warning';
import type { SinkKind } from './two-layer';

/** Flow regime of a withdrawal layer, in plain words: inertia or viscosity balances buoyancy. */
export type WithdrawalRegime = 'inertial' | 'viscous';

export const WITHDRAWAL_LINE_SINK: MethodInfo = {
  id: 'withdrawal-line-sink-imberger1976',
  title: 'Withdrawal-layer half-thickness for a line sink in linear stratification',
  source:
    'Imberger, J., Thompson, R., Fandry, C. (1976). Selective withdrawal from a finite rectangular tank. J. Fluid Mech. 78, 489–512 ' +
    '(steady layer: δ = 2L F^½ when R = F Gr^⅓ > 1, δ = 2L Gr^−⅙ when R < 1; F = q/(NL²), Gr = N²L⁴/ν²); as summarised in ' +
    'Fischer, H.B., List, E.J., Koh, R.C.Y., Imberger, J., Brooks, N.H. (1979). Mixing in Inland and Coastal Waters, Academic Press, Ch. 6; ' +
    'viscous–diffusive layer: Koh, R.C.Y. (1966). Viscous stratified flow towards a sink. J. Fluid Mech. 24, 555–575.',
  equation:
    'δ = half-thickness (port to one limit); inertial: δ = 2 (q/N)^½; viscous: δ = 2 L Gr^−⅙ = 2 (νL/N)^⅓; R = F Gr^⅓ = q/(N^⅓ ν^⅔ L^⅔) ' +
    'chooses (R > 1 inertial); the two formulas join at R = 1; total thickness 2δ when neither surface nor bed cuts the layer',
  validity: {
    R: { min: 0.01, max: 1e6, unit: '1', note: 'laboratory range of the regime parameter' },
  },
  provenance: 'The chapter of Fischer et al. (1979) summarising the line-sink layer was not compared with the book.',
};

export const WITHDRAWAL_POINT_SINK: MethodInfo = {
  id: 'withdrawal-point-sink-imberger-patterson1990',
  title: 'Withdrawal-layer half-thickness for a point sink in linear stratification',
  source:
    'Imberger, J., Patterson, J.C. (1990). Physical limnology. Adv. Appl. Mech. 27, 303–475, §VIII Outflow (' +
    'δ = L F₃^⅓ = (Q/N)^⅓ when R₃ = F₃ Gr^½ > 1; δ = 2.9 (νκ)^⅙ (L/N)^⅓ when R₃ ≤ 1, after Lawrence, G.A., Imberger, J. (1979), ' +
    'Selective withdrawal through a point sink in a continuously stratified fluid with a pycnocline, Univ. W. Australia Rep. ED-79-002); ' +
    'scaling δ ∝ (Q/N)^⅓: Ivey, G.N., Blake, S. (1985). J. Fluid Mech. 161, 115–137.',
  equation:
    'δ = half-thickness; inertial: δ = (Q/N)^⅓; viscous: δ = 2.9 (νκ)^⅙ (L/N)^⅓; R₃ = Q/(N L³) · N L²/ν chooses (R₃ > 1 inertial)',
  validity: {
    R: { min: 0.01, max: 1e6, unit: '1', note: 'laboratory range of the regime parameter' },
  },
  provenance:
    'The point-sink coefficients are as quoted in Imberger & Patterson (1990) after Lawrence & Imberger (1979); not compared with the original report.',
};

export interface LayerInput {
  /** buoyancy frequency [1/s] */
  n: number;
  /** discharge of the intake [m3/s] */
  discharge: number;
  sink: SinkKind;
  /** slot width [m], line sink only */
  width?: number;
  /** reservoir length from the intake to the far end at the intake level [m]; without it the inertial regime is assumed */
  length?: number;
  /** kinematic viscosity [m2/s]; default 1.0e-6 (water near 20 °C) */
  nu?: number;
  /** thermal diffusivity [m2/s]; default 1.43e-7 (water near 20 °C) */
  kappa?: number;
}

export interface LayerResult {
  /** distance from the port to each limit of the layer [m] (HALF of the total thickness) */
  halfThickness: number;
  /** total thickness 2δ [m], before any cut by the surface or the bed */
  totalThickness: number;
  regime: WithdrawalRegime;
  /** regime parameter (R = F Gr^⅓ line, F₃ Gr^½ point); undefined when no length was given */
  r?: number;
  /** true when the regime was assumed inertial for want of a reservoir length */
  regimeAssumed: boolean;
  method: string;
  warnings: Warning[];
}

/**
 * Half-thickness of the withdrawal layer in a linearly stratified reservoir, line sink (Imberger et al. 1976).
 * @param q [m2/s] discharge per unit width; @param n [1/s]; @param length [m] optional; @param nu [m2/s]
 * @returns half-thickness [m] and regime
 */
export function halfThicknessLineSinkImberger1976(
  q: number,
  n: number,
  length?: number,
  nu = 1.0e-6,
): Omit<LayerResult, 'method' | 'warnings'> {
  const inertial = 2 * Math.sqrt(q / n);
  if (length === undefined)
    return { halfThickness: inertial, totalThickness: 2 * inertial, regime: 'inertial', regimeAssumed: true };
  const r = q / (n ** (1 / 3) * nu ** (2 / 3) * length ** (2 / 3));
  const d = r > 1 ? inertial : 2 * Math.cbrt((nu * length) / n);
  return { halfThickness: d, totalThickness: 2 * d, regime: r > 1 ? 'inertial' : 'viscous', r, regimeAssumed: false };
}

/**
 * Half-thickness of the withdrawal layer in a linearly stratified reservoir, point sink (Imberger & Patterson 1990).
 * @param discharge [m3/s]; @param n [1/s]; @param length [m] optional; @param nu, kappa [m2/s]
 * @returns half-thickness [m] and regime
 */
export function halfThicknessPointSinkImbergerPatterson1990(
  discharge: number,
  n: number,
  length?: number,
  nu = 1.0e-6,
  kappa = 1.43e-7,
): Omit<LayerResult, 'method' | 'warnings'> {
  const inertial = Math.cbrt(discharge / n);
  if (length === undefined)
    return { halfThickness: inertial, totalThickness: 2 * inertial, regime: 'inertial', regimeAssumed: true };
  const r = (discharge / (n * length ** 3)) * ((n * length ** 2) / nu);
  const d = r > 1 ? inertial : 2.9 * (nu * kappa) ** (1 / 6) * Math.cbrt(length / n);
  return { halfThickness: d, totalThickness: 2 * d, regime: r > 1 ? 'inertial' : 'viscous', r, regimeAssumed: false };
}

/**
 * The test a ≥ δ(N) of one sink and discharge, on a [m] and N² [1/s2] rather than N: the two formulas above with their
 * roots raised away (inertial point sink δ = (Q/N)^⅓: a⁶N² ≥ Q²; viscous: a⁶N² ≥ (2.9³ (νκ)^½ L)²; inertial line sink
 * δ = 2 (q/N)^½: a⁴N² ≥ 16 q²; viscous: a⁶N² ≥ (8νL)², inertial while N < q³/(ν²L²)). The layer-limit scan of a
 * measured profile tests hundreds of distances per limit with it, free of square and cube roots; false for N² ≤ 0.
 * @param discharge [m3/s] (point sink) or per unit width [m2/s] (line sink)
 */
export function reachesHalfThickness(
  sink: SinkKind,
  discharge: number,
  length?: number,
  nu = 1.0e-6,
  kappa = 1.43e-7,
): (a: number, n2: number) => boolean {
  if (sink === 'point') {
    // R₃ = Q/(Lν) does not depend on N: one regime for every distance
    const inertial = length === undefined || discharge / (length * nu) > 1;
    const k = inertial ? discharge : 2.9 ** 3 * Math.sqrt(nu * kappa) * length;
    const k2 = k * k;
    return (a, n2) => n2 > 0 && a * a * a * a * a * a * n2 >= k2;
  }
  const inertial2 = 16 * discharge * discharge;
  if (length === undefined) return (a, n2) => n2 > 0 && a * a * a * a * n2 >= inertial2;
  const nSwitch = discharge ** 3 / (nu * nu * length * length);
  const viscous2 = (8 * nu * length) ** 2;
  return (a, n2) =>
    n2 > 0 && (n2 < nSwitch * nSwitch ? a * a * a * a * n2 >= inertial2 : a * a * a * a * a * a * n2 >= viscous2);
}

/**
 * Published coefficients C of the inertial line-sink half-thickness δ = C (q/N)^½, from the critical Froude number
 * q/(N δ²) = 1/C² of each: inviscid theory 1/π (Yih 1958; Kao 1970 free-streamline theory), Debler's (1959)
 * measured 0.28 and Imberger, Thompson & Fandry's (1976) steady layer, C = 2 (the one coded above). Values from memory;
 * Kao's pages as listed in the references of Imberger, Thompson & Fandry (1976).
 */
export const LINE_SINK_INERTIAL_COEFFICIENTS = [
  {
    source:
      'Yih (1958); Kao, T.W. (1970). Free-streamline theory for inviscid stratified flow into a line sink. Phys. Fluids 13, 535–543: q/(Nδ²) = 1/π',
    c: Math.sqrt(Math.PI),
  },
  {
    source:
      'Debler, W.R. (1959). Stratified flow into a line sink. J. Eng. Mech. Div. ASCE 85, 51–65: measured q/(Nδ²) ≈ 0.28',
    c: 1 / Math.sqrt(0.28),
  },
  { source: 'Imberger, Thompson & Fandry (1976): δ = 2 (q/N)^½', c: 2 },
] as const;

/** The lowest and highest published inertial line-sink half-thickness [m] for q [m2/s] and N [1/s]. */
export function halfThicknessSpreadLineSink(q: number, n: number): { low: number; high: number } {
  const cs = LINE_SINK_INERTIAL_COEFFICIENTS.map((k) => k.c);
  const scale = Math.sqrt(q / n);
  return { low: Math.min(...cs) * scale, high: Math.max(...cs) * scale };
}

/** Validated withdrawal layer in linear stratification for either sink, with warnings. */
export function withdrawalLayer(input: LayerInput): LayerResult {
  const n = requireInRange('buoyancy_frequency', input.n, '1/s', { ...positive, max: 1 });
  const discharge = requireInRange('discharge', input.discharge, 'm3/s', { ...positive, max: 1e5 });
  const length =
    input.length === undefined
      ? undefined
      : requireInRange('reservoir_length', input.length, 'm', { ...positive, max: 1e6 });
  const nu = requireInRange('nu', input.nu ?? 1.0e-6, 'm2/s', { ...positive, max: 1 });
  const kappa = requireInRange('kappa', input.kappa ?? 1.43e-7, 'm2/s', { ...positive, max: 1 });
  let core: Omit<LayerResult, 'method' | 'warnings'>;
  let info: MethodInfo;
  if (input.sink === 'line') {
    if (input.width === undefined)
      throw new InputError('width', '(missing)', 'm', '> 0 m', 'a line sink needs the slot width across the channel');
    const width = requireInRange('width', input.width, 'm', { ...positive, max: 1e5 });
    core = halfThicknessLineSinkImberger1976(discharge / width, n, length, nu);
    info = WITHDRAWAL_LINE_SINK;
  } else {
    core = halfThicknessPointSinkImbergerPatterson1990(discharge, n, length, nu, kappa);
    info = WITHDRAWAL_POINT_SINK;
  }
  const warnings = core.r === undefined ? [] : validityWarnings(info, { R: core.r });
  if (core.regimeAssumed)
    warnings.push(
      note(
        'regime-assumed-inertial',
        'No reservoir length given: the inertial regime is assumed (it applies when R = F Gr^⅓ > 1, usual for reservoir outlets).',
        'reservoir_length',
      ),
    );
  else if (core.r !== undefined && core.r > 0.5 && core.r < 2)
    warnings.push(
      caution(
        'regime-transition',
        `R = ${core.r.toFixed(2)} is near 1: the layer is between the inertial and viscous regimes.`,
      ),
    );
  if (length !== undefined && core.halfThickness > length)
    warnings.push(
      outsideValidity(
        'layer-thicker-than-reservoir',
        'The withdrawal layer is thicker than the reservoir is long: the steady-layer formulas do not apply.',
        'reservoir_length',
      ),
    );
  return { ...core, method: info.id, warnings };
}
