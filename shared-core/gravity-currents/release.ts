import { GRAVITY } from '../quantities';
import { positive, requireInRange } from '../core/range';
import { validityWarnings, type MethodInfo } from '../core/method';
import { note, type Warning } from '../core/warning';
import { type FrontPiece, type FrontSeries, sampleFront, frontAt, type FrontState } from './front-pieces';
import { viscousFrontCoefficientHuppert1982, type SpreadingGeometry } from './viscous';

export const LOCK_RELEASE_HS1980: MethodInfo = {
  id: 'lock-release-huppert-simpson-1980',
  title: 'Front of a fixed-volume release: slumping, inertial and viscous phases (box model)',
  source:
    'Huppert, H.E., Simpson, J.E. (1980). The slumping of gravity currents. J. Fluid Mech. 99, 785–799 (box model with the front condition eq. 2.3; inertial laws x = 1.47 (g′A)^(1/3) t^(2/3), r = 1.16 (g′V)^(1/4) t^(1/2)); viscous phase: Huppert, H.E. (1982) J. Fluid Mech. 121, 43–58.',
  equation:
    'dx/dt = Fr(h/H)√(g′h), h = A/x (planar) or V/(πr²); slumping while h/H ≥ 0.075, inertial below; viscous once the viscous spreading speed of Huppert (1982) at the front falls below the inertial speed',
  validity: {
    g_prime: { max: 1, unit: 'm/s2', note: 'Boussinesq laboratory releases' },
    lock_aspect: { min: 0.1, max: 10, unit: '1', note: 'lock depth / lock length of the experiments, roughly' },
  },
};

/** The inertial-phase box-model coefficient uses Fr = 1.19; the similarity solution (Hoult 1972) gives 1.61 in place of 1.47. */
const FR_DEEP = 1.19;
const SLUMP_LIMIT = 0.075;

export interface LockReleaseInput {
  /** [m/s2] reduced gravity, ambient density as reference */ gPrime: number;
  /** [m] lock length (planar) or lock radius (axisymmetric) */ lockLength: number;
  /** [m] depth of released fluid */ lockDepth: number;
  /** [m] ambient depth H ≥ lockDepth; undefined = deep ambient */ totalDepth?: number;
  geometry: SpreadingGeometry;
  /** [m2/s] kinematic viscosity of the current */ kinematicViscosity: number;
}

/** The fitted front model of a release: its phases and the released volume. */
export interface ReleaseModel {
  pieces: FrontPiece[];
  /** released area per unit width [m2] (planar) or volume [m3] (axisymmetric) */
  volume: number;
  geometry: SpreadingGeometry;
  warnings: Warning[];
}

/**
 * Builds the box model of Huppert & Simpson (1980) for a lock release, closed by Huppert's (1982)
 * viscous phase. Positions are measured from the back wall of the lock (planar) or the centre (axisymmetric).
 * @source Huppert & Simpson (1980); Huppert (1982). @validity Boussinesq, no entrainment, horizontal floor.
 */
export function lockReleaseHuppertSimpson1980(input: LockReleaseInput): ReleaseModel {
  const g = requireInRange('g_prime', input.gPrime, 'm/s2', { ...positive, max: GRAVITY });
  const x0 = requireInRange('lock_length', input.lockLength, 'm', { ...positive, max: 1e5 });
  const h0 = requireInRange('lock_depth', input.lockDepth, 'm', { ...positive, max: 1e4 });
  const H =
    input.totalDepth === undefined
      ? undefined
      : requireInRange('total_depth', input.totalDepth, 'm', { min: h0, max: 1e4 });
  const nu = requireInRange('kinematic_viscosity', input.kinematicViscosity, 'm2/s', { ...positive, max: 1 });
  const planar = input.geometry === 'planar';
  const vol = planar ? x0 * h0 : Math.PI * x0 * x0 * h0;
  const v = planar ? vol : vol / Math.PI; // h = v / x^k
  const k = planar ? 1 : 2;
  // box-model speed laws dx/dt = c x^(−m)
  const slump =
    H === undefined
      ? undefined
      : { phase: 'slumping' as const, c: 0.5 * Math.sqrt(g) * Math.cbrt(H) * v ** (1 / 6), m: k / 6 };
  const inertial = { phase: 'inertial' as const, c: FR_DEEP * Math.sqrt(g * v), m: k / 2 };
  const eta = viscousFrontCoefficientHuppert1982(0, input.geometry).value;
  const viscous = planar
    ? { phase: 'viscous' as const, c: (eta ** 5 * g * vol ** 3) / (3 * nu) / 5, m: 4 }
    : { phase: 'viscous' as const, c: (eta ** 8 * g * vol ** 3) / (3 * nu) / 8, m: 7 };
  // box phases as position intervals
  const box: { law: { phase: 'slumping' | 'inertial'; c: number; m: number }; from: number }[] = [];
  const xSlumpEnd = H === undefined ? x0 : (v / (SLUMP_LIMIT * H)) ** (1 / k);
  if (slump && xSlumpEnd > x0) box.push({ law: slump, from: x0 });
  box.push({ law: inertial, from: Math.max(x0, xSlumpEnd) });
  // the viscous phase starts where the viscous speed first drops below the box-model speed
  const laws: { phase: FrontPiece['phase']; c: number; m: number; from: number }[] = [];
  let xVisc = Infinity;
  for (let i = 0; i < box.length; i++) {
    const { law, from } = box[i];
    const to = i + 1 < box.length ? box[i + 1].from : Infinity;
    const cross = (viscous.c / law.c) ** (1 / (viscous.m - law.m));
    if (cross <= from) {
      xVisc = from;
      break;
    }
    laws.push({ ...law, from });
    if (cross < to) {
      xVisc = cross;
      break;
    }
  }
  if (Number.isFinite(xVisc)) laws.push({ ...viscous, from: xVisc });
  const pieces: FrontPiece[] = [];
  let t = 0;
  for (const l of laws) {
    if (pieces.length) {
      const p = pieces[pieces.length - 1];
      const n = p.m + 1;
      t = p.tStart + (l.from ** n - p.xStart ** n) / (n * p.c);
    }
    pieces.push({ phase: l.phase, tStart: t, xStart: l.from, c: l.c, m: l.m });
  }
  const warnings = validityWarnings(LOCK_RELEASE_HS1980, { g_prime: g, lock_aspect: h0 / x0 });
  warnings.push(
    note(
      'box-model-scatter',
      'Box model: the current is taken as a uniform slab without entrainment; experiments scatter about ±10–20 % around it.',
    ),
  );
  if (pieces[0].phase === 'viscous')
    warnings.push(
      note('viscous-from-release', 'Viscous forces dominate from the release: the current never spreads inertially.'),
    );
  return { pieces, volume: vol, geometry: input.geometry, warnings };
}

/** Front of a lock release at time t [s]. */
export function lockReleaseFrontAt(model: ReleaseModel, t: number): FrontState {
  return frontAt(model.pieces, t);
}

/**
 * Front position [m], speed [m/s] and phase vs time for a lock release, with the phase transitions and the
 * arrival times [s] at the given distances [m] (measured like the positions).
 */
export function lockReleaseSeries(
  input: LockReleaseInput,
  times: readonly number[],
  distances: readonly number[] = [],
): FrontSeries {
  const model = lockReleaseHuppertSimpson1980(input);
  return sampleFront(model.pieces, times, distances, model.warnings);
}
