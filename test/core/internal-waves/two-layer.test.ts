import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runCheckValues } from '../../helpers/check-values';
import { InputError } from '../../../shared-core/core/errors';
import { GRAVITY } from '../../../shared-core/quantities';
import {
  dispersionCurve,
  interfacialCelerityBoussinesq,
  interfacialCelerityRigidLid,
  solitaryWaveKdv,
  twoLayerFreeSurfaceCelerities,
  type TwoLayer,
} from '../../../shared-core/internal-waves/two-layer';

const state = (i: Record<string, number | string>): TwoLayer => ({
  rhoUpper: Number(i.rho_upper),
  rhoLower: Number(i.rho_lower),
  upperThickness: Number(i.upper_thickness),
  lowerThickness: Number(i.lower_thickness),
});
const wl = (i: Record<string, number | string>) => (i.wavelength === undefined ? undefined : Number(i.wavelength));

runCheckValues(
  'internal-waves',
  'interfacial-celerity-boussinesq',
  (i) => interfacialCelerityBoussinesq(Number(i.g_prime), Number(i.upper_thickness), Number(i.lower_thickness)).value,
);
runCheckValues(
  'internal-waves',
  'interfacial-dispersion-rigid-lid',
  (i) => interfacialCelerityRigidLid(state(i), wl(i)).value,
);
runCheckValues('internal-waves', 'interfacial-dispersion-free-surface', (i) => {
  const r = twoLayerFreeSurfaceCelerities(state(i), wl(i));
  return i.root === 'surface' ? r.surface : r.interfacial;
});
runCheckValues('internal-waves', 'solitary-wave-kdv', (i) => {
  const r = solitaryWaveKdv(state(i), Number(i.amplitude));
  return i.output === 'limiting_amplitude' ? r.limitingAmplitude : i.output === 'half_width' ? r.halfWidth : r.celerity;
});

const layers = fc
  .record({
    rhoUpper: fc.double({ min: 990, max: 1025, noNaN: true }),
    drho: fc.double({ min: 0.01, max: 30, noNaN: true }),
    upperThickness: fc.double({ min: 0.2, max: 200, noNaN: true }),
    lowerThickness: fc.double({ min: 0.2, max: 200, noNaN: true }),
  })
  .map((r) => ({
    rhoUpper: r.rhoUpper,
    rhoLower: r.rhoUpper + r.drho,
    upperThickness: r.upperThickness,
    lowerThickness: r.lowerThickness,
  }));

describe('two-layer dispersion: limits and invariants', () => {
  it('every finite-wavelength relation tends to its long-wave form as k → 0 (Gill 1982 §6.2; Turner 1973 §2.1)', () => {
    fc.assert(
      fc.property(layers, (s) => {
        const long = 1e4 * (s.upperThickness + s.lowerThickness);
        const fsLong = twoLayerFreeSurfaceCelerities(s),
          fsK = twoLayerFreeSurfaceCelerities(s, long);
        expect(Math.abs(fsK.interfacial / fsLong.interfacial - 1)).toBeLessThan(1e-6);
        expect(Math.abs(fsK.surface / fsLong.surface - 1)).toBeLessThan(1e-6);
        expect(
          Math.abs(interfacialCelerityRigidLid(s, long).value / interfacialCelerityRigidLid(s).value - 1),
        ).toBeLessThan(1e-6);
      }),
      { numRuns: 200 },
    );
  });

  it('the Lamb quartic with ρ1 in the ω⁴ bracket would fail the long-wave limit; ours reproduces √(g(h1+h2)) for the surface root when Δρ → 0', () => {
    const s = { rhoUpper: 999.999, rhoLower: 1000, upperThickness: 4, lowerThickness: 16 };
    expect(Math.abs(twoLayerFreeSurfaceCelerities(s).surface / Math.sqrt(GRAVITY * 20) - 1)).toBeLessThan(1e-6);
  });

  it('short waves: the interfacial speed tends to the deep-layer form √(g(ρ2 − ρ1)/(k(ρ1 + ρ2))) (Lamb 1932 §231)', () => {
    const s = { rhoUpper: 998, rhoLower: 1000, upperThickness: 20, lowerThickness: 30 };
    const lam = 2,
      k = (2 * Math.PI) / lam;
    const deep = Math.sqrt((GRAVITY * 2) / (k * 1998));
    expect(interfacialCelerityRigidLid(s, lam).value).toBeCloseTo(deep, 10);
    expect(twoLayerFreeSurfaceCelerities(s, lam).interfacial).toBeCloseTo(deep, 6);
  });

  it('speeds fall as the waves shorten; interfacial < rigid-lid ≤ Boussinesq-free; surface root ≫ interfacial', () => {
    fc.assert(
      fc.property(layers, (s) => {
        const curve = dispersionCurve(s, 20);
        for (let i = 1; i < curve.length; i++) {
          expect(curve[i].rigidLid).toBeLessThanOrEqual(curve[i - 1].rigidLid * (1 + 1e-12));
          expect(curve[i].interfacial).toBeLessThanOrEqual(curve[i - 1].interfacial * (1 + 1e-12));
        }
        for (const p of curve) {
          expect(p.interfacial).toBeLessThanOrEqual(p.rigidLid * (1 + 1e-9));
          expect(p.surface).toBeGreaterThan(p.interfacial);
          expect(Number.isFinite(p.surface + p.interfacial + p.rigidLid)).toBe(true);
        }
      }),
      { numRuns: 100 },
    );
  });
});

