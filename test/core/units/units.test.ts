import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseQuantity, toDisplay, fromDisplay } from '../../../shared-core/units/units';
import { InputError } from '../../../shared-core/core/errors';

// Conversion factors: NIST Special Publication 811 (Thompson & Taylor 2008), Appendix B.8/B.9.
const NIST = [
  ['30 ft', 'm', 30 * 0.3048],
  ['450 cfs', 'm3/s', 450 * 0.028316846592],
  ['3 MGD', 'm3/s', (3e6 * 3.785411784e-3) / 86400],
  ['1200 gal/min', 'm3/s', (1200 * 3.785411784e-3) / 60],
  ['1200 gpm', 'm3/s', (1200 * 3.785411784e-3) / 60],
  ['54 degF', 'degC', (54 - 32) / 1.8],
  ['2 knots', 'm/s', (2 * 1852) / 3600],
  ['10 mph', 'm/s', 4.4704],
  ['300 mg/L', 'kg/m3', 0.3],
  ['0.5 ft/s^2', 'm/s2', 0.1524],
  ['35 ppt', 'PSU', 35],
] as const;

describe('quantities with units (NIST SP 811, Appendix B)', () => {
  for (const [text, unit, expected] of NIST) {
    it(`${text} → ${expected} ${unit}`, () => expect(parseQuantity('x', text, unit)).toBeCloseTo(expected, 9));
  }

  it('takes a bare number as SI and accepts a decimal comma', () => {
    expect(parseQuantity('depth', '12.5', 'm')).toBe(12.5);
    expect(parseQuantity('depth', '12,5 m', 'm')).toBe(12.5);
  });

  it('refuses mismatched or unknown units with the field named', () => {
    expect(() => parseQuantity('depth', '3 kg', 'm')).toThrow(
      /depth = "3 kg" m is not allowed: "kg" cannot be converted to m/,
    );
    expect(() => parseQuantity('depth', '3 furlongz', 'm')).toThrow(/unit "furlongz" is not known/);
    expect(() => parseQuantity('depth', 'deep', 'm')).toThrow(/it is not a number/);
  });

  it('display conversions round-trip (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.constantFrom('m', 'm/s', 'm3/s', 'degC', 'kg/m3', 'm2/s', 'm/s2'),
        (v, unit) => {
          const shown = toDisplay(v, unit, 'us');
          expect(fromDisplay(shown.value, unit, 'us')).toBeCloseTo(v, 6);
        },
      ),
    );
  });

  it('never throws anything but InputError on arbitrary text (property)', () => {
    fc.assert(
      fc.property(fc.string(), (s) => {
        try {
          expect(Number.isFinite(parseQuantity('x', s, 'm'))).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(InputError);
        }
      }),
    );
  });
});
