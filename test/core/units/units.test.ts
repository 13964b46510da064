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
  ['6"', 'm', 6 * 0.0254],
  ["40'", 'm', 40 * 0.3048],
  [`5'6"`, 'm', 66 * 0.0254],
  [`5' 6"`, 'm', 66 * 0.0254],
  ['12 ft 6 in', 'm', 150 * 0.0254],
  ['3 mgd', 'm3/s', (3e6 * 3.785411784e-3) / 86400],
  ['3 Mgd', 'm3/s', (3e6 * 3.785411784e-3) / 86400],
  ['250 GPM', 'm3/s', (250 * 3.785411784e-3) / 60],
  ['86400 m³/d', 'm3/s', 1],
  ['8640 m3/d', 'm3/s', 0.1],
  ['10 ML/d', 'm3/s', 1e4 / 86400],
  ['10 MLD', 'm3/s', 1e4 / 86400],
  ['42.914 mS/cm', 'mS/cm', 42.914],
  ['4.2914 S/m', 'mS/cm', 42.914],
  ['1500 µS/cm', 'mS/cm', 1.5],
] as const;

// NIST SP 811, Appendix B.8: acre-foot (based on U.S. survey foot) = 1.233489 E+03 m³; gprime uses
// 43 560 international ft³ (1233.4818 m³), 6 ppm less — the tolerance.
const ACRE_FOOT = 1.233489e3;

describe('quantities with units (NIST SP 811, Appendix B)', () => {
  for (const [text, unit, expected] of NIST) {
    it(`${text} → ${expected} ${unit}`, () => expect(parseQuantity('x', text, unit)).toBeCloseTo(expected, 9));
  }

  it('1 acre-ft/d = 1233.489 m³ per day (NIST SP 811, B.8; 6 ppm survey-foot difference allowed)', () => {
    expect(parseQuantity('q', '1 acre-ft/d', 'm3/s')).toBeCloseTo(ACRE_FOOT / 86400, 6);
    expect(Math.abs(parseQuantity('q', '100 acre-ft/day', 'm3/s') / ((100 * ACRE_FOOT) / 86400) - 1)).toBeLessThan(
      1e-5,
    );
  });

  it('takes a bare number as SI and accepts a decimal comma', () => {
    expect(parseQuantity('depth', '12.5', 'm')).toBe(12.5);
    expect(parseQuantity('depth', '12,5 m', 'm')).toBe(12.5);
  });

  it('reads grouped thousands where the grouping is unambiguous', () => {
    expect(parseQuantity('discharge', '1,500 cfs', 'm3/s')).toBeCloseTo(1500 * 0.028316846592, 9);
    expect(parseQuantity('depth', '12,500 ft', 'm')).toBeCloseTo(12500 * 0.3048, 9);
    expect(parseQuantity('depth', '12 500 ft', 'm')).toBeCloseTo(12500 * 0.3048, 9);
    expect(parseQuantity('depth', '12\u00a0500 m', 'm')).toBe(12500);
    expect(parseQuantity('depth', '1 000', 'm')).toBe(1000);
    expect(parseQuantity('depth', '1 000 000 m', 'm')).toBe(1e6);
    expect(parseQuantity('depth', '1,234,567 m', 'm')).toBe(1234567);
    expect(parseQuantity('depth', '1,500.25 m', 'm')).toBe(1500.25);
    expect(parseQuantity('depth', '1.500,25 m', 'm')).toBe(1500.25);
    expect(parseQuantity('depth', '12 500,5 m', 'm')).toBe(12500.5);
  });

  it('keeps unambiguous decimal commas', () => {
    expect(parseQuantity('depth', '3,5 m', 'm')).toBe(3.5);
    expect(parseQuantity('depth', '0,500 m', 'm')).toBe(0.5);
    expect(parseQuantity('depth', '12,25', 'm')).toBe(12.25);
    expect(parseQuantity('flow', '1,5 cfs', 'm3/s')).toBeCloseTo(1.5 * 0.028316846592, 12);
    expect(parseQuantity('x', '1,5e3 m', 'm')).toBe(1500);
  });

  it('refuses a lone "1,500" without a US unit, naming the field and both readings', () => {
    for (const text of ['1,500', '1,500 m', '12,500 m3/s']) {
      expect(() => parseQuantity('discharge', text, 'm3/s')).toThrow(InputError);
    }
    expect(() => parseQuantity('depth', '1,500 m', 'm')).toThrow(
      /depth = "1,500 m" is not allowed: "1,500" reads as 1500 \(thousands separator\) or as 1\.5 \(decimal comma\)/,
    );
  });

  it('refuses malformed digit groups', () => {
    expect(() => parseQuantity('depth', '1,50,0 m', 'm')).toThrow(InputError);
    expect(() => parseQuantity('depth', '1234 567 m', 'm')).toThrow(InputError);
  });

  it('refuses mismatched or unknown units with the field named', () => {
    expect(() => parseQuantity('depth', '3 kg', 'm')).toThrow(
      /depth = "3 kg" is not allowed: "kg" is not a unit of length; give a length in m or a unit convertible to it \(ft, in, km\)/,
    );
    // the unit appears once, inside the value as typed, and the expected unit is named in words
    expect(() => parseQuantity('depth', '30 parsecs', 'm')).toThrow(
      /^depth = "30 parsecs" is not allowed: the unit "parsecs" is not known; give a length in m or a unit convertible to it/,
    );
    expect(() => parseQuantity('depth', 'deep', 'm')).toThrow(/it is not a number; give a length in m/);
    expect(() => parseQuantity('salinity', '3 m', 'PSU')).toThrow(
      /^salinity = "3 m" is not allowed: "m" is not a unit of salinity; give a salinity in PSU/,
    );
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

describe('display of a unit with a fractional power', () => {
  it('shows the 4/3-law coefficient in ft^(2/3)/s under US display and reads it back', () => {
    // 1 ft = 0.3048 m exactly (NIST SP 811, 2008, Appendix B.8), so 1 m^(2/3)/s = 0.3048^(-2/3) ft^(2/3)/s
    const us = toDisplay(4.64e-4, 'm^(2/3)/s', 'us');
    expect(us.unit).toBe('ft^(2/3)/s');
    expect(us.value).toBeCloseTo(4.64e-4 / 0.3048 ** (2 / 3), 15);
    expect(fromDisplay(us.value, 'm^(2/3)/s', 'us')).toBeCloseTo(4.64e-4, 15);
    expect(toDisplay(4.64e-4, 'm^(2/3)/s', 'si')).toEqual({ value: 4.64e-4, unit: 'm^(2/3)/s' });
  });
});
