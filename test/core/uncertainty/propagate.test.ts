import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { findCalcMethod } from '../../../shared-core/calc/registry';
import { InputError, formatNumber } from '../../../shared-core/core/errors';
import { LIMITS } from '../../../shared-core/core/limits';
import {
  latinHypercube,
  normalCdf,
  normalQuantile,
  parseStandardUncertainty,
  propagateMonteCarloJcgm101,
  sampleQuantile,
  seededRandom,
} from '../../../shared-core/uncertainty';
import { runCheckValues } from '../../helpers/check-values';

const method = (id: string) => {
  const m = findCalcMethod(id);
  if (!m) throw new Error(`no method ${id}`);
  return m;
};

runCheckValues('uncertainty', 'monte-carlo-jcgm101', (inputs) => {
  const { method: id, vary, u, result, statistic, ...raw } = inputs;
  const args = Object.fromEntries(Object.entries(raw).map(([k, v]) => [k, typeof v === 'number' ? v : String(v)]));
  const r = propagateMonteCarloJcgm101(
    method(String(id)),
    args,
    [{ name: String(vary), standardUncertainty: Number(u) }],
    { samples: 4000 },
  );
  const band = r.bands.find((b) => b.name === result)!;
  return statistic === 'relativeStandardDeviation'
    ? band.standardDeviation / band.nominal
    : band[statistic as 'standardDeviation' | 'low' | 'high'];
});

describe('normal distribution', () => {
  // Abramowitz & Stegun (1964) Table 26.1 (percentage points of the normal distribution)
  it.each([
    [0.95, 1.644854],
    [0.975, 1.959964],
    [0.99, 2.326348],
    [0.999, 3.090232],
    [0.9999, 3.719016],
  ])('z(%f) = %f (Abramowitz & Stegun 1964, Table 26.1)', (p, z) => {
    expect(normalQuantile(p)).toBeCloseTo(z, 5);
    expect(normalQuantile(1 - p)).toBeCloseTo(-z, 5);
  });
  it('Φ(1) = 0.841345 (Abramowitz & Stegun 1964, Table 26.1)', () => expect(normalCdf(1)).toBeCloseTo(0.841345, 6));
  it('refuses p outside (0, 1)', () => {
    expect(() => normalQuantile(0)).toThrow(RangeError);
    expect(() => normalQuantile(1)).toThrow(RangeError);
  });
});

describe('sample quantiles, type 7 (Hyndman & Fan 1996)', () => {
  it('median of [1, 2, 3, 4, 7, 10] is 3.5 (NumPy documentation example of numpy.percentile)', () => {
    expect(sampleQuantile([1, 2, 3, 4, 7, 10], 0.5)).toBe(3.5);
  });
  it('10 % quantile of 1…10 is 1.9 (R quantile(1:10, 0.1), type 7, from memory)', () => {
    expect(sampleQuantile([1, 2, 3, 4, 5, 6, 7, 8, 9, 10], 0.1)).toBeCloseTo(1.9, 12);
  });
});

describe('Latin hypercube (McKay, Beckman & Conover 1979)', () => {
  it('puts exactly one draw in each of the n strata of every dimension', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 200 }), fc.integer({ min: 1, max: 4 }), fc.integer(), (n, d, seed) => {
        const rows = latinHypercube(n, d, seededRandom(seed));
        for (let k = 0; k < d; k++) {
          const strata = rows.map((r) => Math.floor(r[k] * n)).sort((a, b) => a - b);
          expect(strata).toEqual(Array.from({ length: n }, (_, i) => i));
        }
      }),
      { numRuns: 50 },
    );
  });
});

