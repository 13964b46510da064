import { describe, expect, it } from 'vitest';
import { runGprime } from '../helpers/cli';

// `--units si|us` is gprime's own CLI contract; conversions from NIST SP 811 (2008), Appendix B
// (1 ft = 0.3048 m exactly, 1 ft³/s = 0.028316846592 m³/s, °F = 1.8 °C + 32).
const SI_TEXT = /\d\s?(?:m|m\/s|m3\/s|m³\/s|kg\/m3|kg\/m³|degC|°C)(?![\w²³/])/;
const TOKEN = /[\u27e6\u27e7]/;
const jet = [
  'calc',
  'buoyant-jet',
  'port_depth=20',
  'diameter=0.3',
  'velocity=2',
  'angle=0',
  'effluent_density=1000',
  'ambient_density=1024',
  'current=0.1',
];

describe('gprime calc --units', () => {
  it('shows results and sentences in US customary units', () => {
    const si = runGprime(jet);
    const us = runGprime([...jet, '--units', 'us']);
    expect(us.code, us.stderr).toBe(0);
    const rise = (out: string) => Number(/max_rise\s+([\d.]+)/.exec(out)?.[1]);
    expect(/max_rise\s+[\d.]+ m\n/.test(si.stdout)).toBe(true);
    expect(/max_rise\s+[\d.]+ ft\n/.test(us.stdout)).toBe(true);
    expect(rise(us.stdout)).toBeCloseTo(rise(si.stdout) / 0.3048, 2);
    const outcome = /outcome\s+(.*)/.exec(us.stdout)![1];
    expect(outcome).toMatch(/The plume reaches the surface [\d.]+ ft from the port/);
    const body = us.stdout.slice(0, us.stdout.indexOf('Sources:'));
    expect(body).not.toMatch(SI_TEXT);
    expect(us.stdout).not.toMatch(TOKEN);
    expect(si.stdout).not.toMatch(TOKEN);
  });

  it('keeps SI numbers in JSON, its sentences in the chosen units', () => {
    const r = runGprime([...jet, '--units', 'us', '--json']);
    expect(r.code).toBe(0);
    expect(r.json.results.max_rise.unit).toBe('m');
    expect(r.json.results.outcome.value).toMatch(/ ft from the port/);
    expect(r.stdout).not.toMatch(TOKEN);
  });

  it('shows a refusal in the chosen units', () => {
    const r = runGprime(['calc', 'water-density', 'temperature=300', '--units', 'us']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/temperature = 572 °F is not allowed: allowed range is ≥ 26\.6 °F and ≤ 140 °F/);
    const j = runGprime(['calc', 'water-density', 'temperature=300', '--json']);
    expect(j.json.error.message).toMatch(/temperature = 300 °C is not allowed/);
    expect(j.stdout + j.stderr).not.toMatch(TOKEN);
  });

  it('refuses a system it does not know, a missing one and one given twice', () => {
    expect(runGprime(['calc', 'water-density', 'temperature=20', '--units', 'imperial']).stderr).toMatch(
      /--units takes si or us, not "imperial"/,
    );
    expect(runGprime(['calc', 'water-density', 'temperature=20', '--units']).code).toBe(2);
    expect(runGprime(['calc', 'water-density', 'temperature=20', '--units', 'us', '--units', 'si']).stderr).toMatch(
      /--units is given twice/,
    );
  });

  it('converts an uncertainty band and its inputs, a temperature spread without the offset', () => {
    const r = runGprime([
      'calc',
      'water-density',
      'temperature=20',
      '--sigma',
      'temperature=1',
      '--seed',
      '1',
      '--samples',
      '200',
      '--units',
      'us',
    ]);
    expect(r.code, r.stderr).toBe(0);
    // 1 K of standard uncertainty is 1.8 °F (a difference), not 33.8 °F
    expect(r.stdout).toMatch(/temperature ± 1\.8 degF/);
    expect(r.stdout).toMatch(/density\s+[\d.]+ … [\d.]+ lb\/ft3/);
  });
});

describe('gprime assess --units', () => {
  it('summarises the demo site in US units, with no token and no SI quantity', () => {
    const r = runGprime(['assess', 'examples/quillmere-reservoir.gpsite', '--units', 'us']);
    expect([0, 3]).toContain(r.code);
    expect(r.stdout).toMatch(/plunge_depth = [\d.]+ ft \(90 % band [\d.]+ ft … [\d.]+ ft\)/);
    expect(r.stdout).not.toMatch(SI_TEXT);
    expect(r.stdout).not.toMatch(TOKEN);
    const si = runGprime(['assess', 'examples/quillmere-reservoir.gpsite', '--units', 'si']);
    expect(si.stdout).toMatch(/plunge_depth = [\d.]+ m /);
  });

  it('renders every sentence of the JSON assessment, numbers staying SI', () => {
    const r = runGprime(['assess', 'examples/amsel-estuary.gpsite', '--units', 'us', '--json']);
    expect(r.stdout).not.toMatch(TOKEN);
    const jetScales = r.json.estimates.find((e: { method: string }) => e.method === 'buoyant-jet');
    expect(jetScales.results.max_rise.unit).toBe('m');
    expect(jetScales.results.outcome.value).not.toMatch(SI_TEXT);
  });
});
