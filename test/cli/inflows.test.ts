import { describe, expect, it } from 'vitest';
import { runGprime } from '../helpers/cli';

describe('gprime calc plunge-depth', () => {
  it('default plunge Froude number reproduces h_p ≈ 1.6 (q²/g′)^⅓ (Fischer et al. 1979) within 1 %', () => {
    const r = runGprime(['calc', 'plunge-depth', 'discharge=50', 'width=50', 'g_prime=0.01', '--json']);
    expect(r.code).toBe(0);
    expect(r.json.results.plunge_depth.unit).toBe('m');
    expect(Math.abs(r.json.results.plunge_depth.value / (1.6 * Math.cbrt(100)) - 1)).toBeLessThan(0.01);
  });

  it('a plunge Froude number outside the published range warns', () => {
    const r = runGprime(['calc', 'plunge-depth', 'discharge=50', 'width=50', 'g_prime=0.01', 'plunge_froude=1.2', '--json']);
    expect(r.code).toBe(0);
    expect(r.json.warnings.join(' ')).toMatch(/plunge_froude/);
  });

  it('a negative g′ exits 2 naming the parameter', () => {
    const r = runGprime(['calc', 'plunge-depth', 'discharge=50', 'width=50', 'g_prime=-0.01', '--json']);
    expect(r.code).toBe(2);
    expect(r.stderr + r.stdout).toMatch(/g_prime/);
  });
});
