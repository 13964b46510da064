import { GRAVITY } from '../quantities';
import { positive, requireInRange } from '../core/range';
import { formatNumber, InputError } from '../core/errors';
import { scalar, type MethodInfo, type Scalar } from '../core/method';
import { caution, note, type Warning } from '../core/warning';
import { solveOde, type OdeStatus } from '../numerics/ode';

/**
 * Arrested salt wedge in a prismatic channel: fresh river water (velocity U0 over the full depth H) flows
 * seaward over a motionless salt layer. Interfacial stress τ_i = ρ f_i u1², u1 the upper-layer velocity.
 * Other definitions convert as f_i = C_i/2 (τ = ½ρC_i u1²) or f_i = f/8 (τ = (f/8)ρu1²).
 */
export const SCHIJF_SCHONFELD_1953: MethodInfo = {
  id: 'salt-wedge-schijf-schonfeld-1953',
  title: 'Length and shape of an arrested salt wedge (Schijf & Schönfeld 1953)',
  source:
    'Schijf, J.B., Schönfeld, J.C. (1953). Theoretical considerations on the motion of salt and fresh water. Proc. 5th IAHR Congress, Minneapolis, 321–333 (two-layer steady equations, critical flow at the mouth). Default f_i: Sørgard, E., Martinsen, T., Aas, E. (1990). Drag coefficient at a stationary salt wedge. J. Geophys. Res. 95(C2), 1977–1980 (profile fits gave 1.1–2.7 × 10⁻⁴ with τ = ρ f_i u1²).',
  equation:
    'dξ/dη = (H/f_i)(η³ − F0²)(1 − η)/F0², η = h1/H from F0^(2/3) at the mouth to 1 at the tip; L = (H/4f_i)[F0⁻²/5 − 2 + 3F0^(2/3) − (6/5)F0^(4/3)], F0 = U0/√(g′H) < 1',
  validity: {
    interfacial_friction: { min: 1e-4, max: 1e-3, unit: '1', note: 'field values of f_i with τ = ρ f_i u1²' },
    river_froude: { min: 0.01, max: 1, maxExclusive: true, unit: '1', note: 'arrested wedge exists only for F0 < 1' },
  },
};

/** Default interfacial friction factor f_i (τ = ρ f_i u1²), mid-range of Sørgard et al. (1990). */
export const DEFAULT_INTERFACIAL_FRICTION = 2e-4;

export interface SaltWedgeInput {
  /** [m/s] river velocity over the full depth, U0 = Q/(W H) */ riverVelocity: number;
  /** [m] channel depth H */ depth: number;
  /** [m/s2] reduced gravity between sea and river water */ gPrime: number;
  /** [1] f_i with τ_i = ρ f_i u1²; default 2e-4 */ interfacialFriction?: number;
}

export interface SaltWedgeLength {
  /** intrusion length from the mouth to the tip [m]; 0 when no wedge is arrested */
  length: Scalar;
  /** F0 = U0/√(g′H) [1] */
  riverFroude: number;
}

const MIN_RIVER_FROUDE = 1e-6;

function checked(input: SaltWedgeInput) {
  const u = requireInRange('river_velocity', input.riverVelocity, 'm/s', { ...positive, max: 20 });
  const h = requireInRange('depth', input.depth, 'm', { ...positive, max: 1e3 });
  const g = requireInRange('g_prime', input.gPrime, 'm/s2', { ...positive, max: GRAVITY });
  const f = requireInRange('interfacial_friction', input.interfacialFriction ?? DEFAULT_INTERFACIAL_FRICTION, '1', {
    ...positive,
    max: 0.1,
  });
  const F0 = u / Math.sqrt(g * h);
  // below this the closed form overflows (L ∝ F0⁻²): the river is too slow to hold any wedge back
  if (F0 < MIN_RIVER_FROUDE) {
    throw new InputError(
      'river_velocity',
      u,
      'm/s',
      `≥ ${formatNumber(MIN_RIVER_FROUDE * Math.sqrt(g * h))} m/s here`,
      `the river densimetric Froude number ${formatNumber(F0)} is below ${MIN_RIVER_FROUDE}: the sea water would reach indefinitely far inland (no arrested wedge to compute)`,
    );
  }
  return { u, h, g, f, F0 };
}

const NO_WEDGE = note(
  'no-wedge-arrested',
  'The river densimetric Froude number F0 ≥ 1: the river flow pushes the sea water out of the mouth and no wedge is arrested.',
  'river_velocity',
);

/**
 * Closed-form wedge length L = (H/4f_i)[F0⁻²/5 − 2 + 3F0^(2/3) − (6/5)F0^(4/3)] [m].
 * @source Schijf & Schönfeld (1953). @validity F0 < 1; entrainment-free, prismatic channel, steady river flow.
 */
