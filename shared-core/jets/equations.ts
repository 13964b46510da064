import type { OdeRhsInPlace } from '../numerics/ode';
import { interpolateAt } from '../profile/profile';
import { GRAVITY } from '../quantities';
import {
  ENTRAINMENT,
  PLANE_ENTRAINMENT,
  RICHARDSON_PLANE_PLUME,
  RICHARDSON_PLUME,
  type JetGeometry,
  type JetState,
} from './closure';

// the closure's constants and the table interpolation, bound once (the right-hand side reads them on every call)
const ROUND = { alphaJet: ENTRAINMENT.alphaJet, alphaPlume: ENTRAINMENT.alphaPlume, riPlume: RICHARDSON_PLUME };
const PLANE = {
  alphaJet: PLANE_ENTRAINMENT.alphaJet,
  alphaPlume: PLANE_ENTRAINMENT.alphaPlume,
  riPlume: RICHARDSON_PLANE_PLUME,
};
const BETA = ENTRAINMENT.betaCrossflow;
const interpolate = interpolateAt;

/** A table by depth at d: linear between rows, constant beyond the ends and for a table of one row. */
function lookup(depths: readonly number[], values: readonly number[], d: number): number {
  return values.length === 1 ? values[0] : interpolate(depths, values, d);
}
const G = GRAVITY;

/** Order of the state vector: position [m], volume flux Q, momentum flux Q·u, Q(ρ_jet − ρ_ref), Q(T_jet − T_ref). */
export const STATE_KEYS = ['x', 'y', 'z', 'Q', 'Mx', 'My', 'Mz', 'R', 'Th'] as const;

/**
 * The equations of one stretch of jet path as plain data (no functions), in scaled variables: the independent
 * variable is s/lengthScale and state i is its SI value divided by scale[i] (order STATE_KEYS).
 */
export interface JetEquations {
  geometry: JetGeometry;
  /** path length unit [m] (the port diameter) */
  lengthScale: number;
  /** SI state = scaled state × scale, in STATE_KEYS order */
  scale: readonly number[];
  /** port depth [m], reference density [kg/m3] and temperature [degC] (the ambient at the port) */
  portDepth: number;
  rhoRef: number;
  tRef: number;
  /** ambient density [kg/m3] by depth [m], linear between rows and constant beyond the ends (one row: uniform) */
  ambientDepth: readonly number[];
  ambientDensity: readonly number[];
  /** ambient temperature [degC] at ambientDepth; absent when the effluent temperature is not followed */
  ambientTemperature?: readonly number[];
  /** current along +x [m/s] by depth [m], as the density (a plane plume is followed in still water: [0]) */
  currentDepth: readonly number[];
  currentSpeed: readonly number[];
}

/** Local properties of the jet at one state (SI). */
export interface JetLocal {
  u: number;
  ex: number;
  ey: number;
  ez: number;
  /** top-hat radius (round) or half-width (plane) [m] */
  b: number;
  /** ambient density and ρ_jet − ρ_ambient [kg/m3] */
  ambientDensity: number;
  densityExcess: number;
  /** −g Δρ/ρ_ref [m/s2], positive upward */
  gPrime: number;
  ambientCurrent: number;
  /** entrainment dQ/ds [m2/s] (round) or [m/s] (plane) */
  entrainment: number;
}

export function newJetLocal(): JetLocal {
  return {
    u: 0,
    ex: 0,
    ey: 0,
    ez: 0,
    b: 0,
    ambientDensity: 0,
    densityExcess: 0,
    gPrime: 0,
    ambientCurrent: 0,
    entrainment: 0,
  };
}

/** Top-hat radius √(Q/πu) of a round jet, or half-width Q/2u of a plane one [m]. */
function widthOf(Q: number, u: number, plane: boolean): number {
  return plane ? Q / (2 * u) : Math.sqrt(Q / (Math.PI * u));
}

/** What the path events watch at one state. */
export interface JetGauges {
  /** height of the centreline above the port [m] and of the upper and lower edges in the vertical, z ± b cos(elevation) */
  z: number;
  upperEdge: number;
  lowerEdge: number;
  /** vertical momentum flux (scaled) */
  verticalMomentum: number;
  /** |M|/Q in scaled units (the velocity relative to the port's) */
  speedRatio: number;
  /** ρ_jet − ρ_ambient [kg/m3] */
  densityExcess: number;
  /** radius (round) or half-width (plane) [m] */
  width: number;
}

export function newJetGauges(): JetGauges {
  return { z: 0, upperEdge: 0, lowerEdge: 0, verticalMomentum: 0, speedRatio: 0, densityExcess: 0, width: 0 };
}

/** The gauges of scaled state y, written into out. */
export function jetGaugesInto(y: readonly number[], eq: JetEquations, out: JetGauges): JetGauges {
  const sc = eq.scale;
  const Q = y[3] * sc[3],
    mx = y[4] * sc[4],
    my = y[5] * sc[5],
    mz = y[6] * sc[6];
  const m = Math.sqrt(mx * mx + my * my + mz * mz),
    ez = mz / m;
  const z = y[2] * sc[2],
    b = widthOf(Q, m / Q, eq.geometry === 'plane'),
    reach = b * Math.sqrt(Math.max(0, 1 - ez * ez));
  out.z = z;
  out.upperEdge = z + reach;
  out.lowerEdge = z - reach;
  out.verticalMomentum = y[6];
  out.speedRatio = Math.sqrt(y[4] * y[4] + y[5] * y[5] + y[6] * y[6]) / y[3];
  out.densityExcess = eq.rhoRef + (y[7] * sc[7]) / Q - lookup(eq.ambientDepth, eq.ambientDensity, eq.portDepth - z);
  out.width = b;
  return out;
}

