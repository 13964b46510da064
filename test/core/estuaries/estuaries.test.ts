import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runCheckValues } from '../../helpers/check-values';
import {
  saltWedgeLengthSchijfSchonfeld1953,
  saltWedgeProfile,
  saltWedgeLengthCurve,
  estuarineRichardsonFischer1972,
  estuaryClass,
  maximalExchangeContractionArmiFarmer1986,
  maximalExchangeSillFarmerArmi1986,
  navigationLockExchange,
  type SaltWedgeInput,
  exchangeWithNetFlowArmiFarmer1986,
  MAXIMAL_EXCHANGE_LIMIT,
  exchangeSillWithNetFlowFarmerArmi1986,
} from '../../../shared-core/estuaries';
import { compositeFroudeArmi1986 } from '../../../shared-core/hydraulics/two-layer';
import { findCalcMethod } from '../../../shared-core/calc/registry';
import { runCalc } from '../../../shared-core/calc/resolve';
import { InputError } from '../../../shared-core/core/errors';

const n = (x: number | string | undefined) => Number(x);
const wedge = (i: Record<string, number | string>): SaltWedgeInput => ({
  riverVelocity: n(i.river_velocity),
  depth: n(i.depth),
  gPrime: n(i.g_prime),
  interfacialFriction: n(i.interfacial_friction),
});

runCheckValues('estuaries', 'salt-wedge-schijf-schonfeld-1953', (i) => {
  const input = wedge(i);
  if (i.output === 'profile_length') return saltWedgeProfile(input, 40).length;
  const r = saltWedgeLengthSchijfSchonfeld1953(input);
  if (i.output === 'length_over_depth') return r.length.value / input.depth;
  if (i.output === 'length_over_small_f0_limit')
    return r.length.value / (input.depth / (20 * input.interfacialFriction! * r.riverFroude ** 2));
  return r.length.value;
});

const CLASS_INDEX = { 'well mixed': 0, 'partially mixed': 1, 'strongly stratified': 2 } as const;
runCheckValues('estuaries', 'estuarine-richardson-fischer-1972', (i) => {
  const r = estuarineRichardsonFischer1972(n(i.g_prime), n(i.river_discharge), n(i.width), n(i.tidal_velocity));
  return i.output === 'class_index' ? CLASS_INDEX[r.estuaryClass] : r.richardson.value;
});

runCheckValues('estuaries', 'exchange-contraction-armi-farmer-1986', (i) => {
  const r = maximalExchangeContractionArmiFarmer1986(n(i.g_prime), n(i.depth), n(i.width));
  return i.output === 'g2' ? r.compositeFroudeSquared : r.discharge.value;
});

runCheckValues('estuaries', 'exchange-sill-farmer-armi-1986', (i) => {
  const r = maximalExchangeSillFarmerArmi1986(n(i.g_prime), n(i.depth), n(i.width));
  if (i.output === 'g2') return r.compositeFroudeSquared;
  if (i.output === 'upper_fraction') return r.upperThicknessAtControl / n(i.depth);
  return r.discharge.value;
});

runCheckValues('estuaries', 'exchange-contraction-net-flow-armi-farmer-1986', (i) => {
  const r = exchangeWithNetFlowArmiFarmer1986(n(i.g_prime), n(i.depth), n(i.width), n(i.net_discharge));
  switch (i.output) {
    case 'upper':
      return r.upperDischarge.value;
    case 'lower':
      return r.lowerDischarge.value;
    case 'virtual_width':
      return r.virtualControlWidth ?? NaN;
    case 'upper_at_narrows':
      return r.upperThicknessAtNarrows ?? NaN;
    default:
      return r.flushingDischarge;
  }
});

