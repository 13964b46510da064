import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { interpolateAt } from '../../../shared-core/profile/profile';
import {
  halfThicknessLineSinkImberger1976,
  halfThicknessPointSinkImbergerPatterson1990,
  reachesHalfThickness,
} from '../../../shared-core/withdrawal/layer';
import { portOutflow } from '../../../shared-core/withdrawal/outflow';
import { layerMean, LayerMemo, portLayer } from '../../../shared-core/withdrawal/port-layer';
import { mergeAscending } from '../../../shared-core/withdrawal/depth-cursor';
import { stableProfile } from './arbitraries';

const point = { sink: 'point' as const };
const positive = (min: number, max: number) => fc.double({ min, max, noNaN: true });

describe('the root-free reach test of the layer-limit scan', () => {
  // The reference is the half-thickness formula itself (Imberger et al. 1976, line sink; Imberger & Patterson 1990,
  // point sink; both with their own check values): a ≥ δ(N) must hold exactly when the test says so, away from a
  // rounding band of 1e-9 around δ.
  const cases = fc.record({
    sink: fc.constantFrom('line' as const, 'point' as const),
    q: positive(1e-3, 1e3),
    n: positive(1e-4, 0.5),
    ratio: positive(0.01, 100),
    length: fc.option(positive(10, 1e5), { nil: undefined }),
  });

  it('agrees with a ≥ δ(N) of the published formulas in both regimes', () => {
    fc.assert(
      fc.property(cases, ({ sink, q, n, ratio, length }) => {
        const delta = (
          sink === 'line'
            ? halfThicknessLineSinkImberger1976(q, n, length)
            : halfThicknessPointSinkImbergerPatterson1990(q, n, length)
        ).halfThickness;
        const a = delta * ratio;
        fc.pre(Math.abs(ratio - 1) > 1e-9);
        expect(reachesHalfThickness(sink, q, length)(a, n * n)).toBe(a >= delta);
      }),
      { numRuns: 2000 },
    );
  });

  it('never reaches in neutral or unstable water (N² ≤ 0)', () => {
    expect(reachesHalfThickness('point', 5)(1e3, 0)).toBe(false);
    expect(reachesHalfThickness('line', 5, 1e3)(1e3, -1e-4)).toBe(false);
  });
});

describe('port layers', () => {
  it('the mean by sample weights is the trapezoid rule of v·c over the nodes (c̄ = ∫ v c dd / ∫ v dd)', () => {
    // conservation of a constituent in the outflow (Fischer et al. 1979, Ch. 6), integrated here directly on the nodes
    fc.assert(
      fc.property(stableProfile, positive(0.05, 0.95), positive(0.5, 60), (p, at, q) => {
        const layer = portLayer(p, at * p.depth[p.depth.length - 1], q, point);
        fc.pre(layer.area > 0);
        let vc = 0,
          v = 0;
        for (let i = 1; i < layer.depth.length; i++) {
          const dz = layer.depth[i] - layer.depth[i - 1];
          const c = (k: number) => interpolateAt(p.depth, p.temperature, layer.depth[k]);
          vc += 0.5 * (layer.rel[i] * c(i) + layer.rel[i - 1] * c(i - 1)) * dz;
          v += 0.5 * (layer.rel[i] + layer.rel[i - 1]) * dz;
        }
        expect(layer.area).toBeCloseTo(v, 12);
        expect(Math.abs(layerMean(layer, p.temperature) - vc / v)).toBeLessThan(1e-10 * Math.abs(vc / v));
      }),
      { numRuns: 100 },
    );
  });

  it('a memo gives the outflow a fresh computation gives, and works each layer out once', () => {
    fc.assert(
      fc.property(stableProfile, positive(0.05, 0.95), positive(0.5, 60), (p, at, q) => {
        const depth = at * p.depth[p.depth.length - 1];
        const memo = new LayerMemo(p, point);
        expect(memo.layer(depth, q)).toBe(memo.layer(depth, q));
        expect(memo.limits(depth, q)).toBe(memo.layer(depth, q).limits);
        expect(portOutflow(p, depth, q, point, 'all', memo.layer(depth, q))).toEqual(portOutflow(p, depth, q, point));
      }),
      { numRuns: 40 },
    );
  });
});

describe('mergeAscending', () => {
  it('gives the sorted distinct union of ascending lists', () => {
    const ascending = fc
      .array(fc.integer({ min: -50, max: 50 }), { maxLength: 30 })
      .map((l) => l.sort((a, b) => a - b));
    fc.assert(
      fc.property(fc.array(ascending, { maxLength: 5 }), (lists) => {
        expect(mergeAscending(lists)).toEqual([...new Set(lists.flat())].sort((a, b) => a - b));
      }),
    );
  });
});
