import { describe, expect, it } from 'vitest';
import { findCalcMethod } from '../../../shared-core/calc/registry';
import { runCalc } from '../../../shared-core/calc/resolve';
import { InputError } from '../../../shared-core/core/errors';
import { buoyantJetTrajectory, type BuoyantJetInput } from '../../../shared-core/jets/buoyant-jet';
import { denseJetLabCorrelations } from '../../../shared-core/jets/dense-jet-lab';
import { dilutionAtBoundary } from '../../../shared-core/mixing-zone/boundary';
import { GRAVITY } from '../../../shared-core/quantities';
import { runCheckValues } from '../../helpers/check-values';

const D = 0.1;
runCheckValues('jets', 'dense-jet-lab', (i) => {
  const F = Number(i.froude);
  const lab = denseJetLabCorrelations(Number(i.angle), F, D);
  if (!lab) throw new Error(`no laboratory values at ${i.angle}°`);
  const value =
    i.quantity === 'return dilution over F'
      ? lab.returnDilution / F
      : ((i.quantity === 'max rise over F D' ? lab.maxRise : lab.returnDistance) ?? NaN) / (F * D);
  return value;
});

/** A 60° dense jet of Froude number 25 in still uniform water, 30 m deep (g′ = 0.1 m/s²). */
const F = 25;
const dense = (patch: Partial<BuoyantJetInput> = {}) =>
  buoyantJetTrajectory({
    diameter: D,
    velocity: F * Math.sqrt(0.1 * D),
    angle: 60,
    portDepth: 30,
    effluentDensity: 1025 * (1 + 0.1 / GRAVITY),
    ambient: { kind: 'uniform', density: 1025 },
    ...patch,
  });

describe('dense-jet laboratory correlations beside the integral model', () => {
  it('covers 30°–70° only, the rise and return point at 55°–65° only, and warns outside 38°–60°, Fr ≥ 20, still water', () => {
    expect(denseJetLabCorrelations(20, 25, D)).toBeUndefined();
    expect(denseJetLabCorrelations(75, 25, D)).toBeUndefined();
    const at45 = denseJetLabCorrelations(45, 25, D)!;
    expect(at45.maxRise).toBeUndefined();
    expect(at45.returnDistance).toBeUndefined();
    expect(at45.warnings).toEqual([]);
    const inputs = (a: number, f: number, u: number) =>
      denseJetLabCorrelations(a, f, D, u)!.warnings.map((w) => [w.code, w.severity, w.input]);
    expect(inputs(65, 25, 0)).toEqual([['validity-range', 'outside-validity', 'angle']]);
    expect(inputs(60, 10, 0)).toEqual([['validity-range', 'outside-validity', 'froude']]);
    expect(inputs(60, 25, 0.1)).toEqual([['validity-range', 'outside-validity', 'current']]);
    expect(() => denseJetLabCorrelations(60, 0, D)).toThrow(InputError);
  });

  it('the model’s return dilution is the smaller, so cautious keeps it; lab takes the correlation; both are in the model', () => {
    const cautious = dense(),
      lab = dense({ denseJetDilution: 'lab' }),
      model = dense({ denseJetDilution: 'model' });
    const ret = cautious.events.find((e) => e.kind === 'return to port level')!;
    // the integral model under-predicts the return dilution (Lai & Lee 2012: S_i/Fr = 1.06; the model about 0.8)
    expect(ret.dilutionCentreline).toBeLessThan(1.06 * F);
    expect(cautious.denseJet).toMatchObject({ choice: 'cautious', factor: 1, returnDilution: ret.dilutionCentreline });
    expect(model.denseJet?.returnDilution).toBe(ret.dilutionCentreline);
    expect(lab.denseJet?.returnDilution).toBeCloseTo(1.06 * F, 9);
    expect(lab.denseJet?.lab?.maxRise).toBeCloseTo(2.2 * D * F, 9);
    expect(structuredClone(lab.denseJet)).toEqual(lab.denseJet);
    expect(lab.warnings.map((w) => w.code)).toContain('dense-jet-lab-dilution-used');
    // the model's rise is low: the jet top (centreline + radius) lies below the laboratory terminal rise
    const top = cautious.events.find((e) => e.kind === 'maximum rise')!;
    expect(top.z + top.radius).toBeLessThan(lab.denseJet!.lab!.maxRise!);
    expect(cautious.warnings.find((w) => w.code === 'dense-jet-rise-low')).toMatchObject({ severity: 'caution' });
  });

  it('compliance reads the chosen dilution: scaled at and beyond the return point only, the note says so', () => {
    const t = dense({ denseJetDilution: 'lab' }),
      plain = dense({ denseJetDilution: 'model' });
    const dj = t.denseJet!;
    const far = { measure: 'horizontal', distance: 50 } as const;
    const beyond = dilutionAtBoundary(t, far);
    expect(beyond.dilutionCentreline).toBeCloseTo(dj.returnDilution, 9);
    expect(beyond.note).toMatch(/dense-jet dilution used: lab/);
    expect(dilutionAtBoundary(plain, far).dilutionCentreline).toBe(dj.modelReturnDilution);
    const near = { measure: 'path', distance: dj.returnPathDistance / 2 } as const;
    expect(dilutionAtBoundary(t, near).dilutionCentreline).toBe(dilutionAtBoundary(plain, near).dilutionCentreline);
  });

  it('lab values and the chosen dilution are calc results; laboratory validity is a note while the model’s value is used', () => {
    const jet = findCalcMethod('buoyant-jet')!;
    const args = {
      diameter: D,
      velocity: F * Math.sqrt(0.1 * D),
      angle: 60,
      port_depth: 30,
      effluent_density: 1025 * (1 + 0.1 / GRAVITY),
      ambient_density: 1025,
      current: 0.05,
    };
    const out = runCalc(jet, args);
    expect(Object.keys(out.results)).toEqual(
      expect.arrayContaining(['return_dilution_lab', 'return_distance_lab', 'max_rise_lab', 'return_dilution_chosen']),
    );
    expect(out.results.return_dilution_chosen.value).toBe(out.results.return_dilution.value);
    expect(out.warnings.find((w) => w.input === 'current' && w.code === 'validity-range')?.severity).toBe('note');
    const lab = runCalc(jet, { ...args, dense_jet_dilution: 'lab' });
    expect(lab.warnings.find((w) => w.input === 'current' && w.code === 'validity-range')?.severity).toBe(
      'outside-validity',
    );
    expect(() => runCalc(jet, { ...args, dense_jet_dilution: 'largest' })).toThrow(InputError);
    // a shallow port: the laboratory rise reaches the surface, which the caution says
    const shallow = runCalc(jet, { ...args, port_depth: 5 });
    expect(shallow.warnings.map((w) => w.code)).toContain('dense-jet-lab-reaches-surface');
  });
});
