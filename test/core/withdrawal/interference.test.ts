import { describe, expect, it } from 'vitest';
import { qty } from '../../../shared-core/core/quantity-text';
import { sentenceIn } from '../../../shared-core/units/sentence';
import fc from 'fast-check';
import { makeProfile, type Profile } from '../../../shared-core/profile/profile';
import { blendRelease, type BlendOptions, type Port } from '../../../shared-core/withdrawal/blend';
import { optimiseRelease } from '../../../shared-core/withdrawal/release-optimiser';
import { directOutflow, groupFluxProfile, interferenceGroups } from '../../../shared-core/withdrawal/interference';
import { findCalcMethod } from '../../../shared-core/calc/registry';
import { runCalc } from '../../../shared-core/calc/resolve';
import { runCheckValues } from '../../helpers/check-values';
import { parsePorts } from '../../../shared-core/withdrawal/calc';
import { stableProfile } from './arbitraries';

/** Linear density 1000 + 0.05 d kg/m³ and a tracer (d − 30)² on a 0.02 m grid over 0–60 m (as the generator). */
const depth = Array.from({ length: 3001 }, (_, i) => i * 0.02);
const linear: Profile = {
  depth,
  temperature: depth.map((d) => 20 - d / 4),
  salinity: depth.map(() => 0),
  sediment: depth.map(() => 0),
  extra: [{ name: 'tracer', unit: '1', values: depth.map((d) => (d - 30) ** 2) }],
  eos: 'fresh',
  density: depth.map((d) => 1000 + 0.05 * d),
  labels: [],
  warnings: [],
};
const CASES: Record<string, [number, number][]> = {
  coincident: [
    [30, 4],
    [30, 6],
  ],
  'near pair': [
    [26, 5],
    [34, 5],
  ],
  'far pair': [
    [10, 3],
    [50, 3],
  ],
  'chain of three': [
    [20, 6],
    [30, 6],
    [43, 4],
  ],
};

runCheckValues('withdrawal', 'withdrawal-interference-combined', (i) => {
  const spec = CASES[String(i.case)];
  const ports: Port[] = spec.map(([d]) => ({ depth: d, capacity: 20 }));
  const r = blendRelease(
    linear,
    ports,
    spec.map(([, q]) => q),
    { sink: 'point', interference: i.mode as 'combined' | 'independent' },
  );
  if (i.quantity === 'tracer') return r.columns.find((c) => c.name === 'tracer')!.value;
  const g = r.groups.find((x) => x.ports.length === spec.length)!;
  return i.quantity === 'top' ? g.topDepth : g.bottomDepth;
});

const combined: BlendOptions = { sink: 'point', interference: 'combined' };
const threePorts = (p: Profile, at: number[]) =>
  at.map((f) => ({ depth: f * p.depth[p.depth.length - 1], capacity: 30 }));

