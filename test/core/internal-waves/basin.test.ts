import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runCheckValues } from '../../helpers/check-values';
import { InputError } from '../../../shared-core/core/errors';
import {
  internalSeichePeriodFromMode,
  internalSeichePeriodTwoLayer,
  lakeNumberImbergerPatterson1990,
  upwellingRiskStatement,
  wedderburnNumber,
  windStressLargePond1981,
} from '../../../shared-core/internal-waves/basin';

const n = (i: Record<string, number | string>, k: string) => Number(i[k]);

runCheckValues(
  'internal-waves',
  'internal-seiche-two-layer',
  (i) =>
    internalSeichePeriodTwoLayer(n(i, 'basin_length'), {
      rhoUpper: n(i, 'rho_upper'),
      rhoLower: n(i, 'rho_lower'),
      upperThickness: n(i, 'upper_thickness'),
      lowerThickness: n(i, 'lower_thickness'),
    }).value,
);
runCheckValues(
  'internal-waves',
  'internal-seiche-modes',
  (i) => internalSeichePeriodFromMode(n(i, 'basin_length'), n(i, 'celerity'), n(i, 'horizontal_mode')).value,
);
runCheckValues('internal-waves', 'wind-stress-large-pond-1981', (i) => {
  const r = windStressLargePond1981(n(i, 'wind_speed'));
  return i.output === 'stress' ? r.stress : r.shearVelocity;
});
runCheckValues('internal-waves', 'wedderburn', (i) => {
  const u =
    i.shear_velocity !== undefined ? n(i, 'shear_velocity') : windStressLargePond1981(n(i, 'wind_speed')).shearVelocity;
  return wedderburnNumber(n(i, 'g_prime'), n(i, 'upper_thickness'), u, n(i, 'basin_length')).value;
});

/** Density column of the Lake-number cases: tanh step of Δρ at the thermocline (sharp for the cylinder case). */
runCheckValues('internal-waves', 'lake-number', (i) => {
  const H = n(i, 'depth'),
    dT = n(i, 'thermocline_depth'),
    drho = n(i, 'delta_rho'),
    A0 = n(i, 'surface_area');
  const depth = Array.from({ length: 4001 }, (_, j) => (j * H) / 4000);
  const density = depth.map((d) =>
    i.basin === 'cylinder' ? (d < dT ? 998 : 998 + drho) : 998 + (drho / 2) * (1 + Math.tanh((d - dT) / 1.5)),
  );
  const hyps =
    i.basin === 'cylinder'
      ? { depth: [0, H], area: [A0, A0] }
      : { depth: depth, area: depth.map((d) => A0 * ((H - d) / H) ** 2) };
  const rho0 = i.basin === 'cylinder' ? 998 + drho : undefined;
  return lakeNumberImbergerPatterson1990({ depth, density }, hyps, n(i, 'shear_velocity'), dT, rho0, 4000).value;
});

describe('basin response', () => {
  it('the Wedderburn number falls with wind speed (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 30, noNaN: true }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        (u, du) => {
          const w = (U: number) => wedderburnNumber(0.02, 6, windStressLargePond1981(U).shearVelocity, 3000).value;
          expect(w(u + du)).toBeLessThan(w(u));
        },
      ),
      { numRuns: 100 },
    );
  });

  it('upwelling statements follow the W = 1 threshold of Thompson & Imberger (1980)', () => {
    expect(upwellingRiskStatement(0.5, 6)).toMatch(/^High/);
    expect(upwellingRiskStatement(3, 6)).toMatch(/^Moderate/);
    expect(upwellingRiskStatement(50, 6)).toMatch(/^Low/);
  });

  it('the wind-stress fit warns outside 4 … 25 m/s', () => {
    expect(windStressLargePond1981(2).warnings.length).toBe(1);
    expect(windStressLargePond1981(10).warnings.length).toBe(0);
  });

  it('Lake number ≈ W·(L/√A)(h2/H) for a two-layer vertical-walled basin (Imberger & Patterson 1990)', () => {
    const H = 30,
      h1 = 8,
      A = 9e6,
      L = 3000,
      u = 0.006;
    const depth = Array.from({ length: 3001 }, (_, j) => (j * H) / 3000);
    const density = depth.map((d) => (d < h1 ? 998 : 1000));
    const ln = lakeNumberImbergerPatterson1990(
      { depth, density },
      { depth: [0, H], area: [A, A] },
      u,
      h1,
      1000,
      3000,
    ).value;
    const W = wedderburnNumber((9.80665 * 2) / 1000, h1, u, L).value;
    expect(Math.abs(ln / (W * (L / Math.sqrt(A)) * ((H - h1) / H)) - 1)).toBeLessThan(3e-3);
  });

  it('bad input throws InputError', () => {
    expect(() => wedderburnNumber(0, 5, 0.01, 1000)).toThrow(InputError);
    expect(() =>
      internalSeichePeriodTwoLayer(-5, { rhoUpper: 998, rhoLower: 1000, upperThickness: 5, lowerThickness: 5 }),
    ).toThrow(InputError);
    expect(() =>
      lakeNumberImbergerPatterson1990(
        { depth: [0, 10], density: [998, 999] },
        { depth: [1, 10], area: [1e5, 0] },
        0.01,
        5,
      ),
    ).toThrow(InputError);
    expect(() =>
      lakeNumberImbergerPatterson1990(
        { depth: [0, 10], density: [998, 999] },
        { depth: [0, 10], area: [1e5, 0] },
        0.01,
        12,
      ),
    ).toThrow(InputError);
  });
});
