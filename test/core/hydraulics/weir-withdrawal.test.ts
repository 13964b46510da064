import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runCheckValues } from '../../helpers/check-values';
import { InputError } from '../../../shared-core/core/errors';
import { GRAVITY } from '../../../shared-core/quantities';
import { curtainWallWithdrawalMax, sillOverflowCritical } from '../../../shared-core/hydraulics/two-layer';
import { weirSkimmingWithdrawalMax } from '../../../shared-core/hydraulics/weir-withdrawal';
import { findCalcMethod } from '../../../shared-core/calc/registry';
import { runCalc } from '../../../shared-core/calc/resolve';

const n = (i: Record<string, number | string>, k: string) => Number(i[k]);

runCheckValues(
  'hydraulics',
  'weir-skimming-withdrawal',
  (i) =>
    weirSkimmingWithdrawalMax(n(i, 'g_prime'), n(i, 'crest_depth'), n(i, 'interface_depth'), {
      approachVelocity: i.approach === 'included',
    }).value,
);

describe('skimming over a weir', () => {
  it('is the curtain wall turned upside down (Boussinesq), up to the surface drawdown (g′/g)(Y − h) (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 0.1, noNaN: true }),
        fc.double({ min: 0.05, max: 0.95, noNaN: true }),
        fc.double({ min: 0.5, max: 30, noNaN: true }),
        (gp, f, Y) => {
          const h = f * Y;
          if (gp * (Y - h) >= (GRAVITY * h) / 3) return;
          const weir = weirSkimmingWithdrawalMax(gp, h, Y).value,
            wall = curtainWallWithdrawalMax(gp, h, Y).value;
          expect(Math.abs(weir / wall - 1)).toBeLessThanOrEqual((gp / GRAVITY) * ((Y - h) / h) * (1 + 1e-9));
          expect(weir).toBeLessThanOrEqual(sillOverflowCritical(gp, Y).value * (1 + 1e-12));
        },
      ),
      { numRuns: 200 },
    );
  });

  it('rises as the interface lies deeper below the crest, up to the free-surface critical discharge', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.double({ min: 1.01, max: 1000, noNaN: true }),
        fc.double({ min: 1.001, max: 2, noNaN: true }),
        (h, k, m) => {
          const a = weirSkimmingWithdrawalMax(0.02, h, k * h).value,
            b = weirSkimmingWithdrawalMax(0.02, h, k * m * h).value;
          expect(b).toBeGreaterThanOrEqual(a);
          expect(b).toBeLessThanOrEqual((2 / 3) ** 1.5 * Math.sqrt(GRAVITY * h ** 3) * (1 + 1e-12));
        },
      ),
      { numRuns: 200 },
    );
  });

  it('warns that a free overflow draws lower-layer water; refuses a crest below the interface', () => {
    expect(
      weirSkimmingWithdrawalMax(0.02, 1, 3).warnings.find((w) => w.code === 'free-overflow-draws-lower-layer')?.message,
    ).toMatch(/freely overflowing crest/);
    expect(() => weirSkimmingWithdrawalMax(0.02, 3, 2)).toThrow(InputError);
    fc.assert(
      fc.property(fc.double(), fc.double(), fc.double(), (a, b, c) => {
        try {
          expect(Number.isFinite(weirSkimmingWithdrawalMax(a, b, c).value)).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(InputError);
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe('hydraulics calc methods', () => {
  it('skimming-withdrawal runs both structures and scales with width', () => {
    const m = findCalcMethod('skimming-withdrawal')!;
    const weir = runCalc(m, { g_prime: '0.02', structure: 'weir', opening: '1', interface_distance: '3', width: '10' });
    expect(weir.results.max_discharge.value).toBeCloseTo(
      10 * weirSkimmingWithdrawalMax(0.02, 1, 3, { approachVelocity: true }).value,
      12,
    );
    const wall = runCalc(m, { g_prime: '0.02', structure: 'curtain-wall', opening: '2', interface_distance: '5' });
    expect(wall.results.max_discharge_per_width.value).toBeCloseTo(
      curtainWallWithdrawalMax(0.02, 2, 5, { approachVelocity: true }).value,
      12,
    );
  });
  it('skimming-withdrawal states the approach velocity head and cautions when a neglected one matters', () => {
    const m = findCalcMethod('skimming-withdrawal')!;
    const args = { g_prime: '0.02', structure: 'curtain-wall', opening: '2', interface_distance: '3' };
    const neglected = runCalc(m, { ...args, approach_velocity: 'neglected' });
    expect(neglected.results.max_discharge_per_width.value).toBeCloseTo(0.4, 12); // a√(2g′(Y − a))
    expect(neglected.results.approach_head_ratio.value).toBeCloseTo(Math.sqrt(1.8), 12); // √(Y/((1 + a/Y)(Y − a)))
    expect(neglected.warnings.map((w) => w.code)).toContain('approach-head-neglected');
    const deep = runCalc(m, { ...args, interface_distance: '40', approach_velocity: 'neglected' });
    expect(deep.warnings.map((w) => w.code)).not.toContain('approach-head-neglected');
  });
  it('a sharp-edged lip (C_c = 0.61, Henderson 1966) lowers the limit; a weir ignores the contraction with a note', () => {
    const m = findCalcMethod('skimming-withdrawal')!;
    const args = { g_prime: '0.02', structure: 'curtain-wall', opening: '1', interface_distance: '5' };
    const sharp = runCalc(m, { ...args, contraction: '0.61' }).results.max_discharge_per_width.value as number;
    const round = runCalc(m, args).results.max_discharge_per_width.value as number;
    expect(sharp).toBeLessThan(round);
    const weir = runCalc(m, { ...args, structure: 'weir', interface_distance: '3', contraction: '0.61' });
    expect(weir.warnings.map((w) => w.code)).toContain('input-ignored');
  });
  it('internal-jump uses the finite-depth form only when total_depth is given', () => {
    const m = findCalcMethod('internal-jump')!;
    const deep = runCalc(m, { discharge_per_width: '0.2', upstream_thickness: '0.5', g_prime: '0.02' });
    expect(deep.results.downstream_thickness.value).toBeCloseTo(2.589454172900137, 9); // Bélanger form, y1 = 0.5 m, F1 = 4
    const finite = runCalc(m, {
      discharge_per_width: '0.05',
      upstream_thickness: '0.2',
      g_prime: '0.02',
      total_depth: '2',
    });
    expect(finite.results.downstream_thickness.value).toBeGreaterThan(
      finite.results.downstream_thickness_alt.value as number,
    );
    expect(() =>
      runCalc(m, { discharge_per_width: '0.2', upstream_thickness: '0.5', g_prime: '0.02', upper_discharge: '0.1' }),
    ).toThrow(InputError);
  });
});

describe('skimming-withdrawal names the input that is wrong', () => {
  it('an opening beyond the interface is refused as opening, for both structures', () => {
    const m = findCalcMethod('skimming-withdrawal')!;
    for (const structure of ['weir', 'curtain-wall'])
      expect(() => runCalc(m, { g_prime: '0.02', structure, opening: '3', interface_distance: '2' })).toThrow(
        /^opening = .* is not allowed: it must be less than interface_distance/,
      );
  });
});
