import { describe, expect, it } from 'vitest';
import { InputError } from '../../../shared-core/core/errors';
import { validityWarnings, type MethodInfo } from '../../../shared-core/core/method';
import { describeRange, requireInRange } from '../../../shared-core/core/range';
import { sentenceIn } from '../../../shared-core/units/sentence';

// Messages are gprime's own contract (field, value, unit and allowed range, each quantity in the reader's
// units); conversions from NIST SP 811 (2008), Appendix B: 1 ft = 0.3048 m, °F = 1.8 °C + 32.
describe('input errors name field, value, unit and range in the reader’s units', () => {
  const refusal = (f: () => unknown): string => {
    try {
      f();
    } catch (e) {
      expect(e).toBeInstanceOf(InputError);
      return (e as Error).message;
    }
    throw new Error('expected a refusal');
  };

  it('shows a refused number and its range in SI or US units', () => {
    const m = refusal(() => requireInRange('port_depth', 12000, 'm', { min: 0, minExclusive: true, max: 11000 }));
    expect(sentenceIn(m, 'si')).toBe('port_depth = 12000 m is not allowed: allowed range is > 0 m and ≤ 11000 m');
    expect(sentenceIn(m, 'us')).toBe(
      'port_depth = 39370.1 ft is not allowed: allowed range is > 0 ft and ≤ 36089.2 ft',
    );
    const t = refusal(() => requireInRange('temperature', 99, 'degC', { min: -3, max: 60 }));
    expect(sentenceIn(t, 'us')).toBe('temperature = 210.2 °F is not allowed: allowed range is ≥ 26.6 °F and ≤ 140 °F');
  });

  it('a dimensionless value has no unit and no token', () => {
    const m = refusal(() => requireInRange('ports', 0, '1', { min: 1 }));
    expect(m).toBe('ports = 0 is not allowed: allowed range is ≥ 1');
    expect(describeRange({}, 'm')).toBe('any finite number');
  });

  it('a typed text is quoted as typed, its unit never repeated after it', () => {
    const m = new InputError('depth', '30 parsecs', 'm', 'a length', 'the unit "parsecs" is not known').message;
    expect(m).toBe('depth = "30 parsecs" is not allowed: the unit "parsecs" is not known');
    expect(new InputError('depth', '30 parsecs', 'm', 'a length', 'why').detail).toBe('why');
  });

  it('a non-finite value reads as words, never as NaN', () => {
    const m = refusal(() => requireInRange('depth', NaN, 'm', { min: 0 }));
    expect(sentenceIn(m, 'us')).toBe('depth = not a number is not allowed: a finite number is required');
  });

  it('validity warnings show the value and the range in the reader’s units, to four figures', () => {
    const info: MethodInfo = {
      id: 't',
      title: 'a test fit',
      source: 's',
      equation: 'e',
      validity: { wind_speed: { min: 4, max: 25, unit: 'm/s' }, froude: { min: 1, unit: '1' } },
    };
    const [w, f] = validityWarnings(info, { wind_speed: 3.84712, froude: 0.5 });
    expect(sentenceIn(w.message, 'us')).toBe(
      'wind_speed = 12.62 ft/s is outside the range 13.12 ft/s … 82.02 ft/s of a test fit; the result is an extrapolation.',
    );
    expect(f.message).toBe(
      'froude = 0.5 is outside the range from 1 up of a test fit; the result is an extrapolation.',
    );
  });
});
