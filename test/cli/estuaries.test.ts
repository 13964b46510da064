import { describe, expect, it } from 'vitest';
import { runGprime } from '../helpers/cli';

describe('gprime calc: estuaries', () => {
  it('salt-wedge matches the independent scipy integration (generators/salt_wedge_length.py)', () => {
    const r = runGprime([
      'calc',
      'salt-wedge',
      'river_velocity=0.3',
      'depth=10',
      'g_prime=0.19',
      'interfacial_friction=3e-4',
      '--json',
    ]);
    expect(r.code).toBe(0);
    expect(r.json.results.length.unit).toBe('m');
    expect(r.json.results.length.value).toBeCloseTo(26254.93664811106, 4);
    expect(r.json.results.river_froude.value).toBeCloseTo(0.3 / Math.sqrt(1.9), 12);
  });
  it('estuarine-richardson gives the number and a text class (Fischer et al. 1979 §7.2)', () => {
    const r = runGprime([
      'calc',
      'estuarine-richardson',
      'g_prime=0.15',
      'river_discharge=40',
      'width=300',
      'tidal_velocity=0.5',
      '--json',
    ]);
    expect(r.code).toBe(0);
    expect(r.json.results.richardson.value).toBeCloseTo(0.16, 12);
    expect(r.json.results.class).toEqual({ value: 'partially mixed', unit: '' });
  });
  it('exchange-flow over a sill ≈ 0.208 b√(g′H³) (Farmer & Armi 1986)', () => {
    const r = runGprime(['calc', 'exchange-flow', 'g_prime=0.05', 'depth=10', 'width=100', 'control=sill', '--json']);
    expect(r.code).toBe(0);
    expect(r.json.results.exchange_discharge.unit).toBe('m3/s');
    expect(r.json.results.exchange_discharge.value / (100 * Math.sqrt(0.05 * 1000))).toBeCloseTo(0.20799, 4);
  });
  it('exchange-flow over a sill with a river outflow matches the scipy solve (generators/sill_exchange_net_flow.py)', () => {
    const r = runGprime([
      'calc',
      'exchange-flow',
      'g_prime=0.02',
      'depth=10',
      'width=50',
      'control=sill',
      'net_discharge=67.08203932499369',
      'reservoir_depth=25',
      '--json',
    ]);
    expect(r.code).toBe(0);
    expect(Math.abs(r.json.results.lower_layer_discharge.value / 22.28189016607016 - 1)).toBeLessThan(1e-8);
    expect(Math.abs(r.json.results.upper_layer_discharge.value / 89.36392949106384 - 1)).toBeLessThan(1e-8);
  });
  it('refuses an unknown control (exit 2)', () => {
    const r = runGprime(['calc', 'exchange-flow', 'g_prime=0.05', 'depth=10', 'width=100', 'control=weir', '--json']);
    expect(r.code).toBe(2);
  });
});