/**
 * Local jet properties of scaled state y, written into `out` (see closure.ts for the entrainment closure): velocity
 * u = |M|/Q along e = M/|M|, radius b = √(Q/πu) (round) or half-width Q/2u (plane), α(Ri) between jet and plume
 * values, E = 2πb(α|u − u_a e_x| + β u_a √(1 − e_x²)) (round) or 2α|u| (plane).
 */
export function jetLocalInto(y: readonly number[], eq: JetEquations, out: JetLocal): JetLocal {
  const sc = eq.scale;
  const Q = y[3] * sc[3],
    Mx = y[4] * sc[4],
    My = y[5] * sc[5],
    Mz = y[6] * sc[6];
  const m = Math.sqrt(Mx * Mx + My * My + Mz * Mz);
  const u = m / Q,
    ex = Mx / m,
    ez = Mz / m;
  const plane = eq.geometry === 'plane';
  const b = widthOf(Q, u, plane);
  const d = eq.portDepth - y[2] * sc[2];
  const rhoA = lookup(eq.ambientDepth, eq.ambientDensity, d);
  const densityExcess = eq.rhoRef + (y[7] * sc[7]) / Q - rhoA;
  const gPrime = (-G * densityExcess) / eq.rhoRef;
  const ua = lookup(eq.currentDepth, eq.currentSpeed, d);
  const shear = u - ua * ex;
  const ri = (gPrime * b * ez) / Math.max(shear * shear, 1e-30);
  const k = plane ? PLANE : ROUND;
  const f = Math.min(1, Math.max(0, ri / k.riPlume));
  const alpha = k.alphaJet + (k.alphaPlume - k.alphaJet) * f;
  out.u = u;
  out.ex = ex;
  out.ey = My / m;
  out.ez = ez;
  out.b = b;
  out.ambientDensity = rhoA;
  out.densityExcess = densityExcess;
  out.gPrime = gPrime;
  out.ambientCurrent = ua;
  out.entrainment = plane
    ? 2 * alpha * Math.abs(shear)
    : 2 * Math.PI * b * (alpha * Math.abs(shear) + BETA * ua * Math.sqrt(Math.max(0, 1 - ex * ex)));
  return out;
}

/**
 * Right-hand side of the scaled jet equations, written into dyds (no allocation): dx/ds = e, dQ/ds = E,
 * dM/ds = E u_a x̂ + (Q g′/u) ẑ, dR/ds = E(ρ_a − ρ_ref), dTh/ds = E(T_a − T_ref), each × lengthScale/scale[i].
 * `work` is a scratch for the local properties (newJetLocal()).
 */
export function jetRhsInto(y: readonly number[], dyds: number[], eq: JetEquations, work: JetLocal): void {
  const L = jetLocalInto(y, eq, work),
    sc = eq.scale,
    D = eq.lengthScale,
    E = L.entrainment;
  const Q = y[3] * sc[3];
  dyds[0] = (L.ex * D) / sc[0];
  dyds[1] = (L.ey * D) / sc[1];
  dyds[2] = (L.ez * D) / sc[2];
  dyds[3] = (E * D) / sc[3];
  dyds[4] = (E * L.ambientCurrent * D) / sc[4];
  dyds[5] = 0;
  dyds[6] = (((Q * L.gPrime) / L.u) * D) / sc[6];
  dyds[7] = (E * (L.ambientDensity - eq.rhoRef) * D) / sc[7];
  const T = eq.ambientTemperature;
  dyds[8] = T ? (E * (lookup(eq.ambientDepth, T, eq.portDepth - y[2] * sc[2]) - eq.tRef) * D) / sc[8] : 0;
}

/** The right-hand side of a stretch for the integrator, with its own scratch. */
export function jetRhsFor(eq: JetEquations): OdeRhsInPlace {
  const work = newJetLocal();
  return (_s, y, dyds) => jetRhsInto(y, dyds, eq, work);
}

/**
 * The buoyant-jet right-hand side on plain arrays, returning a new array: a pure function of the scaled state and the
 * plain-data equations, for handing the same equations to another integrator (the benchmark's baseline).
 */
export function buoyantJetRhs(y: readonly number[], eq: JetEquations): number[] {
  const dyds = new Array<number>(STATE_KEYS.length);
  jetRhsInto(y, dyds, eq, newJetLocal());
  return dyds;
}

/** The SI state of scaled state y. */
export function jetStateOf(y: readonly number[], eq: JetEquations): JetState {
  const s = eq.scale;
  return {
    x: y[0] * s[0],
    y: y[1] * s[1],
    z: y[2] * s[2],
    Q: y[3] * s[3],
    Mx: y[4] * s[4],
    My: y[5] * s[5],
    Mz: y[6] * s[6],
    R: y[7] * s[7],
    Th: y[8] * s[8],
  };
}

/** The scaled state of SI state s. */
export function scaledState(s: JetState, eq: JetEquations): number[] {
  return STATE_KEYS.map((k, i) => s[k] / eq.scale[i]);
}