runCheckValues('estuaries', 'exchange-sill-net-flow-farmer-armi-1986', (i) => {
  const r = exchangeSillWithNetFlowFarmerArmi1986(
    n(i.g_prime),
    n(i.depth),
    n(i.width),
    n(i.net_discharge),
    i.reservoir_depth === undefined ? undefined : n(i.reservoir_depth),
  );
  switch (i.output) {
    case 'upper':
      return r.upperDischarge.value;
    case 'lower':
      return r.lowerDischarge.value;
    case 'upper_at_crest':
      return r.upperThicknessAtCrest ?? NaN;
    case 'upper_at_foot':
      return r.upperThicknessAtFoot ?? NaN;
    case 'flushing_upper':
      return r.flushingWithUpper;
    default:
      return r.flushingWithLower;
  }
});

runCheckValues('estuaries', 'navigation-lock-exchange', (i) => {
  const r = navigationLockExchange(
    {
      gPrime: n(i.g_prime),
      length: n(i.length),
      width: n(i.width),
      depth: n(i.depth),
      salinityDifference: n(i.salinity_difference),
      speed: i.speed as 'ideal' | 'typical',
    },
    [n(i.time)],
  );
  return i.output === 'salt' ? r.saltMass[0] : r.volume[0];
});

describe('salt wedge: invariants', () => {
  it('wedge length falls as river flow rises', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 2000, noNaN: true }),
        fc.double({ min: 1.01, max: 3, noNaN: true }),
        (q, k) => {
          const c = saltWedgeLengthCurve([q, q * k], 200, 8, 0.19);
          if (c.riverFroude[0] < 1) expect(c.length[1]).toBeLessThan(c.length[0]);
          else expect(c.length[1]).toBe(0);
        },
      ),
    );
  });
  it('the profile thins the fresh layer monotonically from the tip to the critical section at the mouth', () => {
    const p = saltWedgeProfile({ riverVelocity: 0.2, depth: 10, gPrime: 0.19 }, 30);
    expect(p.status).toBe('completed');
    expect(p.interfaceDepth[0]).toBeCloseTo(10 * p.riverFroude ** (2 / 3), 9);
    expect(p.interfaceDepth[p.interfaceDepth.length - 1]).toBeCloseTo(10, 9);
    for (let k = 1; k < p.distance.length; k++) {
      expect(p.distance[k]).toBeGreaterThan(p.distance[k - 1]);
      expect(p.interfaceDepth[k]).toBeGreaterThan(p.interfaceDepth[k - 1]);
    }
    expect(p.distance.length).toBeGreaterThanOrEqual(31);
  });
  it('a friction defined as ½ρC_i u² must be halved: twice f_i halves the length', () => {
    const a = saltWedgeLengthSchijfSchonfeld1953({
      riverVelocity: 0.2,
      depth: 10,
      gPrime: 0.19,
      interfacialFriction: 2e-4,
    }).length.value;
    const b = saltWedgeLengthSchijfSchonfeld1953({
      riverVelocity: 0.2,
      depth: 10,
      gPrime: 0.19,
      interfacialFriction: 4e-4,
    }).length.value;
    expect(a / b).toBeCloseTo(2, 12);
  });
  it('no wedge is arrested for F0 ≥ 1, with a warning', () => {
    const r = saltWedgeLengthSchijfSchonfeld1953({ riverVelocity: 2, depth: 4, gPrime: 0.19 });
    expect(r.length.value).toBe(0);
    const noWedge = r.length.warnings.find((w) => w.code === 'no-wedge-arrested');
    expect(noWedge).toMatchObject({ severity: 'note', input: 'river_velocity' });
    expect(noWedge!.message).toMatch(/no wedge is arrested/);
    expect(r.length.warnings.find((w) => w.code === 'validity-range')?.input).toBe('river_froude');
  });
});

