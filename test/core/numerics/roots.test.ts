import { describe, expect, it } from 'vitest';
import { brentRoot, brentSolve } from '../../../shared-core/numerics/roots';

// Method: Brent, R.P. (1973). Algorithms for Minimization without Derivatives, Ch. 4 (zeroin). References are
// closed-form roots.
describe("Brent's method", () => {
  it.each([
    ['x² − 2 on [0, 2]', (x: number) => x * x - 2, 0, 2, Math.SQRT2],
    ['eˣ − 2 on [−1, 3]', (x: number) => Math.exp(x) - 2, -1, 3, Math.LN2],
    ['cos x on [1, 2]', Math.cos, 1, 2, Math.PI / 2],
    ['(x − 1/3)³, a triple root, on [0, 1]', (x: number) => (x - 1 / 3) ** 3, 0, 1, 1 / 3],
  ])('%s converges to the closed-form root', (_name, f, a, b, root) => {
    const r = brentSolve(f, a, b, 1e-14);
    expect(r.status).toBe('converged');
    expect(Math.abs(r.x! - root)).toBeLessThan(1e-12);
    expect(brentRoot(f, a, b, 1e-14)).toBe(r.x);
  });

  it('is superlinear on a smooth root: few evaluations where bisection needs about 50', () => {
    expect(brentSolve((x) => x * x - 2, 0, 2, 1e-14).evaluations).toBeLessThan(15);
  });

  it('returns an end point where f is zero', () => {
    expect(brentSolve((x) => x - 1, 1, 3)).toMatchObject({ status: 'converged', x: 1 });
    expect(brentSolve((x) => x - 3, 1, 3)).toMatchObject({ status: 'converged', x: 3 });
  });

  it('names its failure modes; brentRoot then gives undefined', () => {
    const unbracketed = (x: number) => x * x + 1;
    expect(brentSolve(unbracketed, -1, 1).status).toBe('not-bracketed');
    expect(brentRoot(unbracketed, -1, 1)).toBeUndefined();
    expect(brentSolve(() => Number.NaN, 0, 1).status).toBe('not-bracketed');
    // NaN inside the bracket: the first trial point (the secant of ±1 on [0, 1]) is 0.5
    const hole = (x: number) => (x < 0.5 ? -1 : x > 0.7 ? 1 : Number.NaN);
    expect(brentSolve(hole, 0, 1)).toMatchObject({ status: 'not-a-number' });
    expect(brentRoot(hole, 0, 1)).toBeUndefined();
    const slow = brentSolve((x) => Math.exp(x) - 2, -1, 3, 1e-14, 3);
    expect(slow.status).toBe('max-iterations');
    expect(Number.isFinite(slow.x)).toBe(true);
    expect(brentRoot((x) => Math.exp(x) - 2, -1, 3, 1e-14, 3)).toBeUndefined();
  });
});
