/**
 * Adaptive Dormand–Prince 5(4) integrator with event detection on the continuous extension.
 * Source: Dormand, J.R., Prince, P.J. (1980). A family of embedded Runge–Kutta formulae.
 * J. Comput. Appl. Math. 6, 19–26 (Table 2); continuous extension of Shampine (1986), Math. Comp. 46, 135–150;
 * step-size control of Hairer, Nørsett & Wanner (1993), Solving ODEs I, §II.4.
 * The stages live in buffers allocated once per call; the continuous extension is formed only on a step where
 * an event function changes sign.
 */

export type OdeStatus = 'completed' | 'terminal-event' | 'max-steps' | 'step-failed';

export interface OdeEvent {
  /** name shown to users (e.g. 'surface contact') */
  name: string;
  /** the event fires where g crosses zero in the given direction */
  g: (t: number, y: readonly number[]) => number;
  direction?: 'rising' | 'falling' | 'either';
  /** stop the integration when it fires */
  terminal?: boolean;
}

export interface FiredEvent {
  name: string;
  t: number;
  y: number[];
}

/** Several event functions evaluated in one call (sharing their work): g writes event i's value into out[i]. */
export interface OdeEventSet {
  events: readonly Omit<OdeEvent, 'g'>[];
  g: (t: number, y: readonly number[], out: number[]) => void;
}

export interface OdeOptions {
  rtol?: number;
  atol?: number;
  /** step attempts (accepted and rejected) before the status 'max-steps' */
  maxSteps?: number;
  /** first step; default (t1 − t0)/1000 */
  h0?: number;
  hMax?: number;
  events?: readonly OdeEvent[] | OdeEventSet;
}

export interface OdeSolution {
  status: OdeStatus;
  message: string;
  /** accepted step ends, starting with t0 (and the terminal event's t when one stops the run) */
  t: number[];
  y: number[][];
  events: FiredEvent[];
  /** right-hand-side evaluations */
  evaluations: number;
}

function copyOf(v: readonly number[]): number[] {
  const out = new Array<number>(v.length);
  for (let i = 0; i < v.length; i++) out[i] = v[i];
  return out;
}

/** y' = f(t, y) written into dydt (no allocation per call). */
export type OdeRhsInPlace = (t: number, y: readonly number[], dydt: number[]) => void;

// Dormand & Prince (1980), Table 2
const A21 = 1 / 5;
const [A31, A32] = [3 / 40, 9 / 40];
const [A41, A42, A43] = [44 / 45, -56 / 15, 32 / 9];
const [A51, A52, A53, A54] = [19372 / 6561, -25360 / 2187, 64448 / 6561, -212 / 729];
const [A61, A62, A63, A64, A65] = [9017 / 3168, -355 / 33, 46732 / 5247, 49 / 176, -5103 / 18656];
const [B1, B3, B4, B5, B6] = [35 / 384, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84];
const [E1, E3, E4, E5, E6, E7] = [71 / 57600, -71 / 16695, 71 / 1920, -17253 / 339200, 22 / 525, -1 / 40];
const [C2, C3, C4, C5] = [1 / 5, 3 / 10, 4 / 5, 8 / 9];
/** Shampine's coefficients of the 4th-order continuous extension */
const [D1, D3, D4, D5, D6, D7] = [
  -12715105075 / 11282082432,
  87487479700 / 32700410799,
  -10690763975 / 1880347072,
  701980252875 / 199316789632,
  -1453857185 / 822651844,
  69997945 / 29380423,
];

/** The continuous extension of one accepted step: y(t + θh) = r0 + θ(r1 + (1−θ)(r2 + θ(r3 + (1−θ)r4))). */
class StepInterpolant {
  private readonly r: number[][];
  /** a state buffer for trial points */
  readonly scratch: number[];
  constructor(n: number) {
    this.r = Array.from({ length: 5 }, () => new Array<number>(n).fill(0.5));
    this.scratch = new Array<number>(n).fill(0.5);
  }
  set(y: readonly number[], y1: readonly number[], k: readonly number[][], h: number): void {
    const [r0, r1, r2, r3, r4] = this.r;
    for (let i = 0; i < y.length; i++) {
      const dy = y1[i] - y[i],
        bspl = h * k[0][i] - dy;
      r0[i] = y[i];
      r1[i] = dy;
      r2[i] = bspl;
      r3[i] = dy - h * k[6][i] - bspl;
      r4[i] = h * (D1 * k[0][i] + D3 * k[2][i] + D4 * k[3][i] + D5 * k[4][i] + D6 * k[5][i] + D7 * k[6][i]);
    }
  }
  at(theta: number, out: number[]): number[] {
    const [r0, r1, r2, r3, r4] = this.r,
      t1 = 1 - theta;
    for (let i = 0; i < out.length; i++) out[i] = r0[i] + theta * (r1[i] + t1 * (r2[i] + theta * (r3[i] + t1 * r4[i])));
    return out;
  }
}

