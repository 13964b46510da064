import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runCheckValues } from '../../helpers/check-values';
import { InputError } from '../../../shared-core/core/errors';
import { parseProfileCsv, twoLayerFit } from '../../../shared-core/profile';
import {
  constantN2Column,
  verticalModesFromN2,
  verticalModesFromProfile,
  type N2Column,
} from '../../../shared-core/internal-waves/modes';
import { twoLayerFreeSurfaceCelerities } from '../../../shared-core/internal-waves/two-layer';

/** N² = N0² sech²((d − d0)/δ) + Nb², sampled finely (the same analytic column the scipy generator shoots on). */
function tanhColumn(i: Record<string, number | string>): N2Column {
  const H = Number(i.depth),
    n0 = Number(i.n0),
    nb = Number(i.nb),
    d0 = Number(i.d0),
    delta = Number(i.delta);
  const depth = Array.from({ length: 8001 }, (_, j) => (j * H) / 8000);
  return { depth, n2: depth.map((d) => n0 ** 2 / Math.cosh((d - d0) / delta) ** 2 + nb ** 2) };
}

runCheckValues('internal-waves', 'vertical-modes', (i) => {
  const H = Number(i.depth),
    mode = Number(i.mode);
  const column = i.profile === 'constant' ? constantN2Column(Number(i.n), H) : tanhColumn(i);
  const surface = i.surface === 'free-surface' ? 'free-surface' : 'rigid-lid';
  return verticalModesFromN2(column, H, { modes: mode, cells: 2000, surface }).modes[mode - 1].celerity;
});

const demo = () =>
  parseProfileCsv(readFileSync(resolve(import.meta.dirname, '../../../examples/demo-profile.csv'), 'utf8'));

describe('vertical modes', () => {
  it('constant N: mode shapes are sin(nπd/H) for w and cos(nπd/H) for u (Gill 1982 §6.11)', () => {
    const H = 50,
      r = verticalModesFromN2(constantN2Column(0.01, H), H, { modes: 3, cells: 1000 });
    r.modes.forEach((m) => {
      const sign = Math.sign(m.displacement[Math.round(1000 / (2 * m.n))]);
      r.depth.forEach((d, j) => {
        expect(Math.abs(m.displacement[j] - sign * Math.sin((m.n * Math.PI * d) / H))).toBeLessThan(1e-4);
      });
      expect(m.displacement[0]).toBe(0);
      expect(m.displacement[r.depth.length - 1]).toBe(0);
      expect(Math.abs(Math.abs(m.horizontalVelocity[0]) - 1)).toBeLessThan(1e-3);
    });
  });

  it('mode n has n − 1 interior zero crossings of w and falling speeds (Sturm–Liouville)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.002, max: 0.1, noNaN: true }),
        fc.double({ min: 2, max: 30, noNaN: true }),
        fc.double({ min: 0.5, max: 5, noNaN: true }),
        (n0, d0, delta) => {
          const col = {
            depth: Array.from({ length: 201 }, (_, j) => j * 0.2),
            n2: Array.from({ length: 201 }, (_, j) => n0 ** 2 / Math.cosh((j * 0.2 - d0) / delta) ** 2 + 1e-8),
          };
          const r = verticalModesFromN2(col, 40, { modes: 3, cells: 400 });
          r.modes.forEach((m, i) => {
            const w = m.displacement.slice(1, -1).filter((x) => Math.abs(x) > 1e-9);
            const crossings = w.filter((x, j) => j > 0 && Math.sign(x) !== Math.sign(w[j - 1])).length;
            expect(crossings).toBe(i);
            if (i > 0) expect(m.celerity).toBeLessThan(r.modes[i - 1].celerity);
            expect(Number.isFinite(m.celerity)).toBe(true);
          });
        },
      ),
      { numRuns: 40 },
    );
  });

  it('free surface: the barotropic root is ≈ √(gH) and internal speeds barely change', () => {
    const H = 40,
      col = constantN2Column(0.02, H);
    const lid = verticalModesFromN2(col, H, { modes: 2 }),
      fs = verticalModesFromN2(col, H, { modes: 2, surface: 'free-surface' });
    expect(Math.abs(fs.surfaceCelerity! / Math.sqrt(9.80665 * H) - 1)).toBeLessThan(1e-3);
    expect(Math.abs(fs.modes[0].celerity / lid.modes[0].celerity - 1)).toBeLessThan(1e-3);
  });

  it('demo profile: the two-layer reduction overestimates the first-mode speed by a few % to ≈ 10 % (field notes; Gill 1982 §6.11)', () => {
    const p = demo();
    const modes = verticalModesFromProfile(p, { modes: 2 });
    const fit = twoLayerFit(p);
    const twoLayer = twoLayerFreeSurfaceCelerities({
      rhoUpper: fit.rhoUpper,
      rhoLower: fit.rhoLower,
      upperThickness: fit.upperThickness,
      lowerThickness: fit.lowerThickness,
    }).interfacial;
    const excess = twoLayer / modes.modes[0].celerity - 1;
    expect(excess).toBeGreaterThan(0);
    expect(excess).toBeLessThan(0.25);
  });

  it('refuses a mixed column and bad options with InputError', () => {
    expect(() => verticalModesFromN2({ depth: [0, 10], n2: [0, 0] }, 10)).toThrow(InputError);
    expect(() => verticalModesFromN2(constantN2Column(0.01, 10), -1)).toThrow(InputError);
    expect(() => verticalModesFromN2(constantN2Column(0.01, 10), 10, { modes: 0 })).toThrow(InputError);
    expect(() => constantN2Column(NaN, 10)).toThrow(InputError);
  });

  it('warns about density inversions and treats them as neutral', () => {
    const r = verticalModesFromN2({ depth: [0, 5, 10, 20], n2: [1e-4, -1e-4, 1e-3, 1e-4] }, 20, { modes: 1 });
    expect(r.warnings).toMatchObject([{ code: 'negative-n2-clipped', severity: 'caution' }]);
    expect(r.n2.every((v) => v >= 0)).toBe(true);
  });
});
