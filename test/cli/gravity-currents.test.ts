import { describe, expect, it } from 'vitest';
import { runGprime } from '../helpers/cli';

describe('gprime calc: gravity currents', () => {
  it('front-speed (Benjamin) at half depth gives ½√(g′H) (Benjamin 1968 §4)', () => {
    const r = runGprime(['calc', 'front-speed', 'g_prime=0.1', 'current_depth=1', 'total_depth=2', '--json']);
    expect(r.code).toBe(0);
    expect(r.json.results.speed.unit).toBe('m/s');
    expect(r.json.results.speed.value).toBeCloseTo(0.5 * Math.sqrt(0.2), 12);
    expect(r.json.results.froude).toEqual({ value: Math.SQRT1_2, unit: '1' });
    expect(r.json.sources[0]).toMatch(/Benjamin/);
  });
  it('front-speed (Huppert–Simpson) in a deep ambient has Fr = 1.19 (Huppert & Simpson 1980 eq. 2.3)', () => {
    const r = runGprime(['calc', 'front-speed', 'g_prime=0.05', 'current_depth=2', 'model=huppert-simpson', '--json']);
    expect(r.code).toBe(0);
    expect(r.json.results.froude.value).toBeCloseTo(1.19, 12);
  });
  it('lock-release reports position, speed and a text phase', () => {
    const r = runGprime(['calc', 'lock-release', 'g_prime=0.1', 'lock_length=3', 'lock_depth=2', 'time=0', '--json']);
    expect(r.code).toBe(0);
    expect(r.json.results.front_position).toEqual({ value: 3, unit: 'm' });
    expect(r.json.results.front_speed.value).toBeCloseTo(0.5 * Math.sqrt(0.2), 12);
    expect(r.json.results.phase).toEqual({ value: 'slumping', unit: '' });
  });
  it('lock-release refuses a lock deeper than the ambient (exit 2)', () => {
    const r = runGprime(['calc', 'lock-release', 'g_prime=0.1', 'lock_length=3', 'lock_depth=2', 'total_depth=1', 'time=10', '--json']);
    expect(r.code).toBe(2);
    expect(r.stdout + r.stderr).toMatch(/total_depth/);
  });
});
