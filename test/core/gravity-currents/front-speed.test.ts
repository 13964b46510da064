import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runCheckValues } from '../../helpers/check-values';
import {
  frontSpeedVonKarman1940,
  frontSpeedBenjamin1968,
  frontSpeedHuppertSimpson1980,
  frontSpeedShinDalzielLinden2004,
  lockExchangeSpeed,
  benjaminFroude,
  type FrontSpeed,
} from '../../../shared-core/gravity-currents';
import { InputError } from '../../../shared-core/core/errors';

const n = (x: number | string | undefined) => (x === undefined ? undefined : Number(x));
const pick = (r: FrontSpeed, out: unknown) =>
  out === 'froude' ? r.froude : out === 'froude_total' ? r.froudeTotal! : r.value;

runCheckValues('gravity-currents', 'front-speed-von-karman-1940', (i) =>
  pick(frontSpeedVonKarman1940(n(i.g_prime)!, n(i.current_depth)!), i.output),
);
runCheckValues('gravity-currents', 'front-speed-benjamin-1968', (i) =>
  pick(frontSpeedBenjamin1968(n(i.g_prime)!, n(i.current_depth)!, n(i.total_depth)), i.output),
);
runCheckValues('gravity-currents', 'front-speed-huppert-simpson-1980', (i) =>
  pick(frontSpeedHuppertSimpson1980(n(i.g_prime)!, n(i.current_depth)!, n(i.total_depth)), i.output),
);
runCheckValues('gravity-currents', 'front-speed-shin-2004', (i) =>
  pick(frontSpeedShinDalzielLinden2004(n(i.g_prime)!, n(i.lock_depth)!, n(i.total_depth)), i.output),
);
runCheckValues('gravity-currents', 'lock-exchange-speed', (i) => {
  const r = lockExchangeSpeed(n(i.g_prime)!, n(i.depth)!);
  return i.output === 'ideal' ? r.ideal.value : i.output === 'low' ? r.low : r.high;
});

const gp = fc.double({ min: 1e-4, max: 5, noNaN: true });
const depth = fc.double({ min: 0.01, max: 100, noNaN: true });
const frac = fc.double({ min: 0.01, max: 0.99, noNaN: true });

describe('front speeds: invariants', () => {
  it('every front speed rises with g′', () => {
    fc.assert(
      fc.property(gp, fc.double({ min: 1.01, max: 3, noNaN: true }), depth, frac, (g, k, H, a) => {
        const h = a * H;
        for (const f of [
          (x: number) => frontSpeedVonKarman1940(x, h).value,
          (x: number) => frontSpeedBenjamin1968(x, h, H).value,
          (x: number) => frontSpeedHuppertSimpson1980(x, h, H).value,
          (x: number) => frontSpeedShinDalzielLinden2004(x, h, H).value,
        ])
          expect(f(Math.min(g * k, 9.8))).toBeGreaterThan(f(g));
      }),
    );
  });
  it('Benjamin U/√(g′H) peaks near a = 0.347 and is below the deep value √2 in Fr_h', () => {
    const frH = (a: number) => benjaminFroude(a) * Math.sqrt(a);
    for (const a of [0.2, 0.3, 0.4, 0.5]) expect(frH(a)).toBeLessThan(frH(0.3473) + 1e-12);
    fc.assert(
      fc.property(frac, (a) => {
        expect(benjaminFroude(a)).toBeLessThanOrEqual(Math.SQRT2);
      }),
    );
  });
  it('warns when Benjamin’s current is deeper than half the channel', () => {
    expect(frontSpeedBenjamin1968(0.1, 0.8, 1).warnings.map((w) => [w.code, w.severity, w.input])).toEqual([
      ['validity-range', 'outside-validity', 'depth_ratio'],
      ['energy-not-conserved', 'note', undefined],
    ]);
    expect(frontSpeedBenjamin1968(0.1, 0.5, 1).warnings).toEqual([]);
  });
  it('lock exchange: the experiments lie below the ideal value', () => {
    const r = lockExchangeSpeed(0.1, 2);
    expect(r.low).toBeLessThan(r.typical);
    expect(r.high).toBeLessThan(r.ideal.value);
  });
});

describe('front speeds: bad input', () => {
  it('refuses meaningless input with an InputError, never NaN', () => {
    expect(() => frontSpeedBenjamin1968(-0.1, 1, 2)).toThrow(InputError);
    expect(() => frontSpeedBenjamin1968(0.1, 3, 2)).toThrow(InputError);
    expect(() => frontSpeedHuppertSimpson1980(0.1, 0, 2)).toThrow(InputError);
    expect(() => frontSpeedShinDalzielLinden2004(0.1, 1, 0.5)).toThrow(/lock_depth/);
    expect(() => frontSpeedVonKarman1940(NaN, 1)).toThrow(InputError);
    fc.assert(
      fc.property(fc.double(), fc.double(), fc.double(), (g, h, H) => {
        try {
          const r = frontSpeedBenjamin1968(g, h, H);
          expect(Number.isFinite(r.value)).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(InputError);
        }
      }),
    );
  });
});