describe('combined interference invariants', () => {
  it('every column of a blend lies between the ports’ outflows, and the flows are conserved', () => {
    fc.assert(
      fc.property(
        stableProfile,
        fc.array(fc.double({ min: 0, max: 30, noNaN: true }), { minLength: 3, maxLength: 3 }),
        fc.array(fc.double({ min: 0.05, max: 0.95, noNaN: true }), { minLength: 3, maxLength: 3 }),
        (p, flows, at) => {
          fc.pre(flows.some((q) => q > 1e-3));
          const ports = threePorts(p, at);
          const r = blendRelease(p, ports, flows, combined);
          r.columns.forEach((c, k) => {
            const open = r.ports.filter((_, i) => flows[i] > 0).map((o) => o.columns[k].value);
            expect(c.value).toBeGreaterThanOrEqual(Math.min(...open) - 1e-9);
            expect(c.value).toBeLessThanOrEqual(Math.max(...open) + 1e-9);
          });
          // each open port in exactly one group; the group flows add up to the release; each group's outflow profile integrates to its flow
          const members = r.groups.flatMap((g) => g.ports).sort();
          expect(members).toEqual(
            flows
              .map((q, i) => (q > 0 ? i : -1))
              .filter((i) => i >= 0)
              .sort(),
          );
          expect(r.groups.reduce((s, g) => s + g.flow, 0)).toBeCloseTo(
            flows.reduce((a, b) => a + b, 0),
            9,
          );
          r.ports.forEach((o, i) => expect(o.discharge).toBe(flows[i]));
          for (const g of r.groups) {
            const v = groupFluxProfile(
              p,
              ports.map((q) => q.depth),
              flows,
              g,
              combined,
            );
            let integral = 0;
            for (let k = 1; k < v.depth.length; k++)
              integral += 0.5 * (v.fluxPerDepth[k] + v.fluxPerDepth[k - 1]) * (v.depth[k] - v.depth[k - 1]);
            // the members' piecewise-linear curves are resampled on the union of their grids, so the trapezoid rule is exact
            if (v.depth.length > 1) expect(Math.abs(integral - g.flow)).toBeLessThanOrEqual(1e-9 * g.flow + 1e-12);
          }
        },
      ),
      { numRuns: 30 },
    );
  });

  it('a deeper open port never draws warmer water than a shallower one in a stable profile', () => {
    fc.assert(
      fc.property(
        stableProfile,
        fc.array(fc.double({ min: 0.5, max: 30, noNaN: true }), { minLength: 3, maxLength: 3 }),
        fc.array(fc.double({ min: 0.05, max: 0.95, noNaN: true }), { minLength: 3, maxLength: 3 }),
        (p, flows, at) => {
          const r = blendRelease(p, threePorts(p, at), flows, combined);
          const byDepth = r.ports.map((o, i) => ({ d: o.portDepth, t: o.temperature, i })).sort((a, b) => a.d - b.d);
          // tolerance 0.02 °C as in properties.test.ts (common practice, no source): within a group every member's layer is
          // taken at the same flow, which is the single-port case tested there; separate groups do not overlap, so are ordered
          for (let k = 1; k < byDepth.length; k++) expect(byDepth[k].t).toBeLessThanOrEqual(byDepth[k - 1].t + 0.02);
        },
      ),
      { numRuns: 40 },
    );
  });

  it('a target inside a jump (two ports starting to interfere) is reported as such; a third port lets the optimiser meet it', () => {
    const d = Array.from({ length: 81 }, (_, i) => i * 0.5);
    const p = makeProfile({ depth: d, temperature: d.map((x) => 28 - 1.2 * x + 0.015 * x * x) });
    const two = [
      { depth: 10, capacity: 100 },
      { depth: 30, capacity: 100 },
    ];
    // with 100 m³/s in all, the layers of these ports start to overlap near 1.5 m³/s at the upper port, where the release
    // temperature steps from about 6.71 to 6.75 °C: 6.74 °C cannot be reached with two ports
    const r = optimiseRelease(p, two, 100, { temperature: 6.74 }, combined);
    expect(r.feasible).toBe(false);
    expect(r.warnings.find((w) => w.code === 'target-in-jump')).toMatchObject({
      severity: 'caution',
      input: 'target_temperature',
    });
    expect(Math.abs(r.temperature - 6.74)).toBeLessThan(0.03);
    const three = optimiseRelease(p, [...two, { depth: 36, capacity: 20 }], 100, { temperature: 6.74 }, combined);
    expect(three.feasible).toBe(true);
    expect(three.temperature).toBeCloseTo(6.74, 3);
  });

  it('ports whose layers do not overlap give the independent result; overlapping ones are named in a warning', () => {
    const p = makeProfile({ depth: [0, 5, 10, 20, 40], temperature: [24, 23, 15, 10, 8] });
    const apart = [
      { depth: 3, capacity: 5 },
      { depth: 35, capacity: 5 },
    ];
    const ind = blendRelease(p, apart, [0.5, 0.5], { sink: 'point' }),
      comb = blendRelease(p, apart, [0.5, 0.5], combined);
    expect(comb.temperature).toBe(ind.temperature);
    expect(comb.groups.every((g) => g.ports.length === 1)).toBe(true);
    const close = [
      { depth: 12, capacity: 20 },
      { depth: 16, capacity: 20 },
    ];
    const c = blendRelease(p, close, [10, 10], combined);
    expect(sentenceIn(c.warnings.find((w) => w.code === 'ports-interfere')?.message ?? '', 'si')).toMatch(
      /ports at 12 m and 16 m interfere/,
    );
    const alone = blendRelease(p, close, [10, 10], { sink: 'point' });
    expect(sentenceIn(alone.warnings.find((w) => w.code === 'interference-ignored')?.message ?? '', 'si')).toMatch(
      /12 m and 16 m overlap, but each is computed as if/,
    );
    expect(interferenceGroups([12, 16], [10, 0], (d, q) => directOutflow(p, combined)(d, q).limits)).toHaveLength(1);
  });

  it('release-blend combines interfering ports by default and charts the combined withdrawal', () => {
    const method = findCalcMethod('release-blend')!;
    const file = makeProfile({
      depth: [0, 4, 6, 8, 10, 14, 20, 30],
      temperature: [22, 21.8, 19, 15, 12, 10.5, 9.8, 9.2],
    });
    const out = runCalc(method, { file, ports: '8:20,11:20', release: 20, target_temperature: 13 });
    expect(out.warnings.map((w) => w.code)).toContain('ports-interfere');
    expect(out.series!.filter((s) => s.kind === 'withdrawal-outflow').map((s) => sentenceIn(s.title, 'si'))).toEqual([
      'Combined withdrawal of the ports at 8 m, 11 m',
    ]);
    // the model's zone is the group's: from the upper limit of the 8 m port to the lower limit of the 11 m port
    const direct = optimiseRelease(file, parsePorts('8:20,11:20'), 20, { temperature: 13 }, combined);
    const group = direct.groups.find((g) => g.ports.length === 2)!;
    expect(out.model).toEqual({
      kind: 'withdrawal-zones',
      zones: [
        {
          label: `combined: ports at ${qty(8, 'm')}, ${qty(11, 'm')}`,
          port: 0,
          top: group.topDepth,
          bottom: group.bottomDepth,
        },
      ],
    });
    const alone = runCalc(method, {
      file,
      ports: '8:20,11:20',
      release: 20,
      target_temperature: 13,
      interference: 'independent',
    });
    expect(alone.warnings.find((w) => w.code === 'ports-as-point-sinks')?.message).toMatch(
      /interference between their withdrawal layers is ignored/,
    );
    // each open port draws its own zone, its layer limits at its own flow
    const apart = optimiseRelease(file, parsePorts('8:20,11:20'), 20, { temperature: 13 }, { sink: 'point' });
    const zones = apart.ports
      .map((o, i) => ({
        label: `port at ${qty(o.portDepth, 'm')}`,
        port: i,
        top: o.limits.topDepth,
        bottom: o.limits.bottomDepth,
      }))
      .filter((_, i) => apart.flows[i] > 0);
    expect(alone.model).toEqual({ kind: 'withdrawal-zones', zones });
  });
});
