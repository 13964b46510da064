/**
 * Lowest eigenpairs of a symmetric tridiagonal pencil A x = λ B x, with B diagonal and non-negative.
 * Eigenvalues by Sturm-sequence bisection (the inertia of the LDLᵀ factorisation of A − λB counts the
 * eigenvalues below λ), eigenvectors by inverse iteration; both cost O(N) per step, so O(N) per mode.
 * Every count narrows the brackets of all the wanted eigenvalues at once, so later modes reuse the
 * bisection steps of earlier ones; once a bracket isolates its eigenvalue, Newton steps on det(A − λB) finish it.
 *
 * Sources: Barth, W., Martin, R.S., Wilkinson, J.H. (1967). Calculation of the eigenvalues of a symmetric
 * tridiagonal matrix by the method of bisection. Numer. Math. 9, 386–393; Golub, G.H., Van Loan, C.F. (2013).
 * Matrix Computations, 4th ed., §8.4.1 (Sturm sequence, bisection), §8.2.2 (inverse iteration), §8.7
 * (symmetric-definite pencils; Sylvester's law of inertia); Wilkinson, J.H. (1965). The Algebraic Eigenvalue
 * Problem. Oxford Univ. Press, Ch. 5 (Sturm sequences and the characteristic polynomial of tridiagonal matrices).
 *
 * When B is singular (some weights 0) A must be positive definite: then the inertia of A − λB still counts the
 * finite eigenvalues below λ (for λ > 0), and the zero-weight rows carry only infinite eigenvalues.
 */

export interface TridiagonalPencil {
  /** diagonal of A, length n */
  diag: ArrayLike<number>;
  /** off-diagonal of A, length n − 1 (A[i][i+1] = A[i+1][i] = off[i]) */
  off: ArrayLike<number>;
  /** diagonal of B (≥ 0), length n; omitted: B = I */
  weight?: ArrayLike<number>;
}

export interface Eigenpair {
  value: number;
  /** eigenvector, normalised so that xᵀBx = 1 (xᵀx = 1 when B = I) and its largest component is positive */
  vector: number[];
}

/** The pencil in flat arrays: `offSquared[i]` = off[i − 1]² (0 for i = 0), `weight` all ones when B = I. */
interface Packed {
  n: number;
  diag: Float64Array;
  off: Float64Array;
  offSquared: Float64Array;
  weight: Float64Array;
  weighted: boolean;
}

function pack(p: TridiagonalPencil): Packed {
  const n = p.diag.length;
  const offSquared = new Float64Array(n);
  for (let i = 1; i < n; i++) offSquared[i] = p.off[i - 1] * p.off[i - 1];
  const weight = new Float64Array(n).fill(1);
  if (p.weight) weight.set(p.weight);
  return {
    n,
    diag: Float64Array.from(p.diag),
    off: Float64Array.from(p.off),
    offSquared,
    weight,
    weighted: !!p.weight,
  };
}

const TINY_PIVOT = Number.MIN_VALUE * 1e10;

function countBelow(q: Packed, lambda: number): number {
  const { n, diag, offSquared, weight } = q;
  let count = 0;
  let d = 1;
  for (let i = 0; i < n; i++) {
    d = diag[i] - lambda * weight[i] - offSquared[i] / d;
    if (d === 0) d = -TINY_PIVOT; // pivot exactly zero: perturb (Barth et al. 1967)
    if (d < 0) count++;
  }
  return count;
}

/** Number of eigenvalues of the pencil strictly below λ (negative pivots of LDLᵀ of A − λB). */
export function sturmCount(p: TridiagonalPencil, lambda: number): number {
  return countBelow(pack(p), lambda);
}

/** Gershgorin-type interval [lo, hi] holding every eigenvalue when B = I. */
function gershgorin(q: Packed): [number, number] {
  let lo = Infinity,
    hi = -Infinity;
  for (let i = 0; i < q.n; i++) {
    const r = (i > 0 ? Math.abs(q.off[i - 1]) : 0) + (i < q.n - 1 ? Math.abs(q.off[i]) : 0);
    lo = Math.min(lo, q.diag[i] - r);
    hi = Math.max(hi, q.diag[i] + r);
  }
  return [lo, hi];
}

