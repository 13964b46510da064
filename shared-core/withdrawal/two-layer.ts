import { InputError } from '../core/errors';
import { positive, requireInRange } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';
import { outsideValidity } from '../core/warning';

/** Sink shape: a slot across the whole width (line) or an orifice (point). */
export type SinkKind = 'line' | 'point';
/**
 * Where the intake sits, which sets how much of the surrounding space the approach flow fills:
 * - `wall`: in a vertical wall, clear of the bed (half-space / half-plane),
 * - `bed`: on a flat bed, clear of walls (half-space / half-plane),
 * - `wall-foot`: on the bed at the foot of a wall, e.g. a low-level outlet in a dam face (quarter-space / quarter-plane).
 */
export type SinkPosition = 'wall' | 'bed' | 'wall-foot';
export const SINK_POSITIONS: readonly SinkPosition[] = ['wall', 'bed', 'wall-foot'];

export const CRAYA_1949: MethodInfo = {
  id: 'withdrawal-two-layer-craya1949',
  title: 'Critical discharge of two-layer selective withdrawal (Craya 1949 criterion)',
  source:
    'Craya, A. (1949). Recherches théoriques sur l’écoulement de couches superposées de fluides de densités différentes. ' +
    'La Houille Blanche 4, 44–55 (point-sink criterion Q_c = 2.54 √(g′h⁵) for hemispherical approach flow); geometry dependence: ' +
    'Islam, M.R., Zhu, D.Z. (2015). Selective withdrawal of two-layer stratified flows with a point sink. J. Hydraul. Eng. 141(7) ' +
    '(Q_c ≈ 1.27 √(g′h⁵) for an orifice on the bed at the foot of a wall, half of Craya’s value).',
  equation:
    'Interface drawdown on the sink axis: g′(h − y) = u(y)²/2 with u = Q/(Ω y²) (point) or q/(α y) (line); the critical discharge is ' +
    'where no equilibrium y remains: Q_c = Ω √(2·256/3125) √(g′h⁵) (tangency at y = 4h/5), q_c = α √(8/27) √(g′h³) (tangency at y = 2h/3); ' +
    'Ω = 2π, α = π for a wall or bed intake; Ω = π, α = π/2 at the foot of a wall',
  validity: {
    g_prime: { min: 1e-4, max: 1, unit: 'm/s2', note: 'reservoir and laboratory stratification' },
    interface_distance: { min: 0.02, max: 100, unit: 'm' },
  },
};

/** Solid angle [sr] (point sink) or plane angle [rad] (line sink) filled by the approach flow. */
export function approachAngle(sink: SinkKind, position: SinkPosition): number {
  const full = sink === 'point' ? 2 * Math.PI : Math.PI;
  return position === 'wall-foot' ? full / 2 : full;
}

/** Coefficient C of Q_c = C √(g′h⁵) (point) or q_c = C √(g′h³) (line) from Craya's tangency condition [1]. */
export function crayaCoefficient(sink: SinkKind, position: SinkPosition): number {
  const angle = approachAngle(sink, position);
  // max of y⁴(h − y) is 256/3125 h⁵ at y = 4h/5; max of y²(h − y) is 4/27 h³ at y = 2h/3
  return sink === 'point' ? angle * Math.sqrt((2 * 256) / 3125) : angle * Math.sqrt(8 / 27);
}

/**
 * Critical discharge at which the far layer begins to be drawn into an intake below (or above) a sharp interface.
 * Point sink: Q_c = C_p √(g′h⁵); line sink: Q_c = C_l √(g′h³) · width.
 * C_p = 2.54 (wall or bed, Craya 1949), 1.27 at the foot of a wall (Islam & Zhu 2015);
 * C_l = 1.71 (wall or bed), 0.855 at the foot of a wall (the same criterion in two dimensions).
 * Published experiments scatter around these potential-flow values; the geometry factor (×2) dominates the spread.
 * @param gPrime [m/s2] reduced gravity across the interface
 * @param interfaceDistance [m] vertical distance from the intake to the undisturbed interface
 * @param width [m] slot length across the channel (line sink only)
 * @returns [m3/s] critical discharge
 * @source Craya (1949); Islam & Zhu (2015)
 * @validity sharp interface, far layer deep, no ambient current
 */
export function criticalDischargeCraya1949(
  gPrime: number,
  interfaceDistance: number,
  sink: SinkKind,
  position: SinkPosition = 'wall',
  width?: number,
): Scalar {
  const g = requireInRange('g_prime', gPrime, 'm/s2', { ...positive, max: 20 });
  const h = requireInRange('interface_distance', interfaceDistance, 'm', { ...positive, max: 1e4 });
  const c = crayaCoefficient(sink, position);
  const inputs = { g_prime: g, interface_distance: h };
  if (sink === 'point') return scalar(CRAYA_1949, c * Math.sqrt(g * h ** 5), 'm3/s', inputs);
  if (width === undefined)
    throw new InputError('width', '(missing)', 'm', '> 0 m', 'a line sink needs the slot width across the channel');
  const b = requireInRange('width', width, 'm', { ...positive, max: 1e5 });
  const extra =
    b < 2 * h
      ? [
          outsideValidity(
            'slot-narrower-than-interface-distance',
            `The slot width ${b} m is less than twice the interface distance: the flow is three-dimensional and a point-sink estimate may be closer.`,
            'width',
          ),
        ]
      : [];
  return scalar(CRAYA_1949, c * Math.sqrt(g * h ** 3) * b, 'm3/s', inputs, extra);
}
