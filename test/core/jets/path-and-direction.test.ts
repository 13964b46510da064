import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { findCalcMethod } from '../../../shared-core/calc/registry';
import { runCalc } from '../../../shared-core/calc/resolve';
import { buoyantJetTrajectory } from '../../../shared-core/jets/buoyant-jet';
import { dilutionAtBoundary } from '../../../shared-core/mixing-zone/boundary';

const jet = findCalcMethod('buoyant-jet')!;
/** A weakly buoyant vertical plume 20 m deep in a 0.6 m/s current: it surfaces some 1.4 km downstream. */
const swept = { diameter: 0.2, velocity: 2, angle: 90, port_depth: 20, effluent_density: 1024, ambient_density: 1025 };

describe('length of path followed', () => {
  it('a plume that surfaces beyond 50 port depths reports its surface dilution by default', () => {
    const out = runCalc(jet, { ...swept, current: 0.6 });
    const model = out.model?.kind === 'jet' ? out.model.trajectory : undefined;
    expect(model?.outcome).toBe('surfaces');
    expect(model!.path.horizontalDistance.at(-1)!).toBeGreaterThan(50 * 20);
    expect(out.results.surface_dilution.value).toBeGreaterThan(1);
    expect(out.results.near_field_dilution.value).toBe(out.results.surface_dilution.value);
    const edge = dilutionAtBoundary(model!, { measure: 'horizontal', distance: 1200 });
    expect(edge.reached).toBe(true);
  });

  it('a path cut short by max_path_length still reports its end dilution, a lower bound, with a caution', () => {
    const full = runCalc(jet, { ...swept, current: 0.6 });
    const cut = runCalc(jet, { ...swept, current: 0.6, max_path_length: 500 });
    expect(cut.results.surface_dilution).toBeUndefined();
    expect(cut.results.near_field_dilution.value).toBeLessThan(full.results.near_field_dilution.value as number);
    expect(cut.warnings.find((w) => w.code === 'path-length-reached')).toMatchObject({
      severity: 'caution',
      input: 'max_path_length',
    });
    expect(() => runCalc(jet, { ...swept, max_path_length: 0 })).toThrow(/max_path_length/);
  });
});

describe('current direction of a single port (current_angle)', () => {
  const scipy = JSON.parse(
    readFileSync(resolve(import.meta.dirname, '../../check-values/jets/generators/buoyant-jet-scipy.json'), 'utf8'),
  );
  // the uniform-water cases of the independent scipy integration (generators/buoyant_jet_scipy.py), through the calc
  for (const r of scipy.results.filter((x: { case: { table?: unknown } }) => !x.case.table)) {
    const c = r.case;
    it(`${c.name}: current_angle = ${c.horizontalAngle ?? 0}° gives the scipy path`, () => {
      const out = runCalc(jet, {
        diameter: c.diameter,
        velocity: c.velocity,
        angle: c.angle,
        port_depth: c.portDepth,
        effluent_density: c.effluentDensity,
        ambient_density: c.ambientDensity,
        current: c.current ?? 0,
        current_angle: c.horizontalAngle ?? 0,
        max_path_length: c.maxPath,
      });
      if (out.model?.kind !== 'jet') throw new Error('no jet model');
      for (const [kind, ref] of Object.entries(r.events) as [string, Record<string, number>][]) {
        const e = out.model.trajectory.events.find((x) => x.kind === kind)!;
        for (const key of ['s', 'z', 'horizontalDistance', 'dilutionCentreline'] as const)
          expect(Math.abs(e[key] - ref[key]), `${kind}.${key}`).toBeLessThanOrEqual(2e-5 * Math.max(1, ref[key]));
      }
    });
  }

  it('across the current the path follows the two-thirds law (Briggs 1975: z u/(B^⅓ x^⅔) = 1.09 ± 20 %, from memory)', () => {
    // the crossflow case of check-values/jets/buoyant-jet.json, run through the calc's current_angle
    const D = 0.1,
      U = 0.3,
      g = 0.2,
      ua = 0.1,
      B = (g * Math.PI * D * D * U) / 4;
    const out = runCalc(jet, {
      diameter: D,
      velocity: U,
      angle: 90,
      port_depth: 200,
      effluent_density: 1025 * (1 - g / 9.80665),
      ambient_density: 1025,
      current: ua,
      current_angle: 90,
    });
    if (out.model?.kind !== 'jet') throw new Error('no jet model');
    const p = out.model.trajectory.path;
    const i = p.x.findIndex((x) => x >= 20 * (B / ua ** 3));
    expect(Math.abs((p.z[i] * ua) / (B ** (1 / 3) * p.x[i] ** (2 / 3)) / 1.09 - 1)).toBeLessThan(0.2);
  });

  it('co-flowing (0°, the default) gives the lowest dilution; across and against the current more; the path is 3-D', () => {
    const base = { diameter: 0.3, velocity: 1.5, angle: 0, portDepth: 20, effluentDensity: 1015 };
    const at = (h: number) =>
      buoyantJetTrajectory({ ...base, ambient: { kind: 'uniform', density: 1025 }, current: 0.3, horizontalAngle: h });
    const edge = { measure: 'horizontal', distance: 30 } as const;
    const S = (h: number) => dilutionAtBoundary(at(h), edge).dilutionCentreline;
    expect(S(90)).toBeGreaterThan(S(0));
    expect(S(180)).toBeGreaterThan(S(0));
    const across = at(90).path;
    const k = across.x.length - 1;
    expect(across.horizontalDistance[k]).toBeCloseTo(Math.hypot(across.x[k], across.y[k]), 9);
    expect(Math.abs(across.y[k])).toBeGreaterThan(1);
    const out = runCalc(jet, { ...swept, current: 0.3 });
    const direct = buoyantJetTrajectory({
      diameter: 0.2,
      velocity: 2,
      angle: 90,
      portDepth: 20,
      effluentDensity: 1024,
      ambient: { kind: 'uniform', density: 1025 },
      current: 0.3,
      horizontalAngle: 0,
    });
    expect(out.model?.kind === 'jet' && out.model.trajectory.path.s).toEqual(direct.path.s);
  });
});
