/**
 * Lowest eigenpairs of a symmetric tridiagonal pencil A x = λ B x, with B diagonal and non-negative.
 * Eigenvalues by Sturm-sequence bisection (the inertia of the LDLᵀ factorisation of A − λB counts the
 * eigenvalues below λ), eigenvectors by inverse iteration; both cost O(N) per step, so O(N) per mode.
 *
 * Sources: Barth, W., Martin, R.S., Wilkinson, J.H. (1967). Calculation of the eigenvalues of a symmetric
 * tridiagonal matrix by the method of bisection. Numer. Math. 9, 386–393; Golub, G.H., Van Loan, C.F. (2013).
 * Matrix Computations, 4th ed., §8.4.1 (Sturm sequence, bisection), §8.2.2 (inverse iteration), §8.7
 * (symmetric-definite pencils; Sylvester's law of inertia).
 *
 * When B is singular (some weights 0) A must be positive definite: then the inertia of A − λB still counts the
 * finite eigenvalues below λ (for λ > 0), and the zero-weight rows carry only infinite eigenvalues.
 */

export interface TridiagonalPencil {
  /** diagonal of A, length n */
  diag: readonly number[];
  /** off-diagonal of A, length n − 1 (A[i][i+1] = A[i+1][i] = off[i]) */
  off: readonly number[];
  /** diagonal of B (≥ 0), length n; omitted: B = I */
  weight?: readonly number[];
}

export interface Eigenpair {
  value: number;
  /** eigenvector, normalised so that xᵀBx = 1 (xᵀx = 1 when B = I) and its largest component is positive */
  vector: number[];
}

function weightAt(p: TridiagonalPencil, i: number): number {
  return p.weight ? p.weight[i] : 1;
}

/** Number of eigenvalues of the pencil strictly below λ (negative pivots of LDLᵀ of A − λB). */
export function sturmCount(p: TridiagonalPencil, lambda: number): number {
  const n = p.diag.length;
  const tiny = Number.MIN_VALUE * 1e10;
  let count = 0;
  let d = 1;
  for (let i = 0; i < n; i++) {
    const e2 = i > 0 ? p.off[i - 1] * p.off[i - 1] : 0;
    d = p.diag[i] - lambda * weightAt(p, i) - (i > 0 ? e2 / d : 0);
    if (d === 0) d = -tiny; // pivot exactly zero: perturb (Barth et al. 1967)
    if (d < 0) count++;
  }
  return count;
}

/** Gershgorin-type interval [lo, hi] holding every eigenvalue when B = I. */
function gershgorin(p: TridiagonalPencil): [number, number] {
  let lo = Infinity,
    hi = -Infinity;
  const n = p.diag.length;
  for (let i = 0; i < n; i++) {
    const r = (i > 0 ? Math.abs(p.off[i - 1]) : 0) + (i < n - 1 ? Math.abs(p.off[i]) : 0);
    lo = Math.min(lo, p.diag[i] - r);
    hi = Math.max(hi, p.diag[i] + r);
  }
  return [lo, hi];
}

/**
 * The k-th smallest eigenvalue (k = 1, 2, …) by bisection to a relative width of about 4 ε.
 * With a weight B, A must be positive definite (the search starts at 0 and doubles upwards).
 */
export function kthEigenvalue(p: TridiagonalPencil, k: number): number {
  const n = p.diag.length;
  if (!Number.isInteger(k) || k < 1 || k > n) throw new RangeError(`eigenvalue index ${k} outside 1 … ${n}`);
  let lo: number, hi: number;
  if (!p.weight) [lo, hi] = gershgorin(p);
  else {
    if (sturmCount(p, 0) > 0) throw new RangeError('A is not positive definite: the weighted search needs A > 0');
    lo = 0;
    hi = 1;
    for (let i = 0; sturmCount(p, hi) < k; i++) {
      if (i > 2000) throw new RangeError(`the pencil has fewer than ${k} finite eigenvalues`);
      lo = hi;
      hi *= 2;
    }
  }
  for (let i = 0; i < 2000; i++) {
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi || hi - lo <= 4 * Number.EPSILON * Math.max(Math.abs(lo), Math.abs(hi))) break;
    if (sturmCount(p, mid) >= k) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
}

/** Solves the tridiagonal system (A − σB) x = r by Gaussian elimination with partial pivoting (O(n)). */
function solveShifted(p: TridiagonalPencil, sigma: number, r: readonly number[]): number[] {
  const n = p.diag.length;
  // rows hold up to three entries after pivoting: a[i] (diag), b[i] (i+1), c[i] (i+2)
  const a = p.diag.map((d, i) => d - sigma * weightAt(p, i));
  const b = Array.from({ length: n }, (_, i) => (i < n - 1 ? p.off[i] : 0));
  const sub = Array.from({ length: n }, (_, i) => (i > 0 ? p.off[i - 1] : 0));
  const c = new Array<number>(n).fill(0);
  const x = [...r];
  const guard = 1e-300;
  for (let i = 0; i < n - 1; i++) {
    const below = sub[i + 1];
    if (Math.abs(below) > Math.abs(a[i])) {
      // swap rows i and i+1
      const [ai, bi, ci, xi] = [a[i], b[i], c[i], x[i]];
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
  for (let i = n - 1; i >= 0; i--) {
    const piv = Math.abs(a[i]) < guard ? guard : a[i];
    x[i] = (x[i] - (i < n - 1 ? b[i] * x[i + 1] : 0) - (i < n - 2 ? c[i] * x[i + 2] : 0)) / piv;
  }
  return x;
}

function normalise(p: TridiagonalPencil, v: number[]): number[] {
  let norm = 0,
    big = 0;
  v.forEach((x, i) => {
    norm += x * x * weightAt(p, i);
    if (Math.abs(x) > Math.abs(big)) big = x;
  });
  const s = (big < 0 ? -1 : 1) / Math.sqrt(norm);
  return v.map((x) => x * s);
}

/** Eigenvector for a known eigenvalue by inverse iteration (three sweeps from a smooth start). */
export function eigenvectorFor(p: TridiagonalPencil, lambda: number): number[] {
  const n = p.diag.length;
  // shift just off the eigenvalue so that A − σB is not exactly singular
  const sigma = lambda * (1 + 64 * Number.EPSILON) + (lambda === 0 ? 1e-300 : 0);
  let v = Array.from({ length: n }, (_, i) => 1 + 0.5 * Math.sin(1.3 * i + 0.7));
  for (let sweep = 0; sweep < 3; sweep++) {
    v = normalise(
      p,
      solveShifted(
        p,
        sigma,
        v.map((x, i) => x * weightAt(p, i)),
      ),
    );
    if (v.some((x) => !Number.isFinite(x))) throw new RangeError('inverse iteration failed');
  }
  return v;
}

/** The k smallest eigenpairs of the pencil, in ascending order of eigenvalue. */
export function lowestEigenpairs(p: TridiagonalPencil, k: number): Eigenpair[] {
  const n = p.diag.length;
  if (p.off.length !== n - 1 || (p.weight && p.weight.length !== n))
    throw new RangeError('inconsistent pencil lengths');
  if (p.weight?.some((w) => !(w >= 0))) throw new RangeError('weights must be non-negative');
  return Array.from({ length: Math.min(k, n) }, (_, i) => {
    const value = kthEigenvalue(p, i + 1);
    return { value, vector: eigenvectorFor(p, value) };
  });
}