describe('estuaries: other invariants', () => {
  it('Richardson class follows the number monotonically', () => {
    const order = ['well mixed', 'partially mixed', 'strongly stratified'];
    fc.assert(
      fc.property(
        fc.double({ min: 1e-4, max: 100, noNaN: true }),
        fc.double({ min: 1, max: 10, noNaN: true }),
        (ri, k) => {
          expect(order.indexOf(estuaryClass(ri * k))).toBeGreaterThanOrEqual(order.indexOf(estuaryClass(ri)));
        },
      ),
    );
  });
  it('exchange rises with g′; the sill passes less than a contraction of the same section', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 1, noNaN: true }),
        fc.double({ min: 1, max: 50, noNaN: true }),
        (g, h) => {
          const c = maximalExchangeContractionArmiFarmer1986(g, h, 10).discharge.value;
          const s = maximalExchangeSillFarmerArmi1986(g, h, 10).discharge.value;
          expect(s).toBeLessThan(c);
          expect(maximalExchangeContractionArmiFarmer1986(g * 1.5, h, 10).discharge.value).toBeGreaterThan(c);
        },
      ),
      { numRuns: 50 },
    );
  });
  it('lock exchange volume rises with open time and never exceeds the chamber', () => {
    const r = navigationLockExchange(
      { gPrime: 0.2, length: 150, width: 16, depth: 5, salinityDifference: 28 },
      [0, 30, 60, 120, 300, 600, 1200, 3600],
    );
    for (let k = 1; k < r.time.length; k++) expect(r.volume[k]).toBeGreaterThan(r.volume[k - 1]);
    expect(r.volume[r.volume.length - 1]).toBeLessThanOrEqual(r.chamberVolume);
  });
});

