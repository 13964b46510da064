import { brentRoot } from '../numerics/roots';

/** One-dimensional searches of the release optimiser; each evaluates f a bounded number of times. */

/** A point of [a, b] where f is largest: golden-section search (at most 40 steps), then the better of its ends and middle. */
export function goldenMax(f: (t: number) => number, a: number, b: number): number {
  const r = (Math.sqrt(5) - 1) / 2;
  let c = b - r * (b - a),
    d = a + r * (b - a),
    fc = f(c),
    fd = f(d);
  for (let k = 0; k < 40 && b - a > 1e-9 * (Math.abs(a) + Math.abs(b) + 1); k++) {
    if (fc > fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - r * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + r * (b - a);
      fd = f(d);
    }
  }
  const ends = [a, b, (a + b) / 2].map((t) => ({ t, v: f(t) }));
  return ends.reduce((m, e) => (e.v > m.v ? e : m)).t;
}

/**
 * A point of [lo, hi] where f meets the goal within tol: Brent's method on the whole interval, then on each of 16 pieces
 * (the release temperature jumps where ports begin to interfere, and Brent's method then converges on the jump).
 * `closest` is the point evaluated whose value came nearest the goal.
 */
export function meetGoal(
  f: (t: number) => number,
  lo: number,
  hi: number,
  goal: number,
  tol: number,
): { t?: number; closest: number; miss: number } {
  let closest = lo,
    miss = Infinity;
  const g = (t: number) => {
    const d = f(t) - goal;
    if (Math.abs(d) < miss) {
      miss = Math.abs(d);
      closest = t;
    }
    return d;
  };
  const attempt = (a: number, b: number) => {
    const r = brentRoot(g, a, b, 1e-10 * (hi - lo));
    return r !== undefined && Math.abs(g(r)) <= tol ? r : undefined;
  };
  let t = attempt(lo, hi);
  for (let k = 0; t === undefined && k < 16; k++)
    t = attempt(lo + ((hi - lo) * k) / 16, lo + ((hi - lo) * (k + 1)) / 16);
  return { t, closest, miss };
}
