/**
 * Brent's method for a root of f on [a, b] where f(a) and f(b) differ in sign.
 * Source: Brent, R.P. (1973). Algorithms for Minimization without Derivatives, Ch. 4 (zeroin).
 */

export type RootStatus = 'converged' | 'not-bracketed' | 'max-iterations' | 'not-a-number';

export interface RootResult {
  status: RootStatus;
  /** the root when converged; otherwise the last iterate (undefined when the bracket failed) */
  x?: number;
  /** function evaluations */
  evaluations: number;
}

/**
 * Brent's zeroin with its failure modes named: 'not-bracketed' when f(a) and f(b) do not differ in sign (or either
 * is NaN), 'not-a-number' when f gives NaN inside the bracket, 'max-iterations' when the bracket is still wider than
 * the tolerance after maxIter steps. Converged means the bracket around x is narrower than 2(2ε|x| + tol/2), or f(x) = 0.
 */
export function brentSolve(f: (x: number) => number, a: number, b: number, tol = 1e-12, maxIter = 200): RootResult {
  let fa = f(a),
    fb = f(b),
    evaluations = 2;
  if (fa === 0) return { status: 'converged', x: a, evaluations };
  if (fb === 0) return { status: 'converged', x: b, evaluations };
  if (!(fa * fb < 0)) return { status: 'not-bracketed', evaluations };
  let c = a,
    fc = fa,
    d = b - a,
    e = d;
  for (let i = 0; i < maxIter; i++) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol1 = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tol;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol1 || fb === 0) return { status: 'converged', x: b, evaluations };
    if (Math.abs(e) >= tol1 && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number, q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc,
          r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol1 * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = d;
      }
    } else {
      d = m;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol1 ? d : m > 0 ? tol1 : -tol1;
    fb = f(b);
    evaluations++;
    if (Number.isNaN(fb)) return { status: 'not-a-number', x: b, evaluations };
  }
  return { status: 'max-iterations', x: b, evaluations };
}

/** The root of f on [a, b] by brentSolve, or undefined when it did not converge (see brentSolve for why). */
export function brentRoot(
  f: (x: number) => number,
  a: number,
  b: number,
  tol = 1e-12,
  maxIter = 200,
): number | undefined {
  const r = brentSolve(f, a, b, tol, maxIter);
  return r.status === 'converged' ? r.x : undefined;
}