/**
 * Integrates y' = f(t, y) from t0 to t1 with f writing into a buffer. Never throws on a failed step: it reports
 * the status ('step-failed' on a non-finite value or a step-size underflow, 'max-steps' at the step limit).
 * Forward integration only: t1 = t0 returns the initial point with status 'completed' and no evaluation; t1 < t0,
 * a NaN bound or an infinite t0 throws a RangeError (a programming error, not a user input). t1 = ∞ runs until a
 * terminal event or the step limit (first step default 10⁻³·max(1, |t0|)).
 */
export function integrateOde(
  f: OdeRhsInPlace,
  t0: number,
  y0: readonly number[],
  t1: number,
  options: OdeOptions = {},
): OdeSolution {
  if (!(Number.isFinite(t0) && t1 >= t0))
    throw new RangeError(`integrateOde integrates forwards only: t1 (${t1}) must not be below a finite t0 (${t0})`);
  if (t1 === t0)
    return { status: 'completed', message: 'the interval is empty', t: [t0], y: [[...y0]], events: [], evaluations: 0 };
  const rtol = options.rtol ?? 1e-6,
    atol = options.atol ?? 1e-9,
    maxSteps = options.maxSteps ?? 20000;
  const hMax = options.hMax ?? t1 - t0;
  const events = eventSetOf(options.events ?? []);
  const m = events.events.length;
  const n = y0.length;
  const buf = () => copyOf(y0);
  let k1 = buf(),
    k7 = buf();
  const k2 = buf(),
    k3 = buf(),
    k4 = buf(),
    k5 = buf(),
    k6 = buf();
  const stages = [k1, k2, k3, k4, k5, k6, k7];
  const yt = buf(),
    interp = new StepInterpolant(n);
  let y = buf(),
    y1 = buf();
  let evaluations = 1,
    rejected = false;
  let t = t0,
    h = Math.min(options.h0 ?? (Number.isFinite(t1) ? (t1 - t0) / 1000 : 1e-3 * Math.max(1, Math.abs(t0))), hMax);
  f(t, y, k1);
  const ts = [t],
    ys = [copyOf(y)],
    fired: FiredEvent[] = [];
  const gPrev = new Array<number>(m).fill(0.5),
    gNew = gPrev.slice();
  events.g(t, y, gPrev);
  const done = (status: OdeStatus, message: string): OdeSolution => ({
    status,
    message,
    t: ts,
    y: ys,
    events: fired,
    evaluations,
  });
  for (let step = 0; step < maxSteps; step++) {
    if (t >= t1) return done('completed', 'reached the end of the interval');
    h = Math.min(h, t1 - t, hMax);
    for (let i = 0; i < n; i++) yt[i] = y[i] + h * A21 * k1[i];
    f(t + C2 * h, yt, k2);
    for (let i = 0; i < n; i++) yt[i] = y[i] + h * (A31 * k1[i] + A32 * k2[i]);
    f(t + C3 * h, yt, k3);
    for (let i = 0; i < n; i++) yt[i] = y[i] + h * (A41 * k1[i] + A42 * k2[i] + A43 * k3[i]);
    f(t + C4 * h, yt, k4);
    for (let i = 0; i < n; i++) yt[i] = y[i] + h * (A51 * k1[i] + A52 * k2[i] + A53 * k3[i] + A54 * k4[i]);
    f(t + C5 * h, yt, k5);
    for (let i = 0; i < n; i++)
      yt[i] = y[i] + h * (A61 * k1[i] + A62 * k2[i] + A63 * k3[i] + A64 * k4[i] + A65 * k5[i]);
    f(t + h, yt, k6);
    for (let i = 0; i < n; i++) y1[i] = y[i] + h * (B1 * k1[i] + B3 * k3[i] + B4 * k4[i] + B5 * k5[i] + B6 * k6[i]);
    f(t + h, y1, k7);
    evaluations += 6;
    let err = 0,
      finite = true;
    for (let i = 0; i < n; i++) {
      const e = E1 * k1[i] + E3 * k3[i] + E4 * k4[i] + E5 * k5[i] + E6 * k6[i] + E7 * k7[i];
      const sc = atol + rtol * Math.max(Math.abs(y[i]), Math.abs(y1[i]));
      err = Math.max(err, Math.abs(h * e) / sc);
      if (!Number.isFinite(y1[i])) finite = false;
    }
    const tooSmall = h < 1e-12 * Math.max(1, Math.abs(t));
    if (!finite || !Number.isFinite(err)) {
      if (tooSmall) return done('step-failed', `the equations gave a non-finite value at t = ${t}`);
      h /= 10;
      continue;
    }
    if (err > 1) {
      // a second rejection in a row means the error does not fall as h⁵ (a kink in f inside the step): at least halve
      h *= Math.max(0.2, Math.min(rejected ? 0.5 : 1, 0.9 * err ** -0.2));
      rejected = true;
      if (h < 1e-12 * Math.max(1, Math.abs(t))) return done('step-failed', `step size underflow at t = ${t}`);
      continue;
    }
    const stop = m > 0 ? detectEvents(events, gPrev, gNew, t, h, y, y1, stages, interp, fired) : undefined;
    if (stop) {
      ts.push(stop.t);
      ys.push(stop.y);
      return done('terminal-event', `stopped at ${stop.name}`);
    }
    t += h;
    const yOld = y,
      kOld = k1;
    y = y1;
    y1 = yOld;
    k1 = stages[0] = k7;
    k7 = stages[6] = kOld;
    for (let j = 0; j < m; j++) gPrev[j] = gNew[j];
    ts.push(t);
    ys.push(copyOf(y));
    // no growth right after a rejection (Hairer, Nørsett & Wanner 1993, §II.4)
    h *= Math.min(rejected ? 1 : 5, 0.9 * Math.max(err, 1e-10) ** -0.2);
    rejected = false;
  }
  return done('max-steps', `stopped after ${maxSteps} steps before the end of the interval`);
}

