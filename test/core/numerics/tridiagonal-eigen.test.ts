import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { kthEigenvalue, lowestEigenpairs, sturmCount } from '../../../shared-core/numerics/tridiagonal-eigen';

/** scipy.linalg.eigh_tridiagonal / eigh reference, made by test/check-values/internal-waves/generators/internal_waves_reference.py */
const ref = JSON.parse(
  readFileSync(
    resolve(import.meta.dirname, '../../check-values/internal-waves/generators/internal_waves_reference.json'),
    'utf8',
  ),
).tridiagonal as {
  diag: number[];
  off: number[];
  standard_values: number[];
  standard_vector0: number[];
  pencil_weight: number[];
  pencil_values: number[];
  pencil_vector0: number[];
};

/** |cos| of the angle between two vectors: 1 when they are parallel either way. */
function alignment(a: number[], b: number[]): number {
  const dot = a.reduce((s, x, i) => s + x * b[i], 0);
  return Math.abs(dot) / Math.hypot(...a) / Math.hypot(...b);
}

describe('Sturm bisection + inverse iteration', () => {
  it('matches the analytic eigenvalues 2 − 2cos(kπ/(n+1)) of the discrete Laplacian (Golub & Van Loan 2013, §4.8)', () => {
    const n = 200;
    const pairs = lowestEigenpairs({ diag: new Array(n).fill(2), off: new Array(n - 1).fill(-1) }, 5);
    pairs.forEach((p, i) => {
      expect(p.value).toBeCloseTo(2 - 2 * Math.cos(((i + 1) * Math.PI) / (n + 1)), 13);
      const exact = Array.from({ length: n }, (_, j) => Math.sin(((i + 1) * (j + 1) * Math.PI) / (n + 1)));
      expect(alignment(p.vector, exact)).toBeGreaterThan(1 - 1e-10);
    });
  });

  it('matches scipy.linalg.eigh_tridiagonal on a random symmetric tridiagonal matrix', () => {
    const pairs = lowestEigenpairs({ diag: ref.diag, off: ref.off }, 5);
    pairs.forEach((p, i) => expect(Math.abs(p.value - ref.standard_values[i])).toBeLessThan(1e-12));
    expect(alignment(pairs[0].vector, ref.standard_vector0)).toBeGreaterThan(1 - 1e-10);
  });

  it('matches scipy.linalg.eigh on a generalized pencil A x = λ B x', () => {
    const n = ref.pencil_weight.length;
    const pairs = lowestEigenpairs(
      { diag: new Array(n).fill(2), off: new Array(n - 1).fill(-1), weight: ref.pencil_weight },
      5,
    );
    pairs.forEach((p, i) =>
      expect(Math.abs(p.value - ref.pencil_values[i]) / ref.pencil_values[i]).toBeLessThan(1e-12),
    );
    expect(alignment(pairs[0].vector, ref.pencil_vector0)).toBeGreaterThan(1 - 1e-10);
  });

  it('counts eigenvalues: sturmCount just above the k-th eigenvalue is k (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 3, maxLength: 30 }),
        fc.double({ min: 0.05, max: 2, noNaN: true }),
        (diag, offValue) => {
          const p = { diag, off: new Array(diag.length - 1).fill(offValue) };
          const k = 1 + (diag.length >> 1);
          const lk = kthEigenvalue(p, k);
          expect(sturmCount(p, lk + 1e-7 * (1 + Math.abs(lk)))).toBeGreaterThanOrEqual(k);
          expect(sturmCount(p, lk - 1e-7 * (1 + Math.abs(lk)))).toBeLessThan(k);
        },
      ),
      { numRuns: 100 },
    );
  });

  it('rejects inconsistent input', () => {
    expect(() => lowestEigenpairs({ diag: [1, 2, 3], off: [1] }, 1)).toThrow(RangeError);
    expect(() => lowestEigenpairs({ diag: [1, 2], off: [1], weight: [1, -1] }, 1)).toThrow(RangeError);
    expect(() => kthEigenvalue({ diag: [1, 2], off: [0.5] }, 3)).toThrow(RangeError);
  });
});
