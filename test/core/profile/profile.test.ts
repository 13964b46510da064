import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runCheckValues } from '../../helpers/check-values';
import {
  parseProfileCsv,
  makeProfile,
  n2Profile,
  stabilityFlags,
  mixedLayerDepth,
  thermoclineDepth,
  twoLayerFit,
  interpolateAt,
  interpolateSorted,
  ProfileError,
  NEUTRAL_N2,
  parseHeader,
  profileFromTable,
} from '../../../shared-core/profile';
import { summariseProfile } from '../../../shared-core/profile/calc';
import { LIMITS } from '../../../shared-core/core/limits';
import { densitySeawaterEos80 } from '../../../shared-core/water';
import { GRAVITY } from '../../../shared-core/quantities';

const fixture = (name: string) =>
  parseProfileCsv(readFileSync(resolve(import.meta.dirname, '../../fixtures/profiles', name), 'utf8'));

runCheckValues('profile', 'two-layer-least-squares', (i) => {
  const fit = twoLayerFit(fixture(String(i.profile)));
  return i.output === 'upper_thickness' ? fit.upperThickness : fit.gPrime;
});
runCheckValues('profile', 'thermocline-max-gradient', (i) => thermoclineDepth(fixture(String(i.profile))).value);
runCheckValues('profile', 'mixed-layer-density-threshold', (i) => mixedLayerDepth(fixture(String(i.profile))).value);

describe('CSV import', () => {
  it('reads units in headers, semicolons and decimal commas', () => {
    const p = parseProfileCsv('Depth [ft];Temp (degF);Sal (psu);DO (mg/L)\n0;68,0;0;8,1\n10;59,0;0;7,9\n');
    expect(p.depth[1]).toBeCloseTo(3.048, 10); // NIST SP 811: 1 ft = 0.3048 m exactly
    expect(p.temperature[0]).toBeCloseTo(20, 10);
    expect(p.temperature[1]).toBeCloseTo(15, 10);
    expect(p.extra[0]).toEqual({ name: 'DO', unit: 'mg/L', values: [8.1, 7.9] });
  });

  it('reads tabs, elevation columns (bottom-up) and mg/L sediment', () => {
    const p = parseProfileCsv('elevation (m)\ttemperature (C)\tTSS (mg/L)\n90\t8\t20\n95\t12\t10\n100\t20\t5\n');
    expect(p.depth).toEqual([0, 5, 10]);
    expect(p.temperature).toEqual([20, 12, 8]);
    expect(p.sediment[2]).toBeCloseTo(0.02, 12);
  });

  it('reports every bad row with row and column', () => {
    try {
      parseProfileCsv('depth (m),temperature (degC)\n0,20\n1,abc\n2,\n3,xyz\n');
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(ProfileError);
      const msg = (e as Error).message;
      expect(msg).toMatch(/row 2, column "temperature": "abc" is not a number/);
      expect(msg).toMatch(/row 4, column "temperature": "xyz" is not a number/);
      expect(msg).not.toMatch(/row 3/); // a blank cell skips its row with a warning instead
    }
    expect(() => parseProfileCsv('depth (m),temperature (degC)\n0,20\n1,99\n')).toThrow(
      /row 2, column "temperature": ⟦99\|degC\|6⟧ is physically impossible/,
    );
    expect(() => parseProfileCsv('depth (kg),temperature (degC)\n0,20\n5,19\n')).toThrow(
      /column "depth": "kg" is not a unit of length; give a length in m/,
    );
    expect(() => parseProfileCsv('height,colour\n0,1\n1,2\n')).toThrow(/no temperature column/);
  });

  it('drops repeated and out-of-order depths with a warning naming the rows', () => {
    const dup = parseProfileCsv('depth (m),temperature (degC)\n0,20\n0,19\n5,18\n');
    expect(dup.depth).toEqual([0, 5]);
    expect(dup.warnings.find((w) => w.code === 'duplicate-depths')?.message).toMatch(/row 2\b/);
    const back = parseProfileCsv('depth (m),temperature (degC)\n0,20\n5,19\n3,18\n8,17\n');
    expect(back.depth).toEqual([0, 5, 8]);
    expect(back.warnings.find((w) => w.code === 'rows-out-of-order')?.message).toMatch(/row 3: shallower/);
  });

  it('reads a long elevation profile (150 000 rows) without overflowing the stack', () => {
    // spreading ≥ ~150 000 values into Math.max throws RangeError in V8 (field notes); reading must loop
    const n = 150_000;
    const rows = Array.from({ length: n }, (_, i) => [100 - i * 0.0005, 20 - i * 0.0001]);
    const p = profileFromTable({ columns: ['elevation (m)', 'temperature (degC)'], rows });
    expect(p.depth.length).toBe(n);
    expect(p.depth[0]).toBe(0);
    expect(p.depth[n - 1]).toBeCloseTo((n - 1) * 0.0005, 9);
    expect(summariseProfile(p).results.n2_max.value).toBeGreaterThan(0);
  });

  it('refuses more rows than LIMITS.profileRows, naming the limit', () => {
    const tooMany = LIMITS.profileRows + 1;
    const rows = new Array<(string | number)[]>(tooMany).fill(['1', '10']);
    const table = () => profileFromTable({ columns: ['depth (m)', 'temperature (degC)'], rows });
    expect(table).toThrow(ProfileError);
    expect(table).toThrow(`has ${tooMany} data rows, more than the ${LIMITS.profileRows} rows one profile may have`);
    const column = new Array<number>(tooMany).fill(10);
    expect(() => makeProfile({ depth: column, temperature: column })).toThrow(/more than the 1000000 rows/);
  });

  it('splits header names and units in the common forms', () => {
    expect(parseHeader('depth (ft)')).toEqual({ name: 'depth', unit: 'ft' });
    expect(parseHeader('Temp [degF]')).toEqual({ name: 'Temp', unit: 'degF' });
    expect(parseHeader('depth_m')).toEqual({ name: 'depth', unit: 'm' });
    expect(parseHeader('DO mg/L')).toEqual({ name: 'DO', unit: 'mg/L' });
  });
});

