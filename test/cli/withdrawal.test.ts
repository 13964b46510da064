import { describe, expect, it } from 'vitest';
import { runGprime } from '../helpers/cli';

describe('gprime calc withdrawal methods', () => {
  it('withdrawal-two-layer: point sink at a wall is Craya’s 2.54 √(g′h⁵)', () => {
    const r = runGprime([
      'calc',
      'withdrawal-two-layer',
      'g_prime=0.02',
      'interface_distance=5',
      'sink=point',
      '--json',
    ]);
    expect(r.code).toBe(0);
    expect(r.json.results.critical_discharge.unit).toBe('m3/s');
    expect(r.json.results.critical_discharge.value).toBeCloseTo(2.54 * Math.sqrt(0.02 * 5 ** 5), 0);
    expect(r.json.sources.length).toBeGreaterThan(0);
  });

  it('withdrawal-two-layer: a line sink without width is refused with exit 2', () => {
    const r = runGprime([
      'calc',
      'withdrawal-two-layer',
      'g_prime=0.02',
      'interface_distance=5',
      'sink=line',
      '--json',
    ]);
    expect(r.code).toBe(2);
    expect(r.stderr + r.stdout).toMatch(/width/);
  });

  it('withdrawal-layer: point sink total thickness 2 (Q/N)^⅓ and a text regime', () => {
    const r = runGprime([
      'calc',
      'withdrawal-layer',
      'buoyancy_frequency=0.02',
      'discharge=40',
      'sink=point',
      'reservoir_length=3000',
      '--json',
    ]);
    expect(r.code).toBe(0);
    expect(r.json.results.thickness.value).toBeCloseTo(2 * Math.cbrt(40 / 0.02), 6);
    expect(r.json.results.regime).toEqual({ value: 'inertial', unit: '' });
  });

  it('release-blend: meets a reachable target within the capacities', () => {
    const r = runGprime([
      'calc',
      'release-blend',
      'file=test/fixtures/withdrawal/two-port-profile.csv',
      'ports=3:20,25:20',
      'release=20',
      'target_temperature=15',
      '--json',
    ]);
    expect(r.code).toBe(0);
    expect(r.json.results.feasible).toEqual({ value: 'yes', unit: '' });
    expect(r.json.results.temperature.value).toBeCloseTo(15, 2);
    // port flows as the CLI shows them: "3 m: 10.2 m³/s; 25 m: 9.8 m³/s"
    const flows = [...r.json.results.port_flows.value.matchAll(/: ([\d.]+) m(?:3|³)\/s/g)].map((m: RegExpMatchArray) =>
      Number(m[1]),
    );
    expect(flows.length).toBe(2);
    flows.forEach((q) => expect(q).toBeLessThanOrEqual(20));
    expect(flows[0] + flows[1]).toBeCloseTo(20, 1);
  });

  it('release-blend: an unreachable target reports no and the closest value', () => {
    const r = runGprime([
      'calc',
      'release-blend',
      'file=examples/demo-profile.csv',
      'ports=5:40,20:40,35:30',
      'release=60',
      'target_temperature=24',
      '--json',
    ]);
    expect(r.code).toBe(0);
    expect(r.json.results.feasible.value).toBe('no');
    expect(r.json.results.temperature.value).toBeLessThan(24);
    expect(r.json.warnings).toContainEqual(
      expect.objectContaining({ input: 'target_temperature', message: expect.stringMatching(/cannot be met/) }),
    );
  });

  it('release-blend: a bad ports list exits 2', () => {
    const r = runGprime([
      'calc',
      'release-blend',
      'file=examples/demo-profile.csv',
      'ports=5-40',
      'release=10',
      'target_temperature=15',
      '--json',
    ]);
    expect(r.code).toBe(2);
    expect(r.stderr + r.stdout).toMatch(/ports/);
  });
});
