import { describe, expect, it } from 'vitest';
import { si } from '../../../shared-core/site/context';

// 1 ft = 0.3048 m exactly (NIST SP 811, 2008, Appendix B.8).
describe('quantities of the site file, read once', () => {
  it('gives the same SI value on every read of the same text, under any field', () => {
    expect(si('features[0].ports[2].depth', '98 ft', 'm')).toBeCloseTo(98 * 0.3048, 12);
    expect(si('features[1].portDepth', '98 ft', 'm')).toBe(si('features[0].ports[2].depth', '98 ft', 'm'));
  });

  it('keeps the unit apart: the same text read as another quantity is read again', () => {
    expect(() => si('features[0].release', '98 ft', 'm3/s')).toThrow(/features\[0\]\.release/);
  });

  it('never keeps a refusal: each names its own field', () => {
    expect(() => si('features[0].discharge', '12 furlongs', 'm3/s')).toThrow(/features\[0\]\.discharge/);
    expect(() => si('features[3].discharge', '12 furlongs', 'm3/s')).toThrow(/features\[3\]\.discharge/);
  });
});