describe('stratification', () => {
  it('N² of a linear salinity gradient equals g/ρ dρ/dd (Gill 1982, Eq. 3.7.5)', () => {
    const depth = [0, 10, 20, 30];
    const p = makeProfile({ depth, temperature: [10, 10, 10, 10], salinity: [30, 31, 32, 33] });
    const { n2 } = n2Profile(p);
    const rho = depth.map((_, i) => densitySeawaterEos80(30 + i, 10).value);
    n2.forEach((v, i) =>
      expect(v).toBeCloseTo((GRAVITY * (rho[i + 1] - rho[i])) / (0.5 * (rho[i] + rho[i + 1]) * 10), 12),
    );
  });

  it('the N² sign matches the stability flag (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 30, noNaN: true }), { minLength: 2, maxLength: 30 }), (temps) => {
        const p = makeProfile({ depth: temps.map((_, i) => i), temperature: temps });
        const flags = stabilityFlags(p);
        for (const f of flags) {
          if (f.stability === 'unstable') expect(f.n2).toBeLessThan(-NEUTRAL_N2);
          if (f.stability === 'stable') expect(f.n2).toBeGreaterThan(NEUTRAL_N2);
          if (f.stability === 'neutral') expect(Math.abs(f.n2)).toBeLessThanOrEqual(NEUTRAL_N2);
        }
      }),
    );
  });

  it('the two-layer fit conserves the column mass and brackets the profile (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 4, max: 30, noNaN: true }), { minLength: 3, maxLength: 20 }), (temps) => {
        const sorted = [...temps].sort((a, b) => b - a); // warm on top: stable
        const p = makeProfile({ depth: sorted.map((_, i) => i * 2), temperature: sorted });
        const fit = twoLayerFit(p, 200);
        const min = Math.min(...p.density),
          max = Math.max(...p.density);
        expect(fit.rhoUpper).toBeGreaterThanOrEqual(min - 1e-9);
        expect(fit.rhoLower).toBeLessThanOrEqual(max + 1e-9);
        expect(fit.gPrime).toBeGreaterThanOrEqual(-1e-12);
        const bottom = p.depth[p.depth.length - 1];
        const cells = 200,
          dz = bottom / cells;
        let mass = 0;
        for (let i = 0; i < cells; i++) mass += interpolateAt(p.depth, p.density, (i + 0.5) * dz) * dz;
        expect(fit.rhoUpper * fit.upperThickness + fit.rhoLower * fit.lowerThickness).toBeCloseTo(mass, 6);
      }),
    );
  });

  it('gives structured warnings: a density inversion names the profile input', () => {
    const inverted = makeProfile({ depth: [0, 5, 10, 20], temperature: [20, 24, 12, 8] });
    const w = summariseProfile(inverted).warnings;
    expect(w.filter((x) => x.code === 'density-inversion')).toMatchObject([{ severity: 'caution', input: 'file' }]);
    expect(w.map((x) => x.code)).toContain('two-layer-overestimates-speed');
    const mixed = makeProfile({ depth: [0, 10], temperature: [12, 12] });
    expect(summariseProfile(mixed).warnings.map((x) => x.code)).toEqual(
      expect.arrayContaining(['mixed-to-bottom', 'no-thermocline', 'nearly-mixed']),
    );
  });

  it('interpolating at increasing depths in one walk equals interpolateAt at each (property)', () => {
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.double({ min: 0, max: 100, noNaN: true }), { minLength: 2, maxLength: 12 }),
        fc.array(fc.double({ min: -10, max: 110, noNaN: true }), { minLength: 1, maxLength: 30 }),
        (depths, at) => {
          const d = [...depths].sort((a, b) => a - b);
          const v = d.map((x) => Math.sin(x));
          const targets = [...at].sort((a, b) => a - b);
          expect(interpolateSorted(d, v, targets)).toEqual(targets.map((t) => interpolateAt(d, v, t)));
        },
      ),
    );
  });

  it('never lets NaN out of a profile built from arbitrary numbers', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double(), { minLength: 0, maxLength: 6 }),
        fc.array(fc.double(), { minLength: 0, maxLength: 6 }),
        (d, t) => {
          try {
            const p = makeProfile({ depth: d, temperature: t });
            expect(p.density.every(Number.isFinite)).toBe(true);
          } catch (e) {
            expect(e).toBeInstanceOf(ProfileError);
          }
        },
      ),
    );
  });
});
