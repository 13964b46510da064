import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runGprime } from '../helpers/cli';

// What the CLI refuses is gprime's own contract (DEVELOPERS.md, "CLI contract": exit 2 on bad input with a message
// naming the parameter, value and allowed range): no outside source applies.
const dir = mkdtempSync(join(tmpdir(), 'gprime-refusals-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Runs gprime and expects a refusal as bad input (exit 2) whose message contains every given piece. */
function refused(args: string[], ...pieces: (string | RegExp)[]) {
  const r = runGprime(args);
  expect(r.code, r.stderr).toBe(2);
  for (const p of pieces) expect(r.stderr).toMatch(p);
  return r;
}

const density = ['calc', 'water-density', 'temperature=20'];

describe('gprime calc refuses what it used to take silently', () => {
  it('a parameter given twice (never "last wins")', () => {
    refused([...density, 'temperature=21'], 'temperature is given twice', '"20"', '"21"');
  });

  it('__proto__= and other names of the object prototype are unknown parameters', () => {
    refused([...density, '__proto__=3'], 'no parameter "__proto__"', 'temperature, salinity');
    refused([...density, 'constructor=3'], 'no parameter "constructor"');
  });

  it('--sigma without a number ("%", a bare unit)', () => {
    refused([...density, '--sigma', 'temperature=%'], '--sigma temperature', '"%"');
    refused([...density, '--sigma', 'temperature=degF'], '"degF" is not a standard uncertainty');
  });

  it('negative, fractional, too large or non-decimal seeds, and --seed without --sigma', () => {
    const sigma = ['--sigma', 'temperature=1'];
    for (const seed of ['-1', '1.5', '4294967296', '0x10', ''])
      refused([...density, ...sigma, '--seed', seed], '--seed expects a whole number from 0 to 4294967295');
    refused([...density, '--seed', '3'], '--seed needs at least one --sigma');
  });

  it('accepts a valid seed and gives the same band for the same seed', () => {
    const run = () => runGprime([...density, '--sigma', 'temperature=1', '--seed', '7', '--samples', '200', '--json']);
    const a = run(),
      b = run();
    expect(a.code, a.stderr).toBe(0);
    expect(a.json.uncertainty.bands.density).toEqual(b.json.uncertainty.bands.density);
  });

  it('an unknown unit or a unit of another dimension: the message names the expected unit and range', () => {
    refused(
      ['calc', 'water-density', 'temperature=20furlongs'],
      'the unit "furlongs" is not known',
      /a temperature in degC or a unit/,
      'allowed range is ≥ −3 °C and ≤ 60 °C',
    );
    refused(['calc', 'water-density', 'temperature=20kg'], '"kg" is not a unit of temperature', '≥ −3 °C and ≤ 60 °C');
    refused(
      ['calc', 'reduced-gravity', 'rho_upper=998', 'rho_lower=1000x'],
      'kg/m3 or a unit',
      '≥ 500 kg/m³ and ≤ 3000 kg/m³',
    );
    // the value as typed carries its unit once (never "30 parsecs" parsecs)
    refused(['calc', 'water-density', 'temperature=30parsecs'], 'temperature = "30 parsecs" is not allowed');
    // in US units the range is shown in °F (NIST SP 811, App. B: °F = 1.8 °C + 32)
    refused(['calc', 'water-density', 'temperature=20kg', '--units', 'us'], '≥ 26.6 °F and ≤ 140 °F');
  });
});

describe('gprime calc jet-length-scales prints no NaN or Infinity', () => {
  // Fluxes and length scales of Fischer et al. (1979), §9.1–9.3: a scale without a current, buoyancy or stratification
  // does not exist, and must be left out rather than printed as Infinity or NaN.
  const port = ['calc', 'jet-length-scales', 'diameter=0.5', 'velocity=2'];
  for (const extra of [
    ['g_prime=0'],
    ['g_prime=0', 'current=0', 'buoyancy_frequency=0'],
    ['g_prime=-5', 'current=2', 'buoyancy_frequency=2'],
    ['g_prime=1e-12', 'buoyancy_frequency=1e-12'],
  ])
    it(extra.join(' '), () => {
      const r = runGprime([...port, ...extra]);
      expect(r.code, r.stderr).toBe(0);
      expect(r.stdout).not.toMatch(/NaN|Infinity/);
    });
});

describe('gprime assess --out refuses places it cannot write, before computing', () => {
  const site = join('examples', 'quillmere-reservoir.gpsite');

  it('an existing file, or a path below one', () => {
    const file = join(dir, 'existing.txt');
    writeFileSync(file, 'not a folder');
    refused(['assess', site, '--out', file], 'is an existing file, not a folder');
    refused(['assess', site, '--out', join(file, 'sub')], 'is a file, so no folder can be created under it');
  });

  it('the kernel file systems (/proc, /sys, /dev)', () => {
    refused(['assess', site, '--out', '/proc/x'], 'lies in /proc');
    refused(['assess', site, '--out', '/dev/null'], 'lies in /dev');
  });

  it('an option given twice', () => {
    refused(['assess', site, '--units', 'si', '--units', 'us'], '--units is given twice');
  });
});

describe('gprime calc names the profile parameter and file it cannot use', () => {
  it('a missing file and an unreadable profile: the parameter, the file and the reason in words', () => {
    refused(
      ['calc', 'profile-summary', `file=${join(dir, 'none.csv')}`],
      /^gprime: file = ".*none\.csv" is not allowed: cannot read ".*": there is no such file/,
    );
    const bad = join(dir, 'bad.csv');
    writeFileSync(bad, 'height,colour\n0,1\n1,2\n');
    const r = refused(
      ['calc', 'profile-summary', `file=${bad}`],
      'the profile cannot be read: the header: no temperature column',
    );
    expect(r.stderr).not.toMatch(/ProfileError|\(header\)|ENOENT/);
  });
});