describe('exchange with net flow (Armi & Farmer 1986): invariants', () => {
  const scale = (g: number, h: number, b: number) => b * Math.sqrt(g * h ** 3);
  const arbitrary = [
    fc.double({ min: 1e-3, max: 1, noNaN: true }),
    fc.double({ min: 5, max: 100, noNaN: true }),
    fc.double({ min: 1, max: 1e4, noNaN: true }),
  ] as const;
  it('the layer fluxes differ by the net flow; E and G² = 1 agree at both controls', () => {
    fc.assert(
      fc.property(...arbitrary, fc.double({ min: -0.999, max: 0.999, noNaN: true }), (g, h, b, f) => {
        const q0 = f * MAXIMAL_EXCHANGE_LIMIT * scale(g, h, b);
        const r = exchangeWithNetFlowArmiFarmer1986(g, h, b, q0);
        expect(Math.abs(r.upperDischarge.value - r.lowerDischarge.value - q0)).toBeLessThanOrEqual(
          1e-9 * scale(g, h, b),
        );
        expect(Math.abs(r.energyAtNarrows! - r.energyAtVirtualControl!)).toBeLessThanOrEqual(1e-9 * g * h);
        const h1 = r.upperThicknessAtNarrows!,
          h2 = h - h1;
        const G = compositeFroudeArmi1986(
          r.upperDischarge.value / (b * h1),
          -r.lowerDischarge.value / (b * h2),
          h1,
          h2,
          g,
        ).value;
        expect(G).toBeCloseTo(1, 9);
        const hv1 = r.upperThicknessAtVirtualControl!,
          bv = r.virtualControlWidth!;
        const u1 = r.upperDischarge.value / (bv * hv1),
          u2 = r.lowerDischarge.value / (bv * (h - hv1));
        expect(u1 / u2).toBeCloseTo(1, 9);
        expect(compositeFroudeArmi1986(u1, -u2, hv1, h - hv1, g).value).toBeCloseTo(1, 9);
      }),
      { numRuns: 200 },
    );
  });
  it('rising net flow raises the with-flow layer, lowers the opposing one and moves the virtual control outwards', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        fc.double({ min: 1.01, max: 1.5, noNaN: true }),
        (f, k) => {
          const q = f * MAXIMAL_EXCHANGE_LIMIT * scale(0.02, 10, 50),
            q2 = Math.min(q * k, 0.995 * MAXIMAL_EXCHANGE_LIMIT * scale(0.02, 10, 50));
          const a = exchangeWithNetFlowArmiFarmer1986(0.02, 10, 50, q),
            c = exchangeWithNetFlowArmiFarmer1986(0.02, 10, 50, q2);
          expect(c.upperDischarge.value).toBeGreaterThan(a.upperDischarge.value);
          expect(c.lowerDischarge.value).toBeLessThan(a.lowerDischarge.value);
          expect(c.virtualControlWidth!).toBeGreaterThan(a.virtualControlWidth!);
          expect(a.virtualControlWidth!).toBeGreaterThan(50);
        },
      ),
      { numRuns: 200 },
    );
    expect(exchangeWithNetFlowArmiFarmer1986(0.02, 10, 50, 1e-9).virtualControlWidth!).toBeGreaterThanOrEqual(
      50 * (1 - 1e-12),
    );
  });
  it('reversing the net flow swaps the layers', () => {
    fc.assert(
      fc.property(fc.double({ min: -0.99, max: 0.99, noNaN: true }), (f) => {
        const q = f * MAXIMAL_EXCHANGE_LIMIT * scale(0.05, 8, 30);
        const a = exchangeWithNetFlowArmiFarmer1986(0.05, 8, 30, q),
          c = exchangeWithNetFlowArmiFarmer1986(0.05, 8, 30, -q);
        expect(c.upperDischarge.value).toBeCloseTo(a.lowerDischarge.value, 9);
        expect(c.upperThicknessAtNarrows!).toBeCloseTo(8 - a.upperThicknessAtNarrows!, 9);
      }),
      { numRuns: 50 },
    );
  });
  it('without net flow it agrees with the zero-net-flow function', () => {
    const a = exchangeWithNetFlowArmiFarmer1986(0.03, 12, 40, 0),
      c = maximalExchangeContractionArmiFarmer1986(0.03, 12, 40);
    expect(a.upperDischarge.value / c.discharge.value - 1).toBeLessThan(1e-12);
    expect(a.lowerDischarge.value / c.discharge.value - 1).toBeLessThan(1e-12);
    expect(a.upperThicknessAtNarrows).toBeCloseTo(6, 12);
  });
  it('beyond the end of maximal exchange the flow is one-way, with zero exchange and a clear text', () => {
    const r = exchangeWithNetFlowArmiFarmer1986(0.02, 10, 50, -0.8 * scale(0.02, 10, 50));
    expect(r.regime).toBe('one-way');
    expect(r.upperDischarge.value).toBe(0);
    expect(r.lowerDischarge.value).toBeCloseTo(0.8 * scale(0.02, 10, 50), 9);
    expect(r.warnings.find((w) => w.code === 'one-way-flow')).toMatchObject({ input: 'net_discharge' });
    expect(r.warnings.map((w) => w.message).join(' ')).toMatch(/one-way flow, no exchange/);
  });
  it('a virtual control wider than the channel ends makes the exchange submaximal', () => {
    const q0 = 0.4 * scale(0.02, 10, 50);
    const free = exchangeWithNetFlowArmiFarmer1986(0.02, 10, 50, q0);
    const r = exchangeWithNetFlowArmiFarmer1986(0.02, 10, 50, q0, 0.9 * free.virtualControlWidth!);
    expect(r.regime).toBe('submaximal');
    expect(r.warnings.find((w) => w.code === 'submaximal-exchange')).toMatchObject({ input: 'end_width' });
    expect(exchangeWithNetFlowArmiFarmer1986(0.02, 10, 50, q0, 1.1 * free.virtualControlWidth!).regime).toBe('maximal');
  });
  it('calc: net_discharge for a contraction; the series spans the maximal-exchange range', () => {
    const m = findCalcMethod('exchange-flow')!;
    const out = runCalc(m, { g_prime: '0.02', depth: '10', width: '50', net_discharge: '30' });
    const { upper_layer_discharge: up, lower_layer_discharge: low, exchange_discharge: ex } = out.results;
    expect((up.value as number) - (low.value as number)).toBeCloseTo(30, 9);
    expect(ex.value).toBe(low.value);
    expect(out.series![0].x.values[0]).toBeCloseTo(-MAXIMAL_EXCHANGE_LIMIT * scale(0.02, 10, 50), 9);
  });
});

