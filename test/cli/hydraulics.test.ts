import { describe, expect, it } from 'vitest';
import { runGprime } from '../helpers/cli';

describe('gprime calc: hydraulics', () => {
  it('obstacle-flow: Nh/U > 1 is blocked (Sheppard 1956); λ = 2πU/N (Baines 1995)', () => {
    const r = runGprime([
      'calc',
      'obstacle-flow',
      'velocity=0.05',
      'buoyancy_frequency=0.02',
      'obstacle_height=5',
      'depth=30',
      '--json',
    ]);
    expect(r.code).toBe(0);
    expect(r.json.results.froude.value).toBeCloseTo(0.5, 12);
    expect(r.json.results.lee_wavelength.value).toBeCloseTo((2 * Math.PI * 0.05) / 0.02, 10);
    expect(r.json.results.blocked.value).toBe('yes');
  });

  it('obstacle-flow: a fast flow passes over (not blocked)', () => {
    const r = runGprime([
      'calc',
      'obstacle-flow',
      'velocity=0.5',
      'buoyancy_frequency=0.02',
      'obstacle_height=5',
      'depth=30',
      '--json',
    ]);
    expect(r.json.results.blocked.value).toBe('no');
    expect(r.json.results.froude.value).toBeCloseTo(5, 12);
  });

  it('obstacle-flow: an obstacle taller than the depth is bad input (exit 2)', () => {
    const r = runGprime([
      'calc',
      'obstacle-flow',
      'velocity=0.05',
      'buoyancy_frequency=0.02',
      'obstacle_height=40',
      'depth=30',
      '--json',
    ]);
    expect(r.code).toBe(2);
    expect(r.stdout + r.stderr).toMatch(/obstacle_height/);
  });
});
