import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runCheckValues } from '../../helpers/check-values';
import {
  densityPureWaterTanaka2001,
  densityPureWaterKell1975,
  densitySeawaterEos80,
  densitySeawaterTeos10,
  densityWithSediment,
  dynamicViscosityKestin1978,
  kinematicViscosityWater,
  thermalConductivityRamires1995,
  specificHeatMillero1973,
  reducedGravity,
  densimetricFroude,
  waterDensity,
  thermalDiffusivityWater,
} from '../../../shared-core/water';
import { InputError } from '../../../shared-core/core/errors';
import type { DensityReference } from '../../../shared-core/water';

const n = (x: number | string) => Number(x);

runCheckValues('water', 'density-fresh-tanaka2001', (i) => densityPureWaterTanaka2001(n(i.temperature)).value);
runCheckValues('water', 'density-fresh-kell1975', (i) => densityPureWaterKell1975(n(i.temperature)).value);
runCheckValues(
  'water',
  'density-eos80',
  (i) => densitySeawaterEos80(n(i.salinity), n(i.temperature), n(i.pressure)).value,
);
runCheckValues(
  'water',
  'density-teos10-75term',
  (i) => densitySeawaterTeos10(n(i.salinity), n(i.temperature), n(i.pressure)).value,
);
runCheckValues(
  'water',
  'density-sediment-mixture',
  (i) => densityWithSediment(n(i.water), n(i.concentration), n(i.particle)).value,
);
runCheckValues('water', 'viscosity-kestin1978', (i) =>
  i.kinematic ? kinematicViscosityWater(n(i.temperature)).value : dynamicViscosityKestin1978(n(i.temperature)).value,
);
runCheckValues(
  'water',
  'thermal-conductivity-ramires1995',
  (i) => thermalConductivityRamires1995(n(i.temperature)).value,
);
runCheckValues('water', 'specific-heat-millero1973', (i) => specificHeatMillero1973(n(i.temperature)).value);
runCheckValues(
  'water',
  'reduced-gravity',
  (i) => reducedGravity(n(i.upper), n(i.lower), i.reference as DensityReference).value,
);
runCheckValues('water', 'densimetric-froude', (i) => densimetricFroude(n(i.velocity), n(i.g_prime), n(i.length)).value);

describe('water properties: invariants', () => {
  it('density rises with salinity (EOS-80 and TEOS-10) and with sediment', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 40, noNaN: true }),
        fc.double({ min: 0, max: 40, noNaN: true }),
        fc.double({ min: 0.01, max: 2, noNaN: true }),
        (s, t, ds) => {
          expect(densitySeawaterEos80(s + ds, t).value).toBeGreaterThan(densitySeawaterEos80(s, t).value);
          expect(densitySeawaterTeos10(s + ds, t).value).toBeGreaterThan(densitySeawaterTeos10(s, t).value);
          expect(waterDensity({ temperature: t, salinity: s, sediment: ds }).value).toBeGreaterThan(
            waterDensity({ temperature: t, salinity: s }).value,
          );
        },
      ),
    );
  });

  it('fresh water is densest near 4 °C (Tanaka et al. 2001: maximum at 3.98 °C)', () => {
    const at = (t: number) => densityPureWaterTanaka2001(t).value;
    expect(at(3.98)).toBeGreaterThan(at(3.5));
    expect(at(3.98)).toBeGreaterThan(at(4.5));
  });

  it('thermal diffusivity of water at 20 °C is about 1.43e-7 m²/s (Incropera & DeWitt, Table A.6 — from memory)', () => {
    expect(thermalDiffusivityWater(20).value).toBeCloseTo(1.43e-7, 8);
  });

  it('warns outside the validated ranges instead of failing', () => {
    expect(densityPureWaterTanaka2001(50).warnings).toMatchObject([
      { code: 'validity-range', severity: 'outside-validity', input: 'temperature' },
    ]);
    expect(densitySeawaterEos80(45, 10).warnings).toMatchObject([{ code: 'validity-range', input: 'salinity' }]);
    expect(reducedGravity(1000, 1200).warnings).toMatchObject([{ code: 'non-boussinesq', severity: 'caution' }]);
    expect(reducedGravity(1000, 1200).warnings[0].message).toMatch(/Boussinesq/);
  });

  it('names the input of a structured warning', () => {
    expect(reducedGravity(1010, 1000).warnings.map((w) => [w.code, w.input])).toEqual([
      ['unstable-layering', 'rho_lower'],
    ]);
    expect(waterDensity({ temperature: 10, pressure: 100, eos: 'fresh' }).warnings).toMatchObject([
      { code: 'pressure-ignored', severity: 'note', input: 'pressure' },
    ]);
  });
});

describe('water properties: bad input', () => {
  it('throws InputError naming the field, never returns NaN', () => {
    fc.assert(
      fc.property(fc.double(), fc.double(), fc.double(), (t, s, p) => {
        for (const f of [
          () => densitySeawaterEos80(s, t, p),
          () => densitySeawaterTeos10(s, t, p),
          () => waterDensity({ temperature: t, salinity: s, sediment: p, eos: s > 0 ? 'eos80' : 'fresh' }),
        ]) {
          try {
            const r = f();
            expect(Number.isFinite(r.value)).toBe(true);
          } catch (e) {
            expect(e).toBeInstanceOf(InputError);
          }
        }
      }),
    );
  });

  it('names field, value, unit and range in the message', () => {
    expect(() => densitySeawaterEos80(35, 99)).toThrow(
      /temperature = ⟦99\|degC\|6⟧ is not allowed: allowed range is ≥ ⟦-3\|degC\|6⟧ and ≤ ⟦60\|degC\|6⟧/,
    );
    expect(() => waterDensity({ temperature: 10, salinity: 5, eos: 'fresh' })).toThrow(/salinity/);
    expect(() => densimetricFroude(1, 0, 1)).toThrow(/g_prime/);
  });
});