describe('exchange over a sill with net flow (Farmer & Armi 1986 conditions): invariants', () => {
  const scale = (g: number, d: number, b: number) => b * Math.sqrt(g * d ** 3);
  // G² = F1² + F2² (Armi 1986), written out: the shared helper refuses layers thinner than 1 mm
  const G2 = (up: number, low: number, h1: number, h2: number, b: number, g: number) =>
    (up / b) ** 2 / (g * h1 ** 3) + (low / b) ** 2 / (g * h2 ** 3);
  // basin depth ratio H/D from just above 1 to 100, or a deep basin (undefined)
  const basin = fc.oneof(fc.constant(undefined), fc.double({ min: 1.001, max: 100, noNaN: true }));
  it('Q1 − Q2 = Q0; G² = 1 at the crest and at the foot; E equal at both; exchange largest with no net flow', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 1, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        fc.double({ min: 1, max: 1e4, noNaN: true }),
        basin,
        fc.double({ min: -0.999, max: 0.999, noNaN: true }),
        (g, d, b, k, f) => {
          const H = k === undefined ? undefined : k * d;
          const zero = exchangeSillWithNetFlowFarmerArmi1986(g, d, b, 0, H);
          const q0 = f > 0 ? f * zero.flushingWithUpper : -f * zero.flushingWithLower;
          const r = exchangeSillWithNetFlowFarmerArmi1986(g, d, b, q0, H);
          const [up, low] = [r.upperDischarge.value, r.lowerDischarge.value];
          expect(r.regime).toBe('maximal');
          expect(Math.abs(up - low - q0)).toBeLessThanOrEqual(1e-9 * scale(g, d, b));
          expect(
            Math.abs(G2(up, low, r.upperThicknessAtCrest!, d - r.upperThicknessAtCrest!, b, g) - 1),
          ).toBeLessThanOrEqual(1e-9);
          if (H !== undefined)
            expect(
              Math.abs(G2(up, low, r.upperThicknessAtFoot!, H - r.upperThicknessAtFoot!, b, g) - 1),
            ).toBeLessThanOrEqual(1e-9);
          else expect(up ** 2 / (b * b * g * r.upperThicknessAtFoot! ** 3)).toBeCloseTo(1, 12); // F1 = 1 at the virtual control
          expect(Math.abs(r.energyAtCrest! - r.energyAtFoot!)).toBeLessThanOrEqual(1e-9 * g * d);
          // E from its definition at the crest: −g′h1 + (u2² − u1²)/2 (measured from the lid)
          const h1 = r.upperThicknessAtCrest!,
            u1 = up / (b * h1),
            u2 = low / (b * (d - h1));
          expect(Math.abs(-g * h1 + (u2 * u2 - u1 * u1) / 2 - r.energyAtCrest!)).toBeLessThanOrEqual(1e-12 * g * d);
          expect(Math.min(up, low)).toBeLessThanOrEqual(zero.lowerDischarge.value * (1 + 1e-12));
        },
      ),
      { numRuns: 200 },
    );
  });
  it('the opposing layer falls steadily to zero towards either end', () => {
    fc.assert(
      fc.property(basin, fc.double({ min: 0.01, max: 0.98, noNaN: true }), (k, f) => {
        const H = k === undefined ? undefined : 10 * k,
          run = (q: number) => exchangeSillWithNetFlowFarmerArmi1986(0.02, 10, 50, q, H);
        const z = run(0);
        expect(run((f + 0.01) * z.flushingWithUpper).lowerDischarge.value).toBeLessThan(
          run(f * z.flushingWithUpper).lowerDischarge.value,
        );
        expect(run((f + 0.01) * z.flushingWithLower).upperDischarge.value).toBeLessThan(
          run(f * z.flushingWithLower).upperDischarge.value,
        );
      }),
      { numRuns: 100 },
    );
  });
  it('deep basin without net flow: the same as the zero-net-flow sill function', () => {
    const a = exchangeSillWithNetFlowFarmerArmi1986(0.03, 12, 40, 0),
      c = maximalExchangeSillFarmerArmi1986(0.03, 12, 40);
    expect(a.lowerDischarge.value / c.discharge.value - 1).toBeLessThan(1e-12);
    expect(Math.abs(a.upperThicknessAtCrest! - c.upperThicknessAtControl)).toBeLessThan(1e-9);
  });
  it('a shallower dense basin passes more (towards ¼ with no sill); deep-basin limit approached as H grows', () => {
    const q = (H?: number) => exchangeSillWithNetFlowFarmerArmi1986(1, 1, 1, 0, H).lowerDischarge.value;
    expect(q(1.5)).toBeGreaterThan(q(3));
    expect(q(3)).toBeGreaterThan(q());
    expect(q(1e4)).toBeCloseTo(q(), 6);
    expect(q(1 + 1e-12)).toBeLessThanOrEqual(0.25 + 1e-12);
  });
  it('beyond either end: one-way flow, zero exchange, clear text; basin shallower than the crest refused', () => {
    const z = exchangeSillWithNetFlowFarmerArmi1986(0.02, 10, 50, 0, 30);
    const up = exchangeSillWithNetFlowFarmerArmi1986(0.02, 10, 50, 1.2 * z.flushingWithUpper, 30);
    expect(up.regime).toBe('one-way');
    expect(up.lowerDischarge.value).toBe(0);
    expect(up.warnings.find((w) => w.code === 'one-way-flow')?.message).toMatch(/one-way flow, no exchange/);
    const low = exchangeSillWithNetFlowFarmerArmi1986(0.02, 10, 50, 1.01 * z.flushingWithLower, 30);
    expect(low.upperDischarge.value).toBe(0);
    expect(low.lowerDischarge.value).toBeCloseTo(-1.01 * z.flushingWithLower, 9);
    expect(() => exchangeSillWithNetFlowFarmerArmi1986(0.02, 10, 50, 0, 10)).toThrow(InputError);
  });
  it('calc: a sill takes a net discharge and a basin depth; the series spans the exchange range', () => {
    const m = findCalcMethod('exchange-flow')!;
    const out = runCalc(m, {
      g_prime: '0.02',
      depth: '10',
      width: '50',
      control: 'sill',
      net_discharge: '30',
      reservoir_depth: '25',
    });
    const { upper_layer_discharge: up, lower_layer_discharge: low, exchange_discharge: ex } = out.results;
    expect((up.value as number) - (low.value as number)).toBeCloseTo(30, 9);
    expect(ex.value).toBe(low.value);
    expect(out.series![0].x.values.at(-1)).toBeCloseTo(scale(0.02, 10, 50), 9);
    expect(
      runCalc(m, { g_prime: '0.02', depth: '10', width: '50', control: 'sill' }).results.exchange_discharge.value,
    ).toBeCloseTo(0.2079878265593273 * scale(0.02, 10, 50), 6);
  });
});

