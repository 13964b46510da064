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
    const r = runGprime([
      'calc',
      'plunge-depth',
      'discharge=50',
      'width=50',
      'g_prime=0.01',
      'plunge_froude=1.2',
      '--json',
    ]);
    expect(r.code).toBe(0);
    expect(r.json.warnings).toContainEqual(
      expect.objectContaining({ severity: 'outside-validity', input: 'plunge_froude' }),
    );
  });

  it('a negative g′ exits 2 naming the parameter', () => {
    const r = runGprime(['calc', 'plunge-depth', 'discharge=50', 'width=50', 'g_prime=-0.01', '--json']);
    expect(r.code).toBe(2);
    expect(r.stderr + r.stdout).toMatch(/g_prime/);
  });
});

describe('gprime calc underflow (plunge → underflow → insertion on a measured profile)', () => {
  it('plunges as h_p ≈ 1.6 (q²/g′)^⅓ (Fischer et al. 1979) and inserts where the ambient is as dense as the mixed current', () => {
    const r = runGprime([
      'calc',
      'underflow',
      'file=examples/demo-profile.csv',
      'discharge=25',
      'width=60',
      'temperature=12',
      'sediment=300mg/L',
      'bed_slope=0.004',
      '--json',
    ]);
    expect(r.code).toBe(0);
    const res = r.json.results;
    // inflow density 12 °C water + 0.3 kg/m³ of sediment (EOS-80 at S = 0 and the mixture mass balance) against the surface sample
    const d = runGprime(['calc', 'water-density', 'temperature=12', 'sediment=0.3', 'eos=eos80', '--json']).json.results
      .density.value;
    const surface = 997.1922; // first sample of the demo profile, EOS-80 at 24.8 °C, S = 0.12
    const g = (9.80665 * (d - surface)) / surface;
    expect(res.plunge_depth.value / (1.6 * Math.cbrt((25 / 60) ** 2 / g))).toBeCloseTo(1, 1);
    expect(res.insertion_depth.value).toBeGreaterThan(res.plunge_depth.value);
    expect(res.insertion_depth.value).toBeLessThan(38);
    expect(res.discharge_at_end.value).toBeGreaterThan(25); // entrainment only adds water (Ellison & Turner 1959)
    expect(res.outcome.value).toMatch(/interflow/);
  });

  it('a missing bed slope exits 2 naming the parameter', () => {
    const r = runGprime([
      'calc',
      'underflow',
      'file=examples/demo-profile.csv',
      'discharge=25',
      'width=60',
      'temperature=12',
      '--json',
    ]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/bed_slope/);
  });
});