function eventSetOf(events: readonly OdeEvent[] | OdeEventSet): OdeEventSet {
  if (!Array.isArray(events)) return events as OdeEventSet;
  const list = events as readonly OdeEvent[];
  return {
    events: list,
    g: (t, y, out) => {
      for (let i = 0; i < list.length; i++) out[i] = list[i].g(t, y);
    },
  };
}

/**
 * Evaluates the events at the end of an accepted step (into gNew), locates each sign change in the wanted direction
 * on the continuous extension, records the crossings in order and returns the first terminal one.
 */
function detectEvents(
  set: OdeEventSet,
  gPrev: readonly number[],
  gNew: number[],
  t: number,
  h: number,
  y: readonly number[],
  y1: readonly number[],
  k: readonly number[][],
  interp: StepInterpolant,
  fired: FiredEvent[],
): FiredEvent | undefined {
  set.g(t + h, y1, gNew);
  let crossings: { i: number; theta: number }[] | undefined;
  for (let i = 0; i < gNew.length; i++) {
    const a = gPrev[i],
      b = gNew[i],
      dir = set.events[i].direction;
    const rising = a < 0 && b >= 0,
      falling = a > 0 && b <= 0;
    if (!((dir !== 'falling' && rising) || (dir !== 'rising' && falling))) continue;
    if (!crossings) {
      crossings = [];
      interp.set(y, y1, k, h);
    }
    const trial = gNew.slice();
    const g = (theta: number) => {
      set.g(t + theta * h, interp.at(theta, interp.scratch), trial);
      return trial[i];
    };
    crossings.push({ i, theta: locateCrossing(g, a, b) });
  }
  if (!crossings) return undefined;
  crossings.sort((p, q) => p.theta - q.theta);
  for (const c of crossings) {
    const e = set.events[c.i];
    const ev = { name: e.name, t: t + c.theta * h, y: interp.at(c.theta, new Array<number>(y.length)) };
    fired.push(ev);
    if (e.terminal) return ev;
  }
  return undefined;
}

/**
 * Where g crosses zero on θ ∈ [0, 1], given g(0) = ga and g(1) = gb on either side: the Illinois variant of regula
 * falsi (Dowell & Jarratt 1971, BIT 11, 168–174), bracketing throughout. Returns the end of the final bracket on the
 * far side of the crossing (g there has left the sign of ga), so the state there has passed the event.
 */
function locateCrossing(g: (theta: number) => number, ga: number, gb: number): number {
  const before = ga < 0;
  let lo = 0,
    hi = 1,
    glo = ga,
    ghi = gb,
    side = 0;
  for (let it = 0; it < 60 && hi - lo > 1e-13; it++) {
    let mid = (lo * ghi - hi * glo) / (ghi - glo);
    if (!(mid > lo && mid < hi)) mid = (lo + hi) / 2;
    const gm = g(mid);
    if (gm < 0 === before) {
      lo = mid;
      glo = gm;
      if (side < 0) ghi /= 2;
      side = -1;
    } else {
      hi = mid;
      ghi = gm;
      if (side > 0) glo /= 2;
      side = 1;
    }
  }
  return hi;
}

/** Integrates y' = f(t, y) from t0 to t1 (t1 > t0) with f returning a new array; see integrateOde. */
export function solveOde(
  f: (t: number, y: readonly number[]) => number[],
  t0: number,
  y0: readonly number[],
  t1: number,
  options: OdeOptions = {},
): OdeSolution {
  return integrateOde(
    (t, y, dydt) => {
      const r = f(t, y);
      for (let i = 0; i < dydt.length; i++) dydt[i] = r[i];
    },
    t0,
    y0,
    t1,
    options,
  );
}
