import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { jetLengthScales } from '../../../shared-core/jets/length-scales';
import { linePlume, linePlumeRobertsSnyderBaumgartner1989 } from '../../../shared-core/jets/line-plume';
import { InputError } from '../../../shared-core/core/errors';
import { hasQuantityToken } from '../../../shared-core/core/quantity-text';
import { sentenceIn } from '../../../shared-core/units/sentence';
import { runCheckValues } from '../../helpers/check-values';

const keys: Record<string, string> = {
  l_q: 'lQ',
  l_m: 'lM',
  l_crossflow_momentum: 'lCrossflowMomentum',
  l_crossflow_buoyancy: 'lCrossflowBuoyancy',
  l_strat_momentum: 'lStratMomentum',
  l_strat_buoyancy: 'lStratBuoyancy',
  froude: 'froude',
};

runCheckValues('jets', 'jet-length-scales', (i) => {
  const r = jetLengthScales({
    diameter: Number(i.diameter),
    velocity: Number(i.velocity),
    gPrime: Number(i.g_prime),
    current: Number(i.current ?? 0),
    buoyancyFrequency: Number(i.buoyancy_frequency ?? 0),
  });
  return (r as unknown as Record<string, number>)[keys[String(i.quantity)]];
});

runCheckValues('jets', 'line-plume', (i) => {
  const r = linePlume(
    Number(i.q),
    Number(i.g_prime),
    Number(i.N),
    Number(i.u),
    i.H === undefined ? undefined : Number(i.H),
  );
  if (i.quantity === 'rise_height') return r.riseHeight;
  if (i.quantity === 'rise_height_over_lb') return r.riseHeight / r.lb;
  return r.dilution;
});

describe('jet length scales', () => {
  it('absent processes give Infinity scales and say so in words', () => {
    const r = jetLengthScales({ diameter: 0.2, velocity: 2, gPrime: 0 });
    expect(r.lM).toBe(Infinity);
    expect(r.lCrossflowMomentum).toBe(Infinity);
    expect(r.regime.join(' ')).toMatch(/pure momentum jet/);
    expect(r.regime.join(' ')).toMatch(/no current/);
  });
  it('a dense discharge is described as falling back; a low Froude number warns', () => {
    const r = jetLengthScales({ diameter: 1, velocity: 0.1, gPrime: -0.2, current: 0.1, buoyancyFrequency: 0.01 });
    expect(r.regime.join(' ')).toMatch(/denser/);
    expect(r.warnings).toEqual([expect.objectContaining({ code: 'validity-range', input: 'froude' })]);
    expect(r.warnings[0].message).toMatch(/froude/);
  });
  it('scales grow with momentum flux and fall with buoyancy (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 2, noNaN: true }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        fc.double({ min: 0.001, max: 1, noNaN: true }),
        (D, U, g) => {
          const a = jetLengthScales({ diameter: D, velocity: U, gPrime: g });
          const b = jetLengthScales({ diameter: D, velocity: U * 1.5, gPrime: g });
          const c = jetLengthScales({ diameter: D, velocity: U, gPrime: -g });
          expect(b.lM).toBeGreaterThan(a.lM);
          expect(c.lM).toBeCloseTo(a.lM, 10);
        },
      ),
    );
  });
  it('bad input throws an InputError', () => {
    expect(() => jetLengthScales({ diameter: -1, velocity: 1, gPrime: 0.1 })).toThrow(InputError);
    expect(() => jetLengthScales({ diameter: 1, velocity: 1, gPrime: 0.1, buoyancyFrequency: -0.1 })).toThrow(
      InputError,
    );
    expect(() => linePlumeRobertsSnyderBaumgartner1989(0.01, 0.2, 0)).toThrow(InputError);
    expect(() => linePlume(0.01, 0.2, 0)).toThrow(/water_depth/);
    expect(() => linePlume(0.01, 0.2, 0, 0, -1)).toThrow(InputError);
    expect(() => linePlumeRobertsSnyderBaumgartner1989(0.01, -0.2, 0.01)).toThrow(InputError);
  });
  it('line-plume dilution grows with current and never drops below 1 (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-4, max: 10, noNaN: true }),
        fc.double({ min: 1e-3, max: 5, noNaN: true }),
        fc.double({ min: 1e-3, max: 2, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        (q, g, N, u) => {
          const r0 = linePlumeRobertsSnyderBaumgartner1989(q, g, N, u);
          const r1 = linePlumeRobertsSnyderBaumgartner1989(q, g, N, u + 0.5);
          expect(r0.dilution).toBeGreaterThanOrEqual(1);
          expect(Number.isFinite(r0.riseHeight)).toBe(true);
          expect(r1.dilution).toBeGreaterThanOrEqual(r0.dilution * (1 - 1e-12));
        },
      ),
    );
  });

  it('unstratified line plume: dilution grows as H and b^⅓/q, a current only adds a caution, and the wastefield surfaces', () => {
    // Roberts (1979): S_m = 0.27 b^⅓H/q at zero current (from memory); scaling of the formula, not its coefficient
    const a = linePlume(0.01, 0.2, 0, 0, 20),
      deeper = linePlume(0.01, 0.2, 0, 0, 40),
      more = linePlume(0.08, 0.2, 0, 0, 20);
    expect(deeper.dilution / a.dilution).toBeCloseTo(2, 9);
    expect(more.dilution / a.dilution).toBeCloseTo(8 ** (1 / 3) / 8, 9);
    expect(a.riseHeight).toBe(20);
    expect(a.lb).toBe(Infinity);
    expect(a.warnings).toEqual([]);
    const swept = linePlume(0.01, 0.2, 0, 0.5, 20);
    expect(swept.dilution).toBe(a.dilution);
    expect(swept.warnings.map((w) => [w.code, w.input])).toEqual([['unstratified-current-lower-bound', 'current']]);
    // stratified water shallower than the stratified rise: the wastefield reaches the surface
    const shallow = linePlume(0.01, 0.2, 0.02, 0, 10);
    expect(shallow.riseHeight).toBeGreaterThan(10);
    expect(shallow.warnings.map((w) => w.code)).toContain('wastefield-reaches-surface');
  });
});

