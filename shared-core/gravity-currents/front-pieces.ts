import { requireInRange, nonNegative } from '../core/range';
import { InputError } from '../core/errors';
import type { Warning } from '../core/warning';

/**
 * A front that advances through phases, each a power law dx/dt = c·x^(−m). Within a phase
 * x^(m+1) = xStart^(m+1) + (m+1)·c·(t − tStart), so position, speed and arrival time are closed-form.
 */

/** Spreading phases in the order they follow. */
export type ReleasePhase = 'slumping' | 'inertial' | 'viscous' | 'steady';
export const PHASE_ORDER: readonly ReleasePhase[] = ['slumping', 'inertial', 'viscous', 'steady'];

export interface FrontPiece {
  phase: ReleasePhase;
  /** start of the phase [s] and front position there [m] */
  tStart: number;
  xStart: number;
  /** speed law dx/dt = c x^(−m): c [m^(1+m)/s], m [1] */
  c: number;
  m: number;
}

/** A phase change: the phase that begins, when [s] and where [m]. */
export interface PhaseTransition {
  phase: ReleasePhase;
  time: number;
  position: number;
}

/** Front position, speed and phase at one time. */
export interface FrontState {
  /** [s] */ time: number;
  /** distance of the front from the origin of the release [m] */ position: number;
  /** [m/s] */ speed: number;
  phase: ReleasePhase;
}

/**
 * A front trajectory sampled at given times, for charts and reports.
 * Every array has the length of `time`; `phase[i]` is the phase at `time[i]`.
 */
export interface FrontSeries {
  /** [s] */ time: number[];
  /** [m] front distance from the origin of the release (back wall of the lock, or the source) */ position: number[];
  /** [m/s] */ speed: number[];
  phase: ReleasePhase[];
  /** where each phase after the first begins */
  transitions: PhaseTransition[];
  /** first arrival of the front at each requested distance [m]; time [s] is 0 for a point inside the release */
  arrivals: { distance: number; time: number }[];
  warnings: Warning[];
}

/** Position at which a piece reaches time t. */
function positionIn(p: FrontPiece, t: number): number {
  const n = p.m + 1;
  return (p.xStart ** n + n * p.c * (t - p.tStart)) ** (1 / n);
}

/** Time at which a piece reaches position x (x ≥ xStart). */
export function timeIn(p: FrontPiece, x: number): number {
  const n = p.m + 1;
  return p.tStart + (x ** n - p.xStart ** n) / (n * p.c);
}

/** Front state at time t ≥ 0 [s]. Pieces must be ordered and the first must start at t = 0. */
export function frontAt(pieces: readonly FrontPiece[], t: number): FrontState {
  requireInRange('time', t, 's', nonNegative);
  let p = pieces[0];
  for (const q of pieces) if (q.tStart <= t) p = q;
  const x = positionIn(p, t);
  if (x === 0 && p.m > 0)
    throw new InputError(
      'time',
      t,
      's',
      '> 0',
      'the front speed of a point source is unbounded at t = 0; give a time > 0',
    );
  return { time: t, position: x, speed: p.c * x ** -p.m, phase: p.phase };
}

/** First time [s] at which the front reaches distance x [m]; 0 when x is inside the initial release. */
export function arrivalTime(pieces: readonly FrontPiece[], x: number): number {
  requireInRange('distance', x, 'm', nonNegative);
  if (x <= pieces[0].xStart) return 0;
  let p = pieces[0];
  for (const q of pieces) if (q.xStart <= x) p = q;
  return timeIn(p, x);
}

/** Transitions between successive pieces. */
export function transitionsOf(pieces: readonly FrontPiece[]): PhaseTransition[] {
  return pieces.slice(1).map((p) => ({ phase: p.phase, time: p.tStart, position: p.xStart }));
}

/** Samples a trajectory at the given times [s] and the arrival times at the given distances [m]. */
export function sampleFront(
  pieces: readonly FrontPiece[],
  times: readonly number[],
  distances: readonly number[],
  warnings: Warning[],
): FrontSeries {
  const states = times.map((t) => frontAt(pieces, t));
  return {
    time: states.map((s) => s.time),
    position: states.map((s) => s.position),
    speed: states.map((s) => s.speed),
    phase: states.map((s) => s.phase),
    transitions: transitionsOf(pieces),
    arrivals: distances.map((d) => ({ distance: d, time: arrivalTime(pieces, d) })),
    warnings,
  };
}

/** The piece for a pure power law x = K t^β from (0, 0): dx/dt = c x^(−m) with m = 1/β − 1, c = β K^(1/β). */
export function powerLawPiece(phase: ReleasePhase, K: number, beta: number): Omit<FrontPiece, 'tStart' | 'xStart'> {
  return { phase, m: 1 / beta - 1, c: beta * K ** (1 / beta) };
}
