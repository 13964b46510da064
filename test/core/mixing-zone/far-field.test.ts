import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { runCalc } from '../../../shared-core/calc/resolve';
import { InputError } from '../../../shared-core/core/errors';
import { mixingZoneCalcMethods } from '../../../shared-core/mixing-zone/calc';
import {
  DEFAULT_FAR_FIELD_ALPHA,
  farFieldSpreadingBrooks1960,
  SLACK_CURRENT,
} from '../../../shared-core/mixing-zone/far-field';
import { runCheckValues } from '../../helpers/check-values';

runCheckValues('mixing-zone', 'far-field', (i) => {
  const r = farFieldSpreadingBrooks1960(
    Number(i.width),
    Number(i.current),
    Number(i.distance),
    i.alpha === undefined ? undefined : Number(i.alpha),
  );
  return i.result === 'width' ? r.width : r.dilution;
});

const farField = mixingZoneCalcMethods.find((m) => m.id === 'far-field')!;
const codes = (ws: { code: string }[]) => ws.map((w) => w.code);

describe('far-field (Brooks 1960 4/3-law)', () => {
  it('default α is 0.01 cm^(2/3)/s in SI (unit conversion: 1 cm^(2/3) = 0.01^(2/3) m^(2/3))', () => {
    expect(DEFAULT_FAR_FIELD_ALPHA).toBeCloseTo(4.6416e-4, 7);
  });

  it('x → 0 gives a factor tending to 1 and a width tending to b (Fischer et al. 1979 ch. 9: field starts undiluted)', () => {
    const r = farFieldSpreadingBrooks1960(50, 0.2, 1e-4);
    expect(r.dilution - 1).toBeLessThan(1e-12);
    expect(r.width / 50 - 1).toBeLessThan(1e-6);
  });

  it('large x: S grows like x^(3/2) (erf z ≈ 2z/√π, Fischer et al. 1979 ch. 9)', () => {
    const s1 = farFieldSpreadingBrooks1960(10, 0.1, 2e5).dilution;
    const s2 = farFieldSpreadingBrooks1960(10, 0.1, 8e5).dilution;
    expect(Math.log(s2 / s1) / Math.log(4)).toBeCloseTo(1.5, 2);
  });

  it('dilution ≥ 1 and rising with distance; width rising with distance (property of the closed form)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 1000, noNaN: true }),
        fc.double({ min: 0.01, max: 2, noNaN: true }),
        fc.double({ min: 0, max: 1e5, noNaN: true }),
        fc.double({ min: 1e-4, max: 2e-3, noNaN: true }),
        (b, u, x, a) => {
          const near = farFieldSpreadingBrooks1960(b, u, x, a);
          const far = farFieldSpreadingBrooks1960(b, u, x * 1.5 + 1, a);
          expect(near.dilution).toBeGreaterThanOrEqual(1);
          expect(far.dilution).toBeGreaterThanOrEqual(near.dilution);
          expect(far.width).toBeGreaterThan(near.width);
        },
      ),
      { numRuns: 200, seed: 12 },
    );
  });

  it('warns at slack water, notes a zero distance, flags a travel time beyond half a tidal period', () => {
    expect(codes(farFieldSpreadingBrooks1960(20, SLACK_CURRENT / 2, 500).warnings)).toEqual(['slack-current']);
    const zero = farFieldSpreadingBrooks1960(20, 0.2, 0);
    expect(zero.dilution).toBe(1);
    expect(zero.warnings).toEqual([
      expect.objectContaining({ code: 'no-far-field', severity: 'note', input: 'distance' }),
    ]);
    const long = farFieldSpreadingBrooks1960(20, 0.1, 0.1 * 7 * 3600);
    expect(long.warnings).toEqual([
      expect.objectContaining({ code: 'far-field-long-travel', severity: 'outside-validity', input: 'distance' }),
    ]);
    expect(farFieldSpreadingBrooks1960(20, 0.1, 0.1 * 6 * 3600).warnings).toEqual([]);
  });

  it('refuses a meaningless width, current or distance with a named input error', () => {
    expect(() => farFieldSpreadingBrooks1960(0, 0.1, 10)).toThrow(InputError);
    expect(() => farFieldSpreadingBrooks1960(10, -0.1, 10)).toThrow(/current/);
    expect(() => farFieldSpreadingBrooks1960(10, 0.1, -1)).toThrow(/distance/);
  });

  it('calc method: results, default α, series of kind far-field-dilution ending at the result', () => {
    const out = runCalc(farField, { width: '20 m', current: '0.15 m/s', distance: '2 km' });
    const direct = farFieldSpreadingBrooks1960(20, 0.15, 2000);
    expect(out.results.dilution).toEqual({ value: direct.dilution, unit: '1' });
    expect(out.results.field_width).toEqual({ value: direct.width, unit: 'm' });
    const series = out.series!.find((s) => s.kind === 'far-field-dilution')!;
    expect(series.x.values[0]).toBe(0);
    expect(series.x.values.at(-1)).toBe(2000);
    expect(series.y[0].values[0]).toBe(1);
    expect(series.y[0].values.at(-1)).toBe(direct.dilution);
    expect(series.y[1].values.at(-1)).toBe(direct.width);
  });

  it('calc method at the corners of its hard ranges gives finite results', () => {
    for (const width of [0.1, 1e4])
      for (const current of [1e-3, 5])
        for (const alpha of [1e-5, 1e-2]) {
          const out = runCalc(farField, { width, current, distance: 1e6, alpha });
          expect(Number.isFinite(out.results.dilution.value as number)).toBe(true);
        }
  });
});
