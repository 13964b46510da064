import { describe, expect, it } from 'vitest';
import { runGprime } from '../helpers/cli';

describe('gprime calc --sigma: uncertainty bands', () => {
  it('adds a 90 % band whose spread follows the law of propagation (JCGM 100:2008 eq. 10, linear model)', () => {
    const r = runGprime([
      'calc',
      'required-dilution',
      'effluent=12',
      'ambient=0.05',
      'criterion=1.2',
      '--sigma',
      'effluent=1',
      '--samples',
      '4000',
      '--json',
    ]);
    expect(r.code).toBe(0);
    expect(r.json.results.dilution.value).toBeCloseTo(10.3913, 4);
    const band = r.json.uncertainty.bands.dilution;
    expect(band.standard_deviation).toBeCloseTo(1 / 1.15, 1);
    // symmetric normal band: nominal ± 1.644854 u (Abramowitz & Stegun 1964, Table 26.1)
    expect(band.high - band.nominal).toBeCloseTo(1.644854 / 1.15, 1);
    expect(r.json.uncertainty.method).toBe('monte-carlo-jcgm101');
  });
  it('reads a percentage and a unit, and the same seed gives the same band', () => {
    const args = [
      'calc',
      'front-speed',
      'g_prime=0.02',
      'current_depth=2',
      '--sigma',
      'g_prime=10%',
      '--sigma',
      'current_depth=1ft',
      '--seed',
      '3',
      '--json',
    ];
    const a = runGprime(args),
      b = runGprime(args);
    expect(a.json.uncertainty.inputs).toEqual([
      { name: 'g_prime', standard_uncertainty: 0.002 },
      { name: 'current_depth', standard_uncertainty: 0.3048 },
    ]);
    expect(a.json.uncertainty).toEqual(b.json.uncertainty);
  });
  it('prints the band before the screening caution in text mode', () => {
    const r = runGprime(['calc', 'front-speed', 'g_prime=0.02', 'current_depth=2', '--sigma', 'g_prime=0.002']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/90 % band from \d+ of 1000 Monte Carlo draws/);
    expect(r.stdout.indexOf('Uncertainty')).toBeLessThan(r.stdout.indexOf('Screening estimate only'));
  });
  it('refuses an uncertainty on a parameter that is not a number, naming it (exit 2)', () => {
    const r = runGprime(['calc', 'front-speed', 'g_prime=0.02', 'current_depth=2', '--sigma', 'model=1', '--json']);
    expect(r.code).toBe(2);
    expect(r.json.error.field).toBe('uncertainty of model');
    const neg = runGprime([
      'calc',
      'front-speed',
      'g_prime=0.02',
      'current_depth=2',
      '--sigma',
      'g_prime=-0.1',
      '--json',
    ]);
    expect(neg.code).toBe(2);
    expect(neg.json.error.message).toMatch(/uncertainty of g_prime/);
  });
});
