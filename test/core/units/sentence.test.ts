import { describe, expect, it } from 'vitest';
import { hasQuantityToken, qty } from '../../../shared-core/core/quantity-text';
import { sentenceIn } from '../../../shared-core/units/sentence';

// Conversion factors: NIST SP 811 (2008), Appendix B (1 ft = 0.3048 m exactly; °F = 1.8 °C + 32).
describe('quantities inside sentences', () => {
  it('shows SI tokens in SI, rounded for people', () => {
    const text = `port flows at ${qty(13.716000000000001, 'm')}: ${qty(4.03, 'm3/s')}`;
    expect(sentenceIn(text, 'si')).toBe('port flows at 13.72 m: 4.03 m³/s');
    expect(hasQuantityToken(sentenceIn(text, 'si'))).toBe(false);
  });

  it('converts to US customary units (NIST SP 811, App. B)', () => {
    expect(sentenceIn(`depth ${qty(3.048, 'm')}`, 'us')).toBe('depth 10 ft');
    expect(sentenceIn(`target ${qty(7.222222, 'degC')}`, 'us')).toBe('target 45 °F');
    expect(sentenceIn(`flow ${qty(0.028316846592, 'm3/s')}`, 'us')).toBe('flow 1 cfs');
  });

  it('converts a temperature difference without the offset', () => {
    expect(sentenceIn(`warmer by ${qty(2, 'K')}`, 'us')).toBe('warmer by 3.6 °F');
    expect(sentenceIn(`warmer by ${qty(2, 'K')}`, 'si')).toBe('warmer by 2 K');
  });

  it('keeps asked-for figures and non-finite values readable', () => {
    expect(sentenceIn(`density ${qty(999.8431, 'kg/m3', 6)}`, 'si')).toBe('density 999.843 kg/m³');
    expect(sentenceIn(`length ${qty(Infinity, 'm')}`, 'si')).toBe('length ∞ m');
    expect(sentenceIn('no numbers here', 'us')).toBe('no numbers here');
  });
});