export function saltWedgeLengthSchijfSchonfeld1953(input: SaltWedgeInput): SaltWedgeLength {
  const { h, f, F0 } = checked(input);
  const inputs = { interfacial_friction: f, river_froude: F0 };
  if (F0 >= 1) return { length: scalar(SCHIJF_SCHONFELD_1953, 0, 'm', inputs, [NO_WEDGE]), riverFroude: F0 };
  const bracket = F0 ** -2 / 5 - 2 + 3 * F0 ** (2 / 3) - 1.2 * F0 ** (4 / 3);
  const extra = [
    note('no-interfacial-mixing', 'No mixing across the interface is assumed; tides shorten and move the wedge.'),
  ];
  return { length: scalar(SCHIJF_SCHONFELD_1953, (h / (4 * f)) * bracket, 'm', inputs, extra), riverFroude: F0 };
}

/**
 * Interface profile of the arrested wedge, integrated landward from the critical section at the mouth.
 * All arrays have equal length; index 0 is the mouth, the last index the tip.
 */
export interface SaltWedgeProfile {
  /** [m] distance landward from the mouth */ distance: number[];
  /** [m] depth of the interface below the surface (= fresh-layer thickness h1) */ interfaceDepth: number[];
  /** [m] thickness of the salt layer H − h1 */ saltThickness: number[];
  /** [m] wedge length (tip distance) */ length: number;
  /** [1] F0 */ riverFroude: number;
  status: OdeStatus;
  evaluations: number;
  warnings: Warning[];
}

/**
 * Integrates the two-layer steady equations with interfacial friction,
 * (1 − F1²) dh1/dx = f_i F1² H/(H − h1) (x landward, F1² = U0²H²/(g′h1³)), as dx/dη with η = h1/H.
 * @param points number of profile intervals (≥ 2)
 */
export function saltWedgeProfile(input: SaltWedgeInput, points = 50): SaltWedgeProfile {
  const { h, f, F0 } = checked(input);
  requireInRange('points', points, '1', { min: 2, max: 10000 });
  if (F0 >= 1)
    return {
      distance: [],
      interfaceDepth: [],
      saltThickness: [],
      length: 0,
      riverFroude: F0,
      status: 'completed',
      evaluations: 0,
      warnings: [NO_WEDGE],
    };
  const etaMouth = F0 ** (2 / 3);
  const rhs = (eta: number) => [((h / f) * (eta ** 3 - F0 * F0) * (1 - eta)) / (F0 * F0)];
  const sol = solveOde(rhs, etaMouth, [0], 1, { hMax: (1 - etaMouth) / points, rtol: 1e-9, atol: 1e-6 * h });
  const warnings =
    sol.status === 'completed'
      ? []
      : [caution('integration-stopped', `The profile integration stopped early: ${sol.message}.`)];
  return {
    distance: sol.y.map((y) => y[0]),
    interfaceDepth: sol.t.map((eta) => eta * h),
    saltThickness: sol.t.map((eta) => (1 - eta) * h),
    length: sol.y[sol.y.length - 1][0],
    riverFroude: F0,
    status: sol.status,
    evaluations: sol.evaluations,
    warnings,
  };
}

/** Wedge length vs river discharge, for a chart: arrays of equal length, one entry per discharge. */
export interface SaltWedgeCurve {
  /** [m3/s] */ discharge: number[];
  /** [m/s] U0 = Q/(W H) */ riverVelocity: number[];
  /** [1] */ riverFroude: number[];
  /** [m] 0 where no wedge is arrested */ length: number[];
}

/**
 * Wedge length for each river discharge Q [m3/s] in a channel of width W [m] and depth H [m].
 */
export function saltWedgeLengthCurve(
  discharges: readonly number[],
  width: number,
  depth: number,
  gPrime: number,
  interfacialFriction = DEFAULT_INTERFACIAL_FRICTION,
): SaltWedgeCurve {
  const w = requireInRange('width', width, 'm', { ...positive, max: 1e5 });
  const h = requireInRange('depth', depth, 'm', { ...positive, max: 1e3 });
  const rows = discharges.map((q) => {
    const u = requireInRange('river_discharge', q, 'm3/s', { ...positive, max: 1e6 }) / (w * h);
    const r = saltWedgeLengthSchijfSchonfeld1953({ riverVelocity: u, depth: h, gPrime, interfacialFriction });
    return { q, u, F0: r.riverFroude, L: r.length.value };
  });
  return {
    discharge: rows.map((r) => r.q),
    riverVelocity: rows.map((r) => r.u),
    riverFroude: rows.map((r) => r.F0),
    length: rows.map((r) => r.L),
  };
}
