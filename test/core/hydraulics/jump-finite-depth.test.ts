import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runCheckValues } from '../../helpers/check-values';
import { InputError } from '../../../shared-core/core/errors';
import { internalHydraulicJump } from '../../../shared-core/hydraulics/two-layer';
import { internalJumpFiniteDepth } from '../../../shared-core/hydraulics/jump-finite-depth';

const n = (i: Record<string, number | string>, k: string) => Number(i[k]);

runCheckValues('hydraulics', 'internal-jump-finite-depth', (i) => {
  const r = internalJumpFiniteDepth(
    n(i, 'q'),
    n(i, 'y1'),
    n(i, 'g_prime'),
    n(i, 'total_depth'),
    i.upper_discharge === undefined ? undefined : n(i, 'upper_discharge'),
  );
  if (i.output === 'head_loss') return r.headLoss;
  if (i.output === 'y2_interfacial_pressure') return r.downstreamThicknessInterfacialPressure;
  return r.downstreamThickness;
});

describe('internal jump in a finite depth', () => {
  it('recovers the deep-layer jump as D → ∞ within 1e-6 (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        fc.double({ min: 0.05, max: 2, noNaN: true }),
        fc.double({ min: 1.05, max: 8, noNaN: true }),
        (gp, y1, F) => {
          const q = F * Math.sqrt(gp * y1 ** 3);
          const deep = internalHydraulicJump(q, y1, gp),
            r = internalJumpFiniteDepth(q, y1, gp, 1e4 * y1);
          expect(Math.abs(r.downstreamThickness / deep.downstreamThickness - 1)).toBeLessThan(1e-6);
          expect(Math.abs(r.headLoss / deep.headLoss - 1)).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 100 },
    );
  });

  it('with a quiescent upper layer the depth does not matter (both closures)', () => {
    const q = 3 * Math.sqrt(0.02 * 0.2 ** 3);
    const r = internalJumpFiniteDepth(q, 0.2, 0.02, 1.5, 0),
      deep = internalHydraulicJump(q, 0.2, 0.02);
    expect(r.downstreamThickness).toBeCloseTo(deep.downstreamThickness, 10);
    expect(r.downstreamThicknessInterfacialPressure).toBeCloseTo(deep.downstreamThickness, 10);
  });

  it('the conjugate is subcritical, loses energy, and the return flow makes it deeper than the deep-layer value', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.02, max: 0.3, noNaN: true }),
        fc.double({ min: 1.1, max: 3, noNaN: true }),
        (ratio, F) => {
          const D = 10,
            y1 = ratio * D,
            q = F * Math.sqrt(0.02 * y1 ** 3);
          const r = internalJumpFiniteDepth(q, y1, 0.02, D);
          if (r.limited) return;
          expect(r.compositeFroudeUpstream).toBeGreaterThan(1);
          expect(r.compositeFroudeDownstream).toBeLessThan(1);
          expect(r.headLoss).toBeGreaterThan(0);
          expect(r.downstreamThickness).toBeGreaterThan(internalHydraulicJump(q, y1, 0.02).downstreamThickness);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('a jump stronger than the depth allows is flagged and shows the limiting critical state', () => {
    const y1 = 0.2,
      q = 2.3 * Math.sqrt(0.02 * y1 ** 3); // F1 = 2.3 at y1 = D/5: beyond the largest jump (about F1 = 2.15)
    const r = internalJumpFiniteDepth(q, y1, 0.02, 1);
    expect(r.limited).toBe(true);
    expect(r.compositeFroudeDownstream).toBeCloseTo(1, 9);
    expect(r.warnings.find((w) => w.code === 'jump-exceeds-depth')?.message).toMatch(/largest one the depth allows/);
    expect(internalJumpFiniteDepth(2 * Math.sqrt(0.02 * y1 ** 3), y1, 0.02, 1).limited).toBe(false);
  });

  it('no subcritical state at all (very strong counterflow in a shallow channel) is flagged', () => {
    const r = internalJumpFiniteDepth(3 * Math.sqrt(0.02 * 0.2 ** 3), 0.2, 0.02, 1);
    expect(r.limited).toBe(true);
    expect(r.warnings.find((w) => w.code === 'no-subcritical-state')?.message).toMatch(/No subcritical state/);
  });

  it('subcritical input gives no jump; bad input throws InputError, never NaN (property)', () => {
    expect(internalJumpFiniteDepth(0.001, 1, 0.02, 5).warnings.map((w) => w.code)).toEqual(['subcritical-no-jump']);
    fc.assert(
      fc.property(
        fc.double(),
        fc.double(),
        fc.double(),
        fc.double(),
        fc.option(fc.double(), { nil: undefined }),
        (a, b, c, d, e) => {
          try {
            const r = internalJumpFiniteDepth(a, b, c, d, e);
            for (const x of [
              r.downstreamThickness,
              r.headLoss,
              r.downstreamThicknessInterfacialPressure,
              r.compositeFroudeDownstream,
            ])
              expect(Number.isFinite(x)).toBe(true);
          } catch (err) {
            expect(err).toBeInstanceOf(InputError);
          }
        },
      ),
      { numRuns: 500 },
    );
  });
});
