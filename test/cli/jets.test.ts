import { describe, expect, it } from 'vitest';
import { runGprime } from '../helpers/cli';

const summer = 'file=test/fixtures/jets/summer-stratified.csv';
const winter = 'file=test/fixtures/jets/winter-mixed.csv';

describe('gprime calc: jets and mixing zones', () => {
  it('jet-length-scales gives every scale in metres', () => {
    const r = runGprime([
      'calc',
      'jet-length-scales',
      'diameter=0.2',
      'velocity=4',
      'g_prime=0.2',
      'current=0.1',
      'buoyancy_frequency=0.02',
      '--json',
    ]);
    expect(r.code).toBe(0);
    for (const k of [
      'l_q',
      'l_m',
      'l_crossflow_momentum',
      'l_crossflow_buoyancy',
      'l_strat_momentum',
      'l_strat_buoyancy',
    ])
      expect(r.json.results[k].unit).toBe('m');
    // Fischer et al. (1979) §9.1: l_Q = (π/4)^1/2 D
    expect(r.json.results.l_q.value).toBeCloseTo(0.177245, 5);
    expect(r.json.results.regime.value).toMatch(/current/);
  });

  it('buoyant-jet: a summer pycnocline traps a warm, fresh discharge; a mixed winter column lets it surface', () => {
    const s = runGprime([
      'calc',
      'buoyant-jet',
      'diameter=0.15',
      'velocity=3',
      'angle=0',
      'port_depth=35',
      'effluent_density=1000',
      summer,
      'current=0.1',
      '--json',
    ]);
    expect(s.code).toBe(0);
    expect(s.json.results.trap_height.unit).toBe('m');
    expect(s.json.results.trap_height.value).toBeLessThan(s.json.results.max_rise.value);
    expect(s.json.results.outcome.value).toMatch(/traps/);
    const w = runGprime([
      'calc',
      'buoyant-jet',
      'diameter=0.15',
      'velocity=3',
      'angle=0',
      'port_depth=35',
      'effluent_density=1000',
      winter,
      '--json',
    ]);
    expect(w.code).toBe(0);
    expect(w.json.results.surface_dilution.value).toBeGreaterThan(1);
    expect(w.json.results.max_rise.value).toBeCloseTo(35, 6);
  });

  it('buoyant-jet: a dense brine jet at 60° returns to port level (Roberts et al. 1997: x_i ≈ 2.4 DF)', () => {
    // D = 0.1 m, g′ = 0.1 m/s2, F = 20 → DF = 2 m
    const r = runGprime([
      'calc',
      'buoyant-jet',
      'diameter=0.1',
      'velocity=2',
      'angle=60',
      'port_depth=30',
      'effluent_density=1035.452',
      'ambient_density=1025',
      '--json',
    ]);
    expect(r.code).toBe(0);
    expect(r.json.results.return_distance.value / 2).toBeGreaterThan(2.4 * 0.85);
    expect(r.json.results.return_distance.value / 2).toBeLessThan(2.4 * 1.15);
    expect(r.json.warnings).toContainEqual(
      expect.objectContaining({ severity: 'caution', message: expect.stringMatching(/under-predict/) }),
    );
  });

  it('buoyant-jet refuses both or neither ambient, exit 2', () => {
    const r = runGprime([
      'calc',
      'buoyant-jet',
      'diameter=0.1',
      'velocity=2',
      'angle=60',
      'port_depth=30',
      'effluent_density=1035',
      '--json',
    ]);
    expect(r.code).toBe(2);
  });

  it('line-plume (Roberts, Snyder & Baumgartner 1989): z_e = 2.5 l_b, S qN/b^2/3 = 0.86 at zero current', () => {
    const r = runGprime([
      'calc',
      'line-plume',
      'discharge_per_length=0.01',
      'g_prime=0.2',
      'buoyancy_frequency=0.02',
      '--json',
    ]);
    expect(r.code).toBe(0);
    expect(r.json.results.rise_height.value).toBeCloseTo(15.749, 3);
    expect(r.json.results.dilution.value).toBeCloseTo(68.26, 2);
    const bad = runGprime([
      'calc',
      'line-plume',
      'discharge_per_length=0.01',
      'g_prime=0.2',
      'buoyancy_frequency=0',
      '--json',
    ]);
    expect(bad.code).toBe(2);
  });

  it('required-dilution: (C_e − C_a)/(C_c − C_a); an ambient above the criterion is exit 2', () => {
    const r = runGprime(['calc', 'required-dilution', 'effluent=30', 'ambient=2', 'criterion=5', '--json']);
    expect(r.code).toBe(0);
    expect(r.json.results.dilution).toEqual({ value: 28 / 3, unit: '1' });
    const bad = runGprime(['calc', 'required-dilution', 'effluent=30', 'ambient=6', 'criterion=5', '--json']);
    expect(bad.code).toBe(2);
  });
});
