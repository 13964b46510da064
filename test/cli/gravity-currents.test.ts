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
    const r = runGprime([
      'calc',
      'lock-release',
      'g_prime=0.1',
      'lock_length=3',
      'lock_depth=2',
      'total_depth=1',
      'time=10',
      '--json',
    ]);
    expect(r.code).toBe(2);
    expect(r.stdout + r.stderr).toMatch(/total_depth/);
  });
  it('flux-release on a slope runs at 1.5 (g′q)^⅓ and reaches a point at distance/speed (Britter & Linden 1980, U_f = 1.5 (g′q)^⅓)', () => {
    const r = runGprime([
      'calc',
      'flux-release',
      'g_prime=0.05',
      'flux=0.01',
      'time=600',
      'slope=6',
      'arrival_distance=500',
      '--json',
    ]);
    expect(r.code).toBe(0);
    const u = 1.5 * Math.cbrt(0.05 * 0.01);
    expect(r.json.results.front_speed.value).toBeCloseTo(u, 12);
    expect(r.json.results.arrival_time.value).toBeCloseTo(500 / u, 9);
    expect(r.json.results.phase.value).toBe('steady');
  });
  it('flux-release on a flat floor starts with the inertial box law x = (Fr² g′q)^⅓ t, Fr = 1.19 (Huppert & Simpson 1980 eq. 2.3)', () => {
    const r = runGprime(['calc', 'flux-release', 'g_prime=0.05', 'flux=0.01', 'time=60', '--json']);
    expect(r.json.results.front_position.value).toBeCloseTo(Math.cbrt(1.19 ** 2 * 0.05 * 0.01) * 60, 9);
    expect(r.json.results.phase.value).toBe('inertial');
    const bad = runGprime([
      'calc',
      'flux-release',
      'g_prime=0.05',
      'flux=0.01',
      'time=60',
      'slope=5',
      'geometry=axisymmetric',
      '--json',
    ]);
    expect(bad.code).toBe(2);
    expect(bad.json.error.field).toBe('geometry');
  });
  it('lock-release reports the arrival time at a point (inertial law x = 1.47 (g′A)^⅓ t^⅔, Huppert & Simpson 1980)', () => {
    const r = runGprime([
      'calc',
      'lock-release',
      'g_prime=0.1',
      'lock_length=3',
      'lock_depth=2',
      'time=30',
      'arrival_distance=40',
      '--json',
    ]);
    expect(r.code).toBe(0);
    const later = runGprime([
      'calc',
      'lock-release',
      'g_prime=0.1',
      'lock_length=3',
      'lock_depth=2',
      `time=${r.json.results.arrival_time.value}`,
      '--json',
    ]);
    expect(later.json.results.front_position.value).toBeCloseTo(40, 6);
  });
});