describe('KdV solitary wave', () => {
  it('polarity: depression when the upper layer is thinner, elevation when thicker (Helfrich & Melville 2006 §2)', () => {
    const base = { rhoUpper: 998, rhoLower: 1000 };
    expect(solitaryWaveKdv({ ...base, upperThickness: 5, lowerThickness: 20 }, 1).polarity).toBe('depression');
    expect(solitaryWaveKdv({ ...base, upperThickness: 20, lowerThickness: 5 }, 1).polarity).toBe('elevation');
    expect(solitaryWaveKdv({ ...base, upperThickness: 10, lowerThickness: 10 }, 1).polarity).toBe('none');
  });

  it('the speed rises with amplitude and equals the linear speed at zero amplitude', () => {
    fc.assert(
      fc.property(layers, fc.double({ min: 0, max: 1, noNaN: true }), (s, f) => {
        const lim = Math.abs(s.lowerThickness - s.upperThickness) / 2;
        const a = solitaryWaveKdv(s, f * lim),
          zero = solitaryWaveKdv(s, 0);
        expect(zero.celerity).toBe(zero.linearCelerity);
        expect(a.celerity).toBeGreaterThanOrEqual(zero.celerity);
      }),
      { numRuns: 100 },
    );
  });

  it('warns beyond the limiting amplitude', () => {
    const r = solitaryWaveKdv({ rhoUpper: 998, rhoLower: 1000, upperThickness: 5, lowerThickness: 15 }, 6);
    expect(r.warnings).toMatchObject([
      { code: 'amplitude-over-limit', severity: 'outside-validity', input: 'amplitude' },
    ]);
    expect(r.warnings[0].message).toMatch(/exceeds the limiting amplitude/);
  });
});

describe('bad input', () => {
  it('throws InputError for inverted or meaningless layers, never NaN', () => {
    expect(() =>
      interfacialCelerityRigidLid({ rhoUpper: 1000, rhoLower: 999, upperThickness: 5, lowerThickness: 5 }),
    ).toThrow(InputError);
    expect(() =>
      twoLayerFreeSurfaceCelerities({ rhoUpper: 998, rhoLower: 1000, upperThickness: 0, lowerThickness: 5 }),
    ).toThrow(InputError);
    expect(() =>
      twoLayerFreeSurfaceCelerities({ rhoUpper: 998, rhoLower: 1000, upperThickness: 5, lowerThickness: 5 }, -3),
    ).toThrow(InputError);
    expect(() => solitaryWaveKdv({ rhoUpper: 998, rhoLower: 1000, upperThickness: 5, lowerThickness: 5 }, NaN)).toThrow(
      InputError,
    );
  });

  it('never lets an uncaught non-InputError or a NaN out (property)', () => {
    fc.assert(
      fc.property(
        fc.double(),
        fc.double(),
        fc.double(),
        fc.double(),
        fc.option(fc.double(), { nil: undefined }),
        (r1, r2, h1, h2, lam) => {
          try {
            const r = twoLayerFreeSurfaceCelerities(
              { rhoUpper: r1, rhoLower: r2, upperThickness: h1, lowerThickness: h2 },
              lam,
            );
            expect(Number.isFinite(r.interfacial) && Number.isFinite(r.surface)).toBe(true);
          } catch (e) {
            expect(e).toBeInstanceOf(InputError);
          }
        },
      ),
      { numRuns: 300 },
    );
  });
});
