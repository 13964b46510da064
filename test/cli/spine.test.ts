import { describe, expect, it } from 'vitest';
import { runGprime } from '../helpers/cli';

describe('gprime calc (spine methods, real CLI)', () => {
  it('water-density: EOS-80 check value S = 35, t68 = 25 °C, p = 0 → 1023.34306 kg/m³ (Fofonoff & Millard 1983, p. 19 — from memory)', () => {
    const r = runGprime(['calc', 'water-density', 'temperature=24.994001439654483', 'salinity=35', '--json']);
    expect(r.code).toBe(0);
    expect(Object.keys(r.json).sort()).toEqual(['method', 'results', 'sources', 'warnings']);
    expect(r.json.method).toBe('water-density');
    expect(r.json.results.density.unit).toBe('kg/m3');
    expect(r.json.results.density.value).toBeCloseTo(1023.34306, 4);
  });

  it('water-density accepts units: 77 degF = 25 °C → 997.047 kg/m³ (Tanaka et al. 2001 table — from memory)', () => {
    const r = runGprime(['calc', 'water-density', 'temperature=77degF', '--json']);
    expect(r.json.results.density.value).toBeCloseTo(997.047, 2);
  });

  it('reduced-gravity: seawater under fresh water, g′ = 9.80665·25/1025 (Simpson 1997, Ch. 1)', () => {
    const r = runGprime(['calc', 'reduced-gravity', 'rho_upper=1000', 'rho_lower=1025', '--json']);
    expect(r.json.results.g_prime.value).toBeCloseTo(0.2391866, 6);
  });

  it('densimetric-froude and viscosity (Kestin et al. 1978 / ITTC 2011 ν(20 °C) = 1.0034e-6 m²/s — from memory)', () => {
    expect(
      runGprime(['calc', 'densimetric-froude', 'velocity=3', 'g_prime=0.245', 'length=0.2', '--json']).json.results
        .froude.value,
    ).toBeCloseTo(13.5526, 3);
    const v = runGprime(['calc', 'viscosity', 'temperature=20', '--json']).json.results.kinematic_viscosity;
    expect(v.unit).toBe('m2/s');
    expect(v.value).toBeCloseTo(1.0034e-6, 8);
  });

  it('profile-summary of the demo profile', () => {
    const r = runGprime(['calc', 'profile-summary', 'file=examples/demo-profile.csv', '--json']);
    expect(r.code).toBe(0);
    const res = r.json.results;
    for (const k of [
      'mixed_layer_depth',
      'thermocline_depth',
      'n2_max',
      'upper_thickness',
      'rho_upper',
      'rho_lower',
      'g_prime',
    ])
      expect(Number.isFinite(res[k].value)).toBe(true);
    expect(res.mixed_layer_depth.value).toBeLessThan(res.thermocline_depth.value);
    expect(res.rho_lower.value).toBeGreaterThan(res.rho_upper.value);
  });

  it('exit 2 with a message naming parameter, value and range; no NaN ever printed', () => {
    const r = runGprime(['calc', 'water-density', 'temperature=300', '--json']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/temperature = 300 °C is not allowed: allowed range is ≥ −3 °C and ≤ 60 °C/);
    expect(runGprime(['calc', 'water-density']).code).toBe(2);
    expect(runGprime(['calc', 'water-density', 'temperature=abc']).stderr).toMatch(/temperature/);
    expect(runGprime(['calc', 'water-density', 'temperature=10', 'colour=red']).stderr).toMatch(
      /no parameter "colour"/,
    );
    expect(runGprime(['calc', 'profile-summary', 'file=does-not-exist.csv']).code).toBe(2);
    expect(runGprime(['calc', 'no-such-method']).code).toBe(2);
    const nan = runGprime(['calc', 'densimetric-froude', 'velocity=NaN', 'g_prime=1', 'length=1', '--json']);
    expect(nan.code).toBe(2);
    expect(nan.json.error.field).toBe('velocity');
    expect(nan.stdout).not.toMatch(/:\s*(NaN|-?Infinity)\b/);
  });

  it('--list --json documents every method with parameters and results', () => {
    const r = runGprime(['calc', '--list', '--json']);
    expect(r.code).toBe(0);
    const ids = r.json.methods.map((m: { id: string }) => m.id);
    for (const id of ['water-density', 'reduced-gravity', 'densimetric-froude', 'viscosity', 'profile-summary'])
      expect(ids).toContain(id);
    const wd = r.json.methods.find((m: { id: string }) => m.id === 'water-density');
    expect(wd.parameters.find((p: { name: string }) => p.name === 'salinity')).toMatchObject({
      unit: 'PSU',
      default: 0,
    });
    expect(wd.results).toEqual([{ name: 'density', unit: 'kg/m3', description: expect.any(String) }]);
  });
});