describe('Monte Carlo propagation', () => {
  const jet = method('required-dilution');
  const raw = { effluent: '12', ambient: '0.05', criterion: '1.2' };
  it('is deterministic for a seed and differs between seeds', () => {
    const a = propagateMonteCarloJcgm101(jet, raw, [{ name: 'effluent', standardUncertainty: 1 }], { seed: 7 });
    const b = propagateMonteCarloJcgm101(jet, raw, [{ name: 'effluent', standardUncertainty: 1 }], { seed: 7 });
    const c = propagateMonteCarloJcgm101(jet, raw, [{ name: 'effluent', standardUncertainty: 1 }], { seed: 8 });
    expect(a).toEqual(b);
    expect(c.bands[0].mean).not.toBe(a.bands[0].mean);
  });
  it('a zero uncertainty gives a band of zero width at the nominal value', () => {
    const r = propagateMonteCarloJcgm101(jet, raw, [{ name: 'effluent', standardUncertainty: 0 }]);
    expect(r.bands[0].low).toBeCloseTo(r.bands[0].nominal, 12);
    expect(r.bands[0].high).toBeCloseTo(r.bands[0].nominal, 12);
  });
  it('the band holds the median and widens with the input uncertainty', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 2, noNaN: true }), (u) => {
        const narrow = propagateMonteCarloJcgm101(jet, raw, [{ name: 'effluent', standardUncertainty: u }], {
          samples: 200,
        }).bands[0];
        const wide = propagateMonteCarloJcgm101(jet, raw, [{ name: 'effluent', standardUncertainty: 2 * u }], {
          samples: 200,
        }).bands[0];
        expect(narrow.low).toBeLessThanOrEqual(narrow.median);
        expect(narrow.median).toBeLessThanOrEqual(narrow.high);
        expect(wide.high - wide.low).toBeGreaterThan(narrow.high - narrow.low);
      }),
      { numRuns: 20 },
    );
  });
  it('leaves out and reports draws outside an input’s allowed range', () => {
    const r = propagateMonteCarloJcgm101(method('front-speed'), { g_prime: '0.01', current_depth: '2' }, [
      { name: 'g_prime', standardUncertainty: 0.01 },
    ]);
    expect(r.evaluated).toBeLessThan(r.samples);
    expect(r.warnings.find((w) => w.code === 'band-draws-truncated')).toMatchObject({
      severity: 'caution',
      input: 'g_prime',
    });
    expect(r.warnings.map((w) => w.message).join(' ')).toMatch(/g_prime outside its allowed range/);
    expect(r.bands.find((b) => b.name === 'speed')!.low).toBeGreaterThan(0);
  });
  it('names the field of a bad uncertainty', () => {
    const bad = (name: string, u: number) => () =>
      propagateMonteCarloJcgm101(jet, raw, [{ name, standardUncertainty: u }]);
    expect(bad('effluent', -1)).toThrow(/uncertainty of effluent = -1/);
    expect(bad('nonsense', 1)).toThrow(InputError);
    expect(() => propagateMonteCarloJcgm101(jet, raw, [])).toThrow(/at least one input/);
    expect(() =>
      propagateMonteCarloJcgm101(jet, raw, [{ name: 'effluent', standardUncertainty: 1 }], { samples: 5 }),
    ).toThrow(/samples = 5/);
  });
  it('refuses more draws than LIMITS.monteCarloDraws, naming the field and the limit', () => {
    const draws = (samples: number) => () =>
      propagateMonteCarloJcgm101(jet, raw, [{ name: 'effluent', standardUncertainty: 1 }], { samples });
    expect(draws(LIMITS.monteCarloDraws + 1)).toThrow(InputError);
    expect(draws(LIMITS.monteCarloDraws + 1)).toThrow(
      `samples = ${formatNumber(LIMITS.monteCarloDraws + 1)} is not allowed: the number of Monte Carlo draws is a whole number from 100 to the limit of ${LIMITS.monteCarloDraws} draws per band`,
    );
  });
});

describe('typed standard uncertainties', () => {
  it('reads SI, other units as differences and percentages', () => {
    expect(parseStandardUncertainty('depth', '0.5', 'm', 30)).toBe(0.5);
    expect(parseStandardUncertainty('depth', '1 ft', 'm', 30)).toBeCloseTo(0.3048, 12); // NIST SP 811 (2008) App. B.8, exact
    expect(parseStandardUncertainty('temperature', '1.8 degF', 'degC', 20)).toBeCloseTo(1, 12); // 1 °F difference = 5/9 K (NIST SP 811 §B.8)
    expect(parseStandardUncertainty('g_prime', '10%', 'm/s2', 0.02)).toBeCloseTo(0.002, 15);
  });
  it('names the field of a bad uncertainty', () => {
    expect(() => parseStandardUncertainty('depth', '-1', 'm', 30)).toThrow(/uncertainty of depth/);
    expect(() => parseStandardUncertainty('depth', 'x%', 'm', 30)).toThrow(/uncertainty of depth/);
    expect(() => parseStandardUncertainty('depth', 'abc', 'm', 30)).toThrow(/uncertainty of depth/);
  });
  it('refuses a percent sign without a number before it (never read as 0)', () => {
    for (const text of ['%', ' % ', 'ft%', '-%', '1e%', '.%'])
      expect(() => parseStandardUncertainty('depth', text, 'm', 30), text).toThrow(
        /uncertainty of depth = .* is not allowed: a relative uncertainty is a number ≥ 0 followed by %/,
      );
    expect(parseStandardUncertainty('depth', '0%', 'm', 30)).toBe(0);
    expect(parseStandardUncertainty('depth', '2,5 %', 'm', 30)).toBeCloseTo(0.75, 12);
  });
});

describe('warnings raised in some draws', () => {
  it('reports a new kind of warning with its share of draws, not the nominal warnings with other numbers', () => {
    // the Wedderburn method always states its drag coefficient (numbers vary with the wind); a validity
    // warning appears only in the draws whose wind speed leaves the Large & Pond (1981) range
    const r = propagateMonteCarloJcgm101(
      method('wedderburn'),
      { g_prime: '0.02', upper_thickness: '6', wind_speed: '10', basin_length: '3000' },
      [{ name: 'wind_speed', standardUncertainty: 3 }],
    );
    expect(r.warnings.filter((w) => /Drag coefficient/.test(w.message))).toEqual([]);
    const occasional = r.warnings.filter((w) => w.code === 'band-occasional-warning');
    expect(occasional).toMatchObject([{ severity: 'outside-validity', input: 'wind_speed' }]);
    expect(occasional[0].message).toMatch(
      /^In [\d.]+ % of the draws: .*outside the range ⟦4\|m\/s\|4⟧ … ⟦25\|m\/s\|4⟧/,
    );
  });
});
