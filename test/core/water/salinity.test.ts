import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runCheckValues } from '../../helpers/check-values';
import {
  depthFromPressureUnesco1983,
  practicalSalinityFromSpecificConductance,
  practicalSalinityPss78,
} from '../../../shared-core/water/salinity';
import { waterCalcMethods } from '../../../shared-core/water/calc';
import { runCalc } from '../../../shared-core/calc/resolve';
import { InputError } from '../../../shared-core/core/errors';

const n = (x: number | string) => Number(x);

runCheckValues(
  'water',
  'practical-salinity-pss78',
  (i) => practicalSalinityPss78(n(i.conductivity), n(i.temperature), n(i.pressure)).value,
);
runCheckValues(
  'water',
  'depth-from-pressure-unesco1983',
  (i) => depthFromPressureUnesco1983(n(i.pressure), n(i.latitude)).value,
);

const salinityMethod = waterCalcMethods.find((m) => m.id === 'salinity')!;

describe('salinity calc method', () => {
  it('takes conductivity in mS/cm, S/m or µS/cm (1 S/m = 10 mS/cm = 10 000 µS/cm, SI definition)', () => {
    const run = (c: string) => runCalc(salinityMethod, { conductivity: c, temperature: '15', pressure: '0' });
    const ref = run('42.914 mS/cm').results.salinity.value as number;
    // Fofonoff & Millard (1983), UNESCO Tech. Pap. Mar. Sci. 44: R = 1 at t68 = 15 °C gives S = 35 (from memory);
    // here t90 = 15 °C, 0.0036 °C below t68 = 15 °C, which lowers S by about 3e-4 (dS/dt ≈ −0.09 per °C at R = 1)
    expect(ref).toBeCloseTo(35, 2);
    expect(run('4.2914 S/m').results.salinity.value).toBeCloseTo(ref, 10);
    expect(run('42914 µS/cm').results.salinity.value).toBeCloseTo(ref, 10);
    expect(run('42914 uS/cm').results.salinity.value).toBeCloseTo(ref, 10);
  });

  it('refuses negative conductivity, naming the parameter', () => {
    expect(() => runCalc(salinityMethod, { conductivity: '-1', temperature: '15' })).toThrow(/conductivity/);
  });

  it('specific conductance is PSS-78 at 25 °C and is labelled as such', () => {
    const r = practicalSalinityFromSpecificConductance(1.0);
    expect(r.value).toBe(practicalSalinityPss78(1.0, 25, 0).value);
    expect(r.warnings.map((w) => w.code)).toContain('salinity-from-specific-conductance');
  });

  it('salinity rises with conductivity and is never negative (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 70, noNaN: true }),
        fc.double({ min: 0.001, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 35, noNaN: true }),
        fc.double({ min: 0, max: 2000, noNaN: true }),
        (c, dc, t, p) => {
          const a = practicalSalinityPss78(c, t, p).value;
          const b = practicalSalinityPss78(c + dc, t, p).value;
          expect(a).toBeGreaterThanOrEqual(0);
          // at the lowest conductivities Hill et al. (1986) fall below 0, which is clipped to 0 (as GSW does)
          if (a > 1e-6) expect(b).toBeGreaterThan(a);
          else expect(b).toBeGreaterThanOrEqual(0);
        },
      ),
    );
  });

  it('joins PSS-78 continuously at S = 2 (Hill et al. 1986 scaled to meet it)', () => {
    for (const t of [0, 10, 20, 30]) {
      let lo = 0.1,
        hi = 10;
      for (let k = 0; k < 80; k++) {
        const mid = (lo + hi) / 2;
        if (practicalSalinityPss78(mid, t).value < 2) lo = mid;
        else hi = mid;
      }
      const below = practicalSalinityPss78(lo * (1 - 1e-9), t).value;
      const above = practicalSalinityPss78(hi * (1 + 1e-9), t).value;
      expect(Math.abs(above - below)).toBeLessThan(1e-6);
    }
  });

  it('depth from pressure refuses a latitude beyond ±90°', () => {
    expect(() => depthFromPressureUnesco1983(10, 91)).toThrow(InputError);
  });
});
