import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runCheckValues } from '../../helpers/check-values';
import { InputError } from '../../../shared-core/core/errors';
import {
  compositeFroudeArmi1986,
  curtainWallWithdrawalMax,
  internalHydraulicJump,
  sillOverflowCritical,
} from '../../../shared-core/hydraulics/two-layer';
import { stratifiedObstacleFlow } from '../../../shared-core/hydraulics/obstacle';

const n = (i: Record<string, number | string>, k: string) => Number(i[k]);

runCheckValues(
  'hydraulics',
  'composite-froude',
  (i) => compositeFroudeArmi1986(n(i, 'u1'), n(i, 'u2'), n(i, 'h1'), n(i, 'h2'), n(i, 'g_prime')).value,
);
runCheckValues(
  'hydraulics',
  'sill-overflow-critical',
  (i) => sillOverflowCritical(n(i, 'g_prime'), n(i, 'interface_above_crest')).value,
);
runCheckValues('hydraulics', 'internal-hydraulic-jump', (i) => {
  const r = internalHydraulicJump(n(i, 'q'), n(i, 'y1'), n(i, 'g_prime'));
  return i.output === 'head_loss' ? r.headLoss : r.downstreamThickness;
});
runCheckValues(
  'hydraulics',
  'curtain-wall-withdrawal',
  (i) =>
    curtainWallWithdrawalMax(n(i, 'g_prime'), n(i, 'lip_height'), n(i, 'interface_height'), {
      approachVelocity: i.approach === 'included',
      contraction: i.contraction === undefined ? 1 : n(i, 'contraction'),
    }).value,
);
runCheckValues('hydraulics', 'stratified-obstacle-flow', (i) => {
  const r = stratifiedObstacleFlow(
    n(i, 'velocity'),
    n(i, 'buoyancy_frequency'),
    n(i, 'obstacle_height'),
    n(i, 'depth'),
  );
  switch (i.output) {
    case 'froude':
      return r.froude;
    case 'lee_wavelength':
      return r.leeWavelength;
    case 'channel_lee_wavelength':
      return r.channelLeeWavelength ?? NaN;
    default:
      return r.dividingStreamlineHeight;
  }
});

describe('two-layer hydraulics', () => {
  it('the jump conserves the reduced-gravity momentum flux and always loses energy (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 5, noNaN: true }),
        fc.double({ min: 0.05, max: 5, noNaN: true }),
        fc.double({ min: 1.05, max: 10, noNaN: true }),
        (gp, y1, F) => {
          const q = F * Math.sqrt(gp * y1 ** 3);
          const r = internalHydraulicJump(q, y1, gp);
          const M = (y: number) => (q * q) / y + (gp * y * y) / 2;
          expect(Math.abs(M(r.downstreamThickness) / M(y1) - 1)).toBeLessThan(1e-9);
          expect(r.downstreamThickness).toBeGreaterThan(y1);
          expect(r.headLoss).toBeGreaterThan(0);
        },
      ),
      { numRuns: 100 },
    );
  });

  it('the curtain-wall limit never exceeds the critical discharge (2/3)^{3/2}√(g′Y³) (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.001, max: 1, noNaN: true }),
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        fc.double({ min: 0.1, max: 50, noNaN: true }),
        (gp, f, Y) => {
          expect(curtainWallWithdrawalMax(gp, f * Y, Y).value).toBeLessThanOrEqual(
            sillOverflowCritical(gp, Y).value * (1 + 1e-12),
          );
        },
      ),
      { numRuns: 100 },
    );
  });

  it('composite Froude classifies the state', () => {
    expect(compositeFroudeArmi1986(0.01, 0, 5, 5, 0.02).state).toBe('subcritical');
    expect(compositeFroudeArmi1986(0.5, 0.5, 1, 1, 0.02).state).toBe('supercritical');
  });

  it('a subcritical "jump" is flagged', () => {
    expect(
      internalHydraulicJump(0.001, 1, 0.02).warnings.find((w) => w.code === 'subcritical-no-jump')?.message,
    ).toMatch(/subcritical/);
  });
});

describe('stratified obstacle flow', () => {
  it('blocked exactly when Nh/U > 1 (Sheppard 1956)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 2, noNaN: true }),
        fc.double({ min: 0.001, max: 0.1, noNaN: true }),
        fc.double({ min: 0.1, max: 20, noNaN: true }),
        (U, N, h) => {
          const r = stratifiedObstacleFlow(U, N, h, 3 * h);
          expect(r.blocked).toBe((N * h) / U > 1);
          expect(r.dividingStreamlineHeight).toBeGreaterThanOrEqual(0);
          expect(r.dividingStreamlineHeight).toBeLessThan(h);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('no channel lee wave when U/(NH) ≥ 1/π, with a warning', () => {
    const r = stratifiedObstacleFlow(1, 0.01, 5, 50);
    expect(r.channelLeeWavelength).toBeUndefined();
    expect(r.warnings.find((w) => w.code === 'no-channel-lee-waves')).toMatchObject({ severity: 'note' });
    expect(r.warnings[0].message).toMatch(/1\/π/);
  });
});

describe('bad input', () => {
  it('throws InputError, never NaN (property)', () => {
    fc.assert(
      fc.property(fc.double(), fc.double(), fc.double(), fc.double(), (a, b, c, d) => {
        for (const f of [
          () => stratifiedObstacleFlow(a, b, c, d).froude,
          () => curtainWallWithdrawalMax(a, b, c).value,
          () => internalHydraulicJump(a, b, c).downstreamThickness,
          () => compositeFroudeArmi1986(a, b, c, d, a).value,
        ]) {
          try {
            expect(Number.isFinite(f())).toBe(true);
          } catch (e) {
            expect(e).toBeInstanceOf(InputError);
          }
        }
      }),
      { numRuns: 300 },
    );
  });

  it('obstacle taller than the depth and lip above the interface are refused', () => {
    expect(() => stratifiedObstacleFlow(0.1, 0.01, 60, 50)).toThrow(InputError);
    expect(() => curtainWallWithdrawalMax(0.02, 5, 4)).toThrow(InputError);
  });
});