describe('jet length scales in words', () => {
  // gprime's own contract (issue: the regime text never prints NaN or Infinity): no outside source applies
  const shown = (d: Parameters<typeof jetLengthScales>[0], system: 'si' | 'us') =>
    jetLengthScales(d).regime.map((t) => sentenceIn(t, system));

  it('never prints a non-finite or underflowed scale, anywhere in the hard ranges (property)', () => {
    const tiny = fc.oneof(fc.constant(0), fc.double({ min: 1e-320, max: 1e-300, noNaN: true }));
    fc.assert(
      fc.property(
        fc.double({ min: 1e-4, max: 20, noNaN: true }),
        fc.double({ min: 1e-6, max: 100, noNaN: true }),
        fc.oneof(
          fc.double({ min: -5, max: 5, noNaN: true }),
          tiny,
          tiny.map((x) => -x),
        ),
        fc.oneof(fc.double({ min: 0, max: 10, noNaN: true }), tiny),
        fc.oneof(fc.double({ min: 0, max: 2, noNaN: true }), tiny),
        fc.constantFrom<'si' | 'us'>('si', 'us'),
        (diameter, velocity, gPrime, current, buoyancyFrequency, system) => {
          for (const text of shown({ diameter, velocity, gPrime, current, buoyancyFrequency }, system)) {
            expect(text).not.toMatch(/NaN|Infinity|∞|not a number/);
            expect(hasQuantityToken(text)).toBe(false);
            expect(text).not.toMatch(/about 0 (m|ft)\b|times 0 (m|ft)\b/);
          }
        },
      ),
      { numRuns: 300 },
    );
  });

  it('says a process is absent instead of naming an infinite scale', () => {
    const still = shown({ diameter: 0.2, velocity: 2, gPrime: 1e-320, current: 1e-300, buoyancyFrequency: 0 }, 'si');
    expect(still).toContain(
      'The density difference is too small to matter: the effluent behaves as a pure momentum jet.',
    );
    expect(still.join(' ')).not.toMatch(/current bends/);
    // shown in feet in US units: l_Q = √(π/4)·D = 0.1772 m = 0.5815 ft (NIST SP 811 App. B: 1 ft = 0.3048 m)
    expect(shown({ diameter: 0.2, velocity: 2, gPrime: 0.1 }, 'us')[0]).toBe(
      "Within about 0.58 ft of the port the flow still remembers the port's shape.",
    );
  });

  it('refuses a port diameter below 0.1 mm by name (the fluxes would underflow)', () => {
    expect(() => jetLengthScales({ diameter: 1e-200, velocity: 1, gPrime: 0.1 })).toThrow(InputError);
    expect(() => jetLengthScales({ diameter: 1e-200, velocity: 1, gPrime: 0.1 })).toThrow(/^diameter = /);
  });
});