/**
 * The count below λ and the Newton correction −p(λ)/p′(λ) of p(λ) = det(A − λB) = Π d_i, from the pivot
 * recurrence d_i = a_i − λw_i − e²_{i−1}/d_{i−1} and its derivative d′_i = −w_i + e²_{i−1} d′_{i−1}/d²_{i−1}
 * (p′/p = Σ d′_i/d_i).
 */
function countAndNewton(q: Packed, lambda: number): { count: number; correction: number } {
  const { n, diag, offSquared, weight } = q;
  let count = 0,
    d = 1,
    slope = 0,
    sum = 0;
  for (let i = 0; i < n; i++) {
    const ratio = offSquared[i] / d;
    slope = -weight[i] + (ratio * slope) / d;
    d = diag[i] - lambda * weight[i] - ratio;
    if (d === 0) d = -TINY_PIVOT;
    if (d < 0) count++;
    sum += slope / d;
  }
  return { count, correction: -1 / sum };
}

const converged = (lo: number, hi: number, mid: number) =>
  mid <= lo || mid >= hi || hi - lo <= 4 * Number.EPSILON * Math.max(Math.abs(lo), Math.abs(hi));

/**
 * The k smallest eigenvalues, ascending. Brackets `lower[j]`, `upper[j]` of the (j + 1)-th eigenvalue, with
 * the counts at their ends, shrink with every count whichever mode it was made for. Bisection runs until a
 * bracket holds that eigenvalue alone; then Newton steps on det(A − λB), kept inside the bracket, converge
 * quadratically (a step leaving the bracket is replaced by bisection) until the correction is within 4 ε.
 * With a weight B, A must be positive definite (the search starts at 0 and doubles upwards).
 */
function smallestEigenvalues(q: Packed, k: number): number[] {
  const lower = new Array<number>(k),
    upper = new Array<number>(k),
    countLower = new Array<number>(k).fill(0),
    countUpper = new Array<number>(k).fill(q.n);
  const record = (x: number, c: number): void => {
    for (let j = 0; j < k; j++) {
      if (j < c && x < upper[j]) [upper[j], countUpper[j]] = [x, c];
      else if (j >= c && x > lower[j]) [lower[j], countLower[j]] = [x, c];
    }
  };
  const countAt = (x: number): number => {
    const c = countBelow(q, x);
    record(x, c);
    return c;
  };
  if (!q.weighted) {
    const [lo, hi] = gershgorin(q);
    lower.fill(lo);
    upper.fill(hi);
  } else {
    if (countBelow(q, 0) > 0) throw new RangeError('A is not positive definite: the weighted search needs A > 0');
    lower.fill(0);
    upper.fill(Infinity);
    for (let i = 0, hi = 1; countAt(hi) < k; i++, hi *= 2)
      if (i > 2000) throw new RangeError(`the pencil has fewer than ${k} finite eigenvalues`);
  }
  return lower.map((_, j) => {
    let guess: number | undefined,
      previous = Infinity,
      newton = true;
    for (let i = 0; i < 2000; i++) {
      const lo = lower[j],
        hi = upper[j],
        mid = 0.5 * (lo + hi);
      if (converged(lo, hi, mid)) return mid;
      if (!newton || countLower[j] !== j || countUpper[j] !== j + 1) {
        countAt(mid); // the bracket holds other eigenvalues too, or Newton could not be certified
        continue;
      }
      const x = guess ?? mid;
      const { count, correction } = countAndNewton(q, x);
      record(x, count);
      const next = x + correction,
        step = Math.abs(correction);
      const inside = next > lower[j] && next < upper[j];
      // done when the step is at rounding level, or has stopped shrinking near the root (the pivots carry
      // no more digits); the two counts around the estimate certify it, else bisection takes over
      const done = step <= 4 * Number.EPSILON * Math.abs(x) || (step <= 1e-6 * Math.abs(x) && step > 0.5 * previous);
      if (inside && done) {
        const margin = Math.max(32 * step, 64 * Number.EPSILON * Math.abs(next));
        if (countAt(next - margin) === j && countAt(next + margin) === j + 1) return next;
        newton = false;
      }
      previous = inside ? step : Infinity;
      guess = inside ? next : undefined;
    }
    return 0.5 * (lower[j] + upper[j]);
  });
}

