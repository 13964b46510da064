/**
 * Adaptive Dormand–Prince 5(4) integrator with dense output and event detection.
 * Source: Dormand, J.R., Prince, P.J. (1980). A family of embedded Runge–Kutta formulae.
 * J. Comput. Appl. Math. 6, 19–26 (Table 2); dense output of Shampine (1986), Math. Comp. 46, 135–150;
 * step-size control of Hairer, Nørsett & Wanner (1993), Solving ODEs I, §II.4.
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

export interface OdeOptions {
  rtol?: number;
  atol?: number;
  maxSteps?: number;
  /** first step; default (t1 − t0)/1000 */
  h0?: number;
  hMax?: number;
  events?: OdeEvent[];
}

export interface OdeSolution {
  status: OdeStatus;
  message: string;
  /** accepted step ends, starting with t0 */
  t: number[];
  y: number[][];
  events: FiredEvent[];
  /** right-hand-side evaluations */
  evaluations: number;
}

const C = [0, 1 / 5, 3 / 10, 4 / 5, 8 / 9, 1, 1];
const A = [
  [],
  [1 / 5],
  [3 / 40, 9 / 40],
  [44 / 45, -56 / 15, 32 / 9],
  [19372 / 6561, -25360 / 2187, 64448 / 6561, -212 / 729],
  [9017 / 3168, -355 / 33, 46732 / 5247, 49 / 176, -5103 / 18656],
  [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84],
];
const B5 = [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84, 0];
const E = [71 / 57600, 0, -71 / 16695, 71 / 1920, -17253 / 339200, 22 / 525, -1 / 40];
/** Shampine's dense-output coefficients for the 4th-order continuous extension. */
const D = [
  -12715105075 / 11282082432,
  0,
  87487479700 / 32700410799,
  -10690763975 / 1880347072,
  701980252875 / 199316789632,
  -1453857185 / 822651844,
  69997945 / 29380423,
];

function axpy(y: readonly number[], h: number, ks: number[][], coeffs: readonly number[]): number[] {
  return y.map((yi, i) => {
    let s = 0;
    for (let j = 0; j < coeffs.length; j++) if (coeffs[j] !== 0) s += coeffs[j] * ks[j][i];
    return yi + h * s;
  });
}

/** Dense output on a step from (t, y) with stages ks and end y1: y(t + θh). */
function interpolate(y: readonly number[], y1: readonly number[], ks: number[][], h: number, theta: number): number[] {
  return y.map((yi, i) => {
    const r1 = y1[i] - yi;
    const r2 = h * ks[0][i] - r1;
    const r3 = r1 - h * ks[6][i] - r2;
    let r4 = 0;
    for (let j = 0; j < 7; j++) r4 += D[j] * ks[j][i];
    r4 *= h;
    return yi + theta * (r1 + (1 - theta) * (r2 + theta * (r3 + (1 - theta) * r4)));
  });
}

/** Integrates y' = f(t, y) from t0 to t1 (t1 > t0). Never throws on a failed step: it reports the status. */
export function solveOde(
  f: (t: number, y: readonly number[]) => number[],
  t0: number,
  y0: readonly number[],
  t1: number,
  options: OdeOptions = {},
): OdeSolution {
  const rtol = options.rtol ?? 1e-6,
    atol = options.atol ?? 1e-9,
    maxSteps = options.maxSteps ?? 20000;
  const hMax = options.hMax ?? t1 - t0;
  const events = options.events ?? [];
  let evaluations = 0;
  const rhs = (t: number, y: readonly number[]) => {
    evaluations++;
    return f(t, y);
  };
  let t = t0,
    y = [...y0],
    h = Math.min(options.h0 ?? (t1 - t0) / 1000, hMax);
  let k1 = rhs(t, y);
  const ts = [t],
    ys = [[...y]],
    fired: FiredEvent[] = [];
  let gPrev = events.map((e) => e.g(t, y));
  for (let step = 0; step < maxSteps; step++) {
    if (t >= t1)
      return {
        status: 'completed',
        message: 'reached the end of the interval',
        t: ts,
        y: ys,
        events: fired,
        evaluations,
      };
    h = Math.min(h, t1 - t, hMax);
    const ks: number[][] = [k1];
    for (let s = 1; s < 7; s++) ks.push(rhs(t + C[s] * h, axpy(y, h, ks, A[s])));
    const y1 = axpy(y, h, ks, B5);
    let err = 0;
    for (let i = 0; i < y.length; i++) {
      let e = 0;
      for (let j = 0; j < 7; j++) e += E[j] * ks[j][i];
      const sc = atol + rtol * Math.max(Math.abs(y[i]), Math.abs(y1[i]));
      err = Math.max(err, Math.abs(h * e) / sc);
    }
    if (!Number.isFinite(err) || y1.some((v) => !Number.isFinite(v))) {
      if (h < 1e-12 * Math.max(1, Math.abs(t)))
        return {
          status: 'step-failed',
          message: `the equations gave a non-finite value at t = ${t}`,
          t: ts,
          y: ys,
          events: fired,
          evaluations,
        };
      h /= 10;
      continue;
    }
    if (err > 1) {
      h *= Math.max(0.2, 0.9 * err ** -0.2);
      if (h < 1e-12 * Math.max(1, Math.abs(t)))
        return {
          status: 'step-failed',
          message: `step size underflow at t = ${t}`,
          t: ts,
          y: ys,
          events: fired,
          evaluations,
        };
      continue;
    }
    const tNew = t + h;
    // events: find the earliest sign change on this step by bisection on the dense output
    let stop: FiredEvent | undefined;
    const gNew = events.map((e) => e.g(tNew, y1));
    const crossings: { i: number; theta: number }[] = [];
    events.forEach((e, i) => {
      const a = gPrev[i],
        b = gNew[i],
        dir = e.direction ?? 'either';
      const rising = a < 0 && b >= 0,
        falling = a > 0 && b <= 0;
      if (!((dir !== 'falling' && rising) || (dir !== 'rising' && falling))) return;
      let lo = 0,
        hi = 1;
      for (let it = 0; it < 60; it++) {
        const mid = (lo + hi) / 2;
        const gm = e.g(t + mid * h, interpolate(y, y1, ks, h, mid));
        if (gm < 0 === a < 0) lo = mid;
        else hi = mid;
      }
      crossings.push({ i, theta: hi });
    });
    crossings.sort((p, q) => p.theta - q.theta);
    for (const c of crossings) {
      const e = events[c.i];
      const ev = { name: e.name, t: t + c.theta * h, y: interpolate(y, y1, ks, h, c.theta) };
      fired.push(ev);
      if (e.terminal) {
        stop = ev;
        break;
      }
    }
    if (stop) {
      ts.push(stop.t);
      ys.push(stop.y);
      return { status: 'terminal-event', message: `stopped at ${stop.name}`, t: ts, y: ys, events: fired, evaluations };
    }
    t = tNew;
    y = y1;
    k1 = ks[6];
    gPrev = gNew;
    ts.push(t);
    ys.push([...y]);
    h *= Math.min(5, 0.9 * Math.max(err, 1e-10) ** -0.2);
  }
  return {
    status: 'max-steps',
    message: `stopped after ${maxSteps} steps before the end of the interval`,
    t: ts,
    y: ys,
    events: fired,
    evaluations,
  };
}
