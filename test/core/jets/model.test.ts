import { describe, expect, it } from 'vitest';
import { findCalcMethod } from '../../../shared-core/calc/registry';
import { runCalc } from '../../../shared-core/calc/resolve';
import { boundaryDilutionOfModel } from '../../../shared-core/jets/model-boundary';
import { incompleteOf } from '../../../shared-core/jets/calc';
import { buoyantJetTrajectory } from '../../../shared-core/jets/buoyant-jet';
import { dilutionAtBoundary } from '../../../shared-core/mixing-zone/boundary';
import { InputError } from '../../../shared-core/core/errors';

const jet = findCalcMethod('buoyant-jet')!,
  diffuser = findCalcMethod('diffuser-plume')!;
const port = { diameter: 0.3, velocity: 2, angle: 0, port_depth: 30, effluent_density: 1000, ambient_density: 1025 };

describe('typed models on the calc output', () => {
  it('buoyant-jet returns its trajectory as plain data, with kinds on its series and no incomplete mark', () => {
    const out = runCalc(jet, { ...port, current: 0.1 });
    expect(out.model?.kind).toBe('jet');
    expect(structuredClone(out.model)).toEqual(out.model);
    expect(out.series?.map((s) => s.kind)).toEqual(['plume-centreline', 'dilution-along-path']);
    expect(out.incomplete).toBeUndefined();
    expect(out.warnings.every((w) => /^[a-z]+(-[a-z]+)*$/.test(w.code))).toBe(true);
  });

  it('diffuser-plume returns both paths and a single-port curve', () => {
    const out = runCalc(diffuser, { ...port, spacing: 1.5, ports: 10 });
    expect(out.model?.kind).toBe('diffuser');
    expect(structuredClone(out.model)).toEqual(out.model);
    expect(out.series?.map((s) => s.kind)).toEqual(['plume-centreline', 'dilution-along-path', 'single-port-dilution']);
  });

  it('a path stopped at its step limit marks the output incomplete, naming the limit and where it stopped', () => {
    const t = buoyantJetTrajectory({
      diameter: 0.3,
      velocity: 2,
      angle: 0,
      portDepth: 30,
      effluentDensity: 1000,
      ambient: { kind: 'uniform', density: 1025 },
      maxSteps: 4,
    });
    expect(t.status).toBe('max-steps');
    expect(t.outcome).toBe('failed');
    expect(incompleteOf(t).incomplete).toMatch(
      /^the path integration stopped at its step limit of 4 steps at ⟦[\d.e+-]+\|m\|4⟧ along the path$/,
    );
    expect(t.warnings.find((w) => w.code === 'integration-incomplete')?.message).toMatch(/step limit/);
  });
});

describe('mixing-zone dilution read from a computed model', () => {
  it('a pure jet in still water: the average dilution 10 m along the path meets the analytic jet limit', () => {
    // Albertson et al. (1950) / Fischer et al. (1979) §9.1: S_avg = 2α√π z / l_Q with top-hat α = √2·0.0535, i.e.
    // S_avg·l_Q/z = 0.26821, approached far from the port (virtual origin); 3 % as in check-values/jets/buoyant-jet.json
    const out = runCalc(jet, {
      diameter: 0.05,
      velocity: 2,
      angle: 90,
      port_depth: 25,
      effluent_density: 1025,
      ambient_density: 1025,
    });
    const d = boundaryDilutionOfModel(out.model!, { measure: 'path', distance: 10 });
    const lQ = (Math.sqrt(Math.PI) / 2) * 0.05;
    expect(d.path).toBe('jet');
    expect(d.reached).toBe(true);
    expect(Math.abs((d.dilutionAverage * lQ) / 10 / 0.26821 - 1)).toBeLessThan(0.03);
  });

  it('a jet model gives the dilution of a fresh run of the same jet', () => {
    const out = runCalc(jet, { ...port, current: 0.1 });
    const fresh = buoyantJetTrajectory({
      diameter: 0.3,
      velocity: 2,
      angle: 0,
      portDepth: 30,
      effluentDensity: 1000,
      ambient: { kind: 'uniform', density: 1025 },
      current: 0.1,
    });
    const edge = { measure: 'horizontal', distance: 12 } as const;
    expect(boundaryDilutionOfModel(out.model!, edge).dilutionCentreline).toBe(
      dilutionAtBoundary(fresh, edge).dilutionCentreline,
    );
  });

  it('a diffuser gives the smaller of its merged and single-port dilutions and names the path', () => {
    const out = runCalc(diffuser, { ...port, spacing: 1.5, ports: 10 });
    if (out.model?.kind !== 'diffuser') throw new Error('no diffuser model');
    const edge = { measure: 'horizontal', distance: 8 } as const;
    const merged = dilutionAtBoundary(out.model.diffuser.merged, edge),
      single = dilutionAtBoundary(out.model.diffuser.isolated, edge);
    const d = boundaryDilutionOfModel(out.model, edge);
    expect(out.model.diffuser.merge).toBeDefined();
    expect(d.dilutionCentreline).toBe(Math.min(merged.dilutionCentreline, single.dilutionCentreline));
    expect(d.dilutionCentreline).toBeLessThan(single.dilutionCentreline);
    expect(d.path).toBe('merged plumes');
    const wide = runCalc(diffuser, { ...port, spacing: 500, ports: 2 });
    expect(boundaryDilutionOfModel(wide.model!, edge).path).toBe('single-port plume');
  });

  it('a model without a plume path is refused with an InputError', () => {
    expect(() =>
      boundaryDilutionOfModel(
        { kind: 'withdrawal-layer', portDepth: 5, top: 3, bottom: 7 },
        { measure: 'horizontal', distance: 1 },
      ),
    ).toThrow(InputError);
  });
});