describe('estuaries: bad input', () => {
  it('never an uncaught non-InputError, never NaN', () => {
    fc.assert(
      fc.property(fc.double(), fc.double(), fc.double(), fc.double(), (u, h, g, f) => {
        try {
          const r = saltWedgeLengthSchijfSchonfeld1953({
            riverVelocity: u,
            depth: h,
            gPrime: g,
            interfacialFriction: f,
          });
          expect(Number.isFinite(r.length.value)).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(InputError);
        }
        try {
          expect(Number.isFinite(estuarineRichardsonFischer1972(g, u, h, f).richardson.value)).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(InputError);
        }
        try {
          expect(Number.isFinite(maximalExchangeSillFarmerArmi1986(g, h, u).discharge.value)).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(InputError);
        }
        try {
          const r = exchangeSillWithNetFlowFarmerArmi1986(g, h, u, f, Math.abs(h) * 1.5);
          expect(Number.isFinite(r.upperDischarge.value) && Number.isFinite(r.lowerDischarge.value)).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(InputError);
        }
        try {
          const r = exchangeWithNetFlowArmiFarmer1986(g, h, u, f);
          expect(Number.isFinite(r.upperDischarge.value) && Number.isFinite(r.lowerDischarge.value)).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(InputError);
        }
      }),
    );
    expect(() =>
      navigationLockExchange({ gPrime: 0.2, length: 150, width: 16, depth: 5, salinityDifference: 28 }, [-1]),
    ).toThrow(InputError);
  });
});