/** The k-th smallest eigenvalue (k = 1, 2, …) by bisection to a relative width of about 4 ε. */
export function kthEigenvalue(p: TridiagonalPencil, k: number): number {
  const n = p.diag.length;
  if (!Number.isInteger(k) || k < 1 || k > n) throw new RangeError(`eigenvalue index ${k} outside 1 … ${n}`);
  return smallestEigenvalues(pack(p), k)[k - 1];
}

/**
 * Solves the tridiagonal system (A − σB) x = r in place of r by Gaussian elimination with partial pivoting
 * (O(n)); after pivoting row i holds a[i] (diagonal), b[i] (column i + 1) and c[i] (column i + 2).
 */
function solveShifted(q: Packed, sigma: number, x: Float64Array): void {
  const { n, diag, off, weight } = q;
  const a = new Float64Array(n),
    b = new Float64Array(n),
    c = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    a[i] = diag[i] - sigma * weight[i];
    if (i < n - 1) b[i] = off[i];
  }
  for (let i = 0; i < n - 1; i++) {
    const below = off[i];
    if (Math.abs(below) > Math.abs(a[i])) {
      // swap rows i and i + 1, then eliminate the old row i
      const ai = a[i],
        bi = b[i],
        ci = c[i],
        xi = x[i];
      a[i] = below;
      b[i] = a[i + 1];
      c[i] = b[i + 1];
      x[i] = x[i + 1];
      const m = ai / a[i];
      a[i + 1] = bi - m * b[i];
      b[i + 1] = ci - m * c[i];
      x[i + 1] = xi - m * x[i];
    } else {
      const m = a[i] === 0 ? 0 : below / a[i];
      a[i + 1] -= m * b[i];
      b[i + 1] -= m * c[i];
      x[i + 1] -= m * x[i];
    }
  }
  const guard = 1e-300;
  for (let i = n - 1; i >= 0; i--) {
    const pivot = Math.abs(a[i]) < guard ? guard : a[i];
    x[i] = (x[i] - (i < n - 1 ? b[i] * x[i + 1] : 0) - (i < n - 2 ? c[i] * x[i + 2] : 0)) / pivot;
  }
}

/** Scales v in place to vᵀBv = 1 with its largest component positive. */
function normalise(q: Packed, v: Float64Array): void {
  let norm = 0,
    big = 0;
  for (let i = 0; i < q.n; i++) {
    norm += v[i] * v[i] * q.weight[i];
    if (Math.abs(v[i]) > Math.abs(big)) big = v[i];
  }
  const s = (big < 0 ? -1 : 1) / Math.sqrt(norm);
  for (let i = 0; i < q.n; i++) v[i] *= s;
}

/** Eigenvector for a known eigenvalue by inverse iteration (three sweeps from a smooth start). */
function eigenvectorOf(q: Packed, lambda: number): number[] {
  // shift just off the eigenvalue so that A − σB is not exactly singular
  const sigma = lambda * (1 + 64 * Number.EPSILON) + (lambda === 0 ? 1e-300 : 0);
  const v = new Float64Array(q.n);
  for (let i = 0; i < q.n; i++) v[i] = 1 + 0.5 * Math.sin(1.3 * i + 0.7);
  for (let sweep = 0; sweep < 3; sweep++) {
    for (let i = 0; i < q.n; i++) v[i] *= q.weight[i];
    solveShifted(q, sigma, v);
    normalise(q, v);
    if (!v.every(Number.isFinite)) throw new RangeError('inverse iteration failed');
  }
  return Array.from(v);
}

/** Eigenvector for a known eigenvalue by inverse iteration. */
export function eigenvectorFor(p: TridiagonalPencil, lambda: number): number[] {
  return eigenvectorOf(pack(p), lambda);
}

/** The k smallest eigenpairs of the pencil, in ascending order of eigenvalue. */
export function lowestEigenpairs(p: TridiagonalPencil, k: number): Eigenpair[] {
  const n = p.diag.length;
  if (p.off.length !== n - 1 || (p.weight && p.weight.length !== n))
    throw new RangeError('inconsistent pencil lengths');
  const q = pack(p);
  if (!q.weight.every((w) => w >= 0)) throw new RangeError('weights must be non-negative');
  return smallestEigenvalues(q, Math.min(k, n)).map((value) => ({ value, vector: eigenvectorOf(q, value) }));
}
