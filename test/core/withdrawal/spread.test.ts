import { describe, expect, it } from 'vitest';
import { findCalcMethod } from '../../../shared-core/calc/registry';
import { runCalc } from '../../../shared-core/calc/resolve';

const value = (out: ReturnType<typeof runCalc>, name: string) => out.results[name]?.value as number;

describe('withdrawal-layer says total or half and shows the published spread', () => {
  it('inertial line sink: total 2δ, half δ, and the spread from Yih/Kao 1/π to Imberger et al. C = 2 (coefficients from memory)', () => {
    const out = runCalc(findCalcMethod('withdrawal-layer')!, {
      buoyancy_frequency: 0.02,
      discharge: 20,
      sink: 'line',
      width: 10,
    });
    const scale = Math.sqrt(2 / 0.02); // (q/N)^½ with q = 2 m2/s
    expect(value(out, 'half_thickness')).toBeCloseTo(2 * scale, 12);
    expect(value(out, 'thickness')).toBeCloseTo(2 * value(out, 'half_thickness'), 12);
    // Yih (1958) / Kao (1970): q/(Nδ²) = 1/π → δ = √π (q/N)^½
    expect(value(out, 'thickness_low')).toBeCloseTo(2 * Math.sqrt(Math.PI) * scale, 12);
    expect(value(out, 'thickness_high')).toBeCloseTo(4 * scale, 12);
    expect(out.warnings.map((w) => w.code)).toContain('published-coefficient-spread');
  });
  it('point sink: one coefficient, low = high = reported, and a note says so', () => {
    const out = runCalc(findCalcMethod('withdrawal-layer')!, {
      buoyancy_frequency: 0.02,
      discharge: 20,
      sink: 'point',
    });
    expect(value(out, 'thickness_low')).toBe(value(out, 'thickness'));
    expect(value(out, 'thickness_high')).toBe(value(out, 'thickness'));
    expect(out.warnings.map((w) => w.code)).toContain('single-published-coefficient');
  });
});

describe('withdrawal-two-layer compares the planned release with the critical discharge', () => {
  const m = () => findCalcMethod('withdrawal-two-layer')!;
  const args = { g_prime: 0.02, interface_distance: 5, sink: 'point' };
  it('states the ratio and cautions when the release exceeds the critical discharge', () => {
    const base = runCalc(m(), args);
    const qc = value(base, 'critical_discharge');
    expect(base.results.discharge_ratio).toBeUndefined();
    const over = runCalc(m(), { ...args, planned_discharge: 2 * qc });
    expect(value(over, 'discharge_ratio')).toBeCloseTo(2, 12);
    expect(over.warnings.find((w) => w.code === 'planned-above-critical')?.input).toBe('planned_discharge');
    const under = runCalc(m(), { ...args, planned_discharge: 0.5 * qc });
    expect(under.warnings.map((w) => w.code)).not.toContain('planned-above-critical');
  });
});
