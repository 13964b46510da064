import { describe, expect, it } from 'vitest';
import { runGprime } from '../helpers/cli';

const G = 9.80665;

describe('gprime calc: internal waves', () => {
  it('two-layer-wave: long-wave speed ≈ √(g′h1h2/H) (Gill 1982 §6.3) and depression polarity for a thin upper layer', () => {
    const r = runGprime([
      'calc',
      'two-layer-wave',
      'rho_upper=998',
      'rho_lower=1000',
      'upper_thickness=5',
      'lower_thickness=15',
      'amplitude=1',
      '--json',
    ]);
    expect(r.code).toBe(0);
    const boussinesq = Math.sqrt((((G * 2) / 1000) * (5 * 15)) / 20);
    expect(Math.abs(r.json.results.long_wave_celerity.value / boussinesq - 1)).toBeLessThan(2e-3);
    expect(r.json.results.celerity.value).toBeGreaterThan(r.json.results.long_wave_celerity.value);
    expect(r.json.results.polarity.value).toMatch(/^depression/);
    expect(r.json.sources.length).toBeGreaterThan(0);
  });

  it('two-layer-wave: a short wave is slower than the long wave; rejects an inverted layering (exit 2)', () => {
    const ok = runGprime([
      'calc',
      'two-layer-wave',
      'rho_upper=998',
      'rho_lower=1000',
      'upper_thickness=5',
      'lower_thickness=15',
      'wavelength=20',
      '--json',
    ]);
    expect(ok.json.results.celerity.value).toBeLessThan(ok.json.results.long_wave_celerity.value);
    const bad = runGprime([
      'calc',
      'two-layer-wave',
      'rho_upper=1001',
      'rho_lower=1000',
      'upper_thickness=5',
      'lower_thickness=15',
      '--json',
    ]);
    expect(bad.code).toBe(2);
    expect(bad.stdout + bad.stderr).toMatch(/rho_lower/);
  });

  it('vertical-modes with constant N gives c_n = NH/(nπ) (Gill 1982 §6.11)', () => {
    const r = runGprime(['calc', 'vertical-modes', 'buoyancy_frequency=0.02', 'depth=40', 'modes=4', '--json']);
    expect(r.code).toBe(0);
    for (let n = 1; n <= 4; n++)
      expect(Math.abs(r.json.results[`celerity_${n}`].value / ((0.02 * 40) / (n * Math.PI)) - 1)).toBeLessThan(1e-4);
    expect(r.json.results.celerity_5).toBeUndefined();
  });

  it('vertical-modes reads a CSV profile; refuses file together with buoyancy_frequency (exit 2)', () => {
    const r = runGprime(['calc', 'vertical-modes', 'file=examples/demo-profile.csv', '--json']);
    expect(r.code).toBe(0);
    const c = [1, 2, 3].map((n) => r.json.results[`celerity_${n}`].value);
    expect(c[0]).toBeGreaterThan(c[1]);
    expect(c[1]).toBeGreaterThan(c[2]);
    const bad = runGprime([
      'calc',
      'vertical-modes',
      'file=examples/demo-profile.csv',
      'buoyancy_frequency=0.01',
      '--json',
    ]);
    expect(bad.code).toBe(2);
  });

  it('internal-seiche: T = 2L/c (Mortimer 1974) within the free-surface correction', () => {
    const r = runGprime([
      'calc',
      'internal-seiche',
      'basin_length=5000',
      'rho_upper=998',
      'rho_lower=1000',
      'upper_thickness=8',
      'lower_thickness=22',
      '--json',
    ]);
    expect(r.code).toBe(0);
    const merian = 10000 / Math.sqrt((((G * 2) / 1000) * (8 * 22)) / 30);
    expect(Math.abs(r.json.results.period.value / merian - 1)).toBeLessThan(3e-3);
  });

  it('wedderburn: W = g′h²/(u*²L) with u* from Large & Pond (1981); a strong wind gives a high upwelling risk; missing wind is exit 2', () => {
    const r = runGprime([
      'calc',
      'wedderburn',
      'g_prime=0.02',
      'upper_thickness=4',
      'wind_speed=15',
      'basin_length=6000',
      '--json',
    ]);
    expect(r.code).toBe(0);
    const ustar = Math.sqrt((1.225 * (0.49 + 0.065 * 15) * 1e-3 * 225) / 1000);
    expect(r.json.results.shear_velocity.value).toBeCloseTo(ustar, 10);
    expect(r.json.results.wedderburn.value).toBeCloseTo((0.02 * 16) / (ustar * ustar * 6000), 10);
    expect(r.json.results.upwelling_risk.value).toMatch(/^High/);
    expect(
      runGprime(['calc', 'wedderburn', 'g_prime=0.02', 'upper_thickness=4', 'basin_length=6000', '--json']).code,
    ).toBe(2);
  });
});
