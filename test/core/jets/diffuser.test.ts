import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { diffuserPlume, type DiffuserInput } from '../../../shared-core/jets/diffuser';
import { buoyantJetTrajectory } from '../../../shared-core/jets/buoyant-jet';
import { InputError } from '../../../shared-core/core/errors';
import { GRAVITY } from '../../../shared-core/quantities';
import { runCheckValues } from '../../helpers/check-values';
import { assessSite, loadSite } from '../../../shared-core/site';

const portFlux = (D: number, U: number) => (Math.PI * D * D * U) / 4;

/** Uniform still water 1025 kg/m³, effluent g′ = 0.2 m/s², ports 40 m deep. */
const uniform = (D: number, U: number, spacing: number) =>
  diffuserPlume({
    diameter: D,
    velocity: U,
    angle: 90,
    portDepth: 40,
    effluentDensity: 1025 * (1 - 0.2 / GRAVITY),
    ambient: { kind: 'uniform', density: 1025 },
    spacing,
  });
/** Linear stratification 1020 → 1023 kg/m³ over 60 m, fresh effluent, ports at the bottom (as the buoyant-jet check). */
const STRAT = { kind: 'table', depth: [0, 60], density: [1020, 1023] } as const;
const N = Math.sqrt((GRAVITY * 3) / 60 / 1023);
const stratified = (spacing: number, D = 0.02, U = 0.1) =>
  diffuserPlume({ diameter: D, velocity: U, angle: 90, portDepth: 60, effluentDensity: 1000, ambient: STRAT, spacing });
const gPort = (GRAVITY * 23) / 1023;

function compute(i: Record<string, number | string>): number {
  switch (i.quantity) {
    case 'uniform line-limit average dilution coefficient':
    case 'uniform line-limit centreline dilution coefficient': {
      const r = uniform(0.02, 0.2, 0.05),
        q = portFlux(0.02, 0.2) / 0.05;
      const S = i.quantity.startsWith('uniform line-limit average') ? r.dilutionAverage : r.dilution;
      return (S * q) / (Math.cbrt(0.2 * q) * 40);
    }
    case 'stratified line-limit centreline dilution coefficient':
    case 'stratified line-limit rise over l_b': {
      const r = stratified(0.03),
        q = portFlux(0.02, 0.1) / 0.03,
        b = gPort * q;
      return i.quantity.endsWith('l_b') ? r.riseHeight / (Math.cbrt(b) / N) : (r.dilution * q * N) / b ** (2 / 3);
    }
    default: {
      const r = stratified(50),
        B = gPort * portFlux(0.02, 0.1);
      expect(r.regime).toBe('isolated round plumes');
      return r.riseHeight / (B / N ** 3) ** 0.25;
    }
  }
}

runCheckValues('jets', 'diffuser-plume', compute);

describe('diffuser-plume against an independent scipy integration (generators/diffuser_plume_scipy.py)', () => {
  const file = JSON.parse(
    readFileSync(resolve(import.meta.dirname, '../../check-values/jets/generators/diffuser-plume-scipy.json'), 'utf8'),
  );
  for (const r of file.results) {
    const c = r.case;
    it(c.name, () => {
      const d = diffuserPlume({
        diameter: c.diameter,
        velocity: c.velocity,
        angle: c.angle,
        portDepth: c.portDepth,
        effluentDensity: c.effluentDensity,
        maxPath: c.maxPath,
        spacing: c.spacing,
        ambient: c.table
          ? { kind: 'table', depth: c.table.depth, density: c.table.density }
          : { kind: 'uniform', density: c.ambientDensity },
        current: c.currentTable ?? c.current ?? 0,
      });
      expect(d.regime).toBe('merged line plume');
      for (const [kind, ref] of Object.entries(r.events) as [string, Record<string, number>][]) {
        const e = d.merged.events.find((x) => x.kind === kind);
        expect(e, `${kind} missing; ${d.merged.outcomeText}`).toBeDefined();
        for (const key of [
          's',
          'z',
          'horizontalDistance',
          'radius',
          'dilutionCentreline',
          'dilutionAverage',
        ] as const) {
          expect(Math.abs(e![key] - ref[key]), `${kind}.${key}: ${e![key]} vs scipy ${ref[key]}`).toBeLessThanOrEqual(
            2e-5 * Math.max(1, Math.abs(ref[key])),
          );
        }
      }
    });
  }
});

describe('diffuser-plume limits', () => {
  it('close spacing: the experimental line-plume minimum dilutions lie between the model’s centreline and average values', () => {
    // Roberts, Snyder & Baumgartner (1989): S_m qN/b^⅔ = 0.86 in linear stratification (from memory)
    const r = stratified(0.03),
      q = portFlux(0.02, 0.1) / 0.03,
      scale = (q * N) / (gPort * q) ** (2 / 3);
    expect(r.dilution * scale).toBeLessThan(0.86);
    expect(r.dilutionAverage * scale).toBeGreaterThan(0.86);
    // line plume reaching the surface of still uniform water: S_m q/(b^⅓H) = 0.38 (Fischer et al. 1979 §9.3; from memory)
    const u = uniform(0.02, 0.2, 0.05),
      qu = portFlux(0.02, 0.2) / 0.05,
      su = qu / (Math.cbrt(0.2 * qu) * 40);
    expect(u.dilution * su).toBeLessThan(0.38);
    expect(u.dilutionAverage * su).toBeGreaterThan(0.38);
  });

  it('wide spacing: the ports act as isolated round plumes and give the single-port result exactly', () => {
    const r = stratified(50);
    const single = buoyantJetTrajectory({
      diameter: 0.02,
      velocity: 0.1,
      angle: 90,
      portDepth: 60,
      effluentDensity: 1000,
      ambient: STRAT,
    });
    expect(r.merge).toBeUndefined();
    expect(r.dilution).toBe(single.path.dilutionCentreline.at(-1));
    expect(r.riseHeight).toBe(single.maxRise);
    expect(r.regimeText).toMatch(/do not merge/);
  });

  it('dilution is continuous where the plumes merge and never falls along the path', () => {
    const r = stratified(0.5);
    const k = r.merged.path.s.findIndex((s) => s > r.merge!.s);
    expect(r.merged.path.dilutionAverage[k - 1]).toBeCloseTo(r.merge!.dilutionAverage, 6);
    r.merged.path.dilutionAverage.forEach((s, i) => {
      if (i > 0) expect(s).toBeGreaterThanOrEqual(r.merged.path.dilutionAverage[i - 1] * (1 - 1e-12));
    });
  });

  it('dilution does not fall as the spacing widens, between the line-plume and single-port limits', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.03, max: 8, noNaN: true }),
        fc.double({ min: 1.05, max: 4, noNaN: true }),
        (s, f) => {
          const close = stratified(s),
            wide = stratified(s * f);
          expect(wide.dilution).toBeGreaterThanOrEqual(close.dilution * (1 - 1e-6));
          expect(wide.dilution).toBeLessThanOrEqual(wide.isolated.path.dilutionCentreline.at(-1)! * (1 + 1e-12));
        },
      ),
      { numRuns: 12 },
    );
  });

  it('one port is the single-port result; warnings name the current, its direction and a short diffuser', () => {
    const base: DiffuserInput = {
      diameter: 0.2,
      velocity: 1,
      angle: 0,
      portDepth: 20,
      effluentDensity: 1000,
      ambient: { kind: 'uniform', density: 1025 },
    };
    const one = diffuserPlume({ ...base, ports: 1 });
    expect(one.regime).toBe('single port');
    expect(one.dilution).toBe(buoyantJetTrajectory({ ...base, horizontalAngle: 0 }).path.dilutionCentreline.at(-1));
    const swept = diffuserPlume({ ...base, spacing: 2, ports: 4, current: 0.1, currentAngle: 20 });
    const w = swept.warnings.map((x) => x.message).join(' ');
    expect(swept.warnings.map((x) => [x.code, x.severity, x.input])).toEqual(
      expect.arrayContaining([
        ['merged-plume-still-water', 'caution', 'current'],
        ['current-along-diffuser', 'outside-validity', 'current_angle'],
        ['diffuser-shorter-than-rise', 'caution', undefined],
      ]),
    );
    expect(w).toMatch(/still water/);
    expect(w).toMatch(/20° to the diffuser/);
    expect(w).toMatch(/shorter than the rise/);
    expect(swept.froudeCurrent).toBeCloseTo(0.1 ** 3 / ((((GRAVITY * 25) / 1025) * portFlux(0.2, 1)) / 2), 9);
  });
});

describe('diffuser-plume bad input', () => {
  const base: DiffuserInput = {
    diameter: 0.2,
    velocity: 1,
    angle: 30,
    portDepth: 20,
    effluentDensity: 1000,
    ambient: { kind: 'uniform', density: 1025 },
    spacing: 3,
  };
  it.each([
    ['spacing (missing)', { spacing: undefined }],
    ['spacing (not wider than a port)', { spacing: 0.2 }],
    ['ports', { ports: 2.5 }],
    ['ports (none)', { ports: 0 }],
    ['current_angle', { currentAngle: 120 }],
    ['diameter', { diameter: -1 }],
  ])('%s is refused with an InputError', (_name, patch) => {
    expect(() => diffuserPlume({ ...base, ...patch })).toThrow(InputError);
  });
  it('random input never throws anything but an InputError and never returns NaN', () => {
    fc.assert(
      fc.property(
        fc.record({
          spacing: fc.double(),
          velocity: fc.double({ min: -1, max: 5 }),
          effluentDensity: fc.double({ min: 950, max: 1100 }),
        }),
        (p) => {
          try {
            const r = diffuserPlume({ ...base, ...p, maxPath: 200 });
            expect(Number.isFinite(r.dilution) && Number.isFinite(r.riseHeight)).toBe(true);
          } catch (e) {
            expect(e).toBeInstanceOf(InputError);
          }
        },
      ),
      { numRuns: 40 },
    );
  });
});

describe('diffuser-plume in the site file and the compliance table', () => {
  const demo = () =>
    JSON.parse(readFileSync(resolve(import.meta.dirname, '../../../examples/quillmere-reservoir.gpsite'), 'utf8'));
  const outfallIndex = (doc: { features: { kind: string }[] }) => doc.features.findIndex((f) => f.kind === 'outfall');

  it('binds an outfall with several ports (per-port velocity, spacing) and runs from the site file', () => {
    const doc = demo(),
      k = outfallIndex(doc);
    Object.assign(doc.features[k], { ports: 8, spacing: '5 ft', angle: 90 });
    doc.estimates.push({
      id: 'diffuser',
      method: 'diffuser-plume',
      feature: doc.features[k].id,
      condition: doc.conditions[0].id,
    });
    const a = assessSite(loadSite(JSON.stringify(doc)), { gprimeVersion: 't', siteHash: 'h' });
    const e = a.estimates.find((x) => x.id === 'diffuser')!;
    expect(e.status, e.error).toBe('ok');
    expect(e.inputs.spacing.value).toBeCloseTo(5 * 0.3048, 9);
    expect(e.inputs.velocity.value).toBeCloseTo(0.4 / 8 / ((Math.PI * 0.25) / 4), 9);
    expect(e.series.length).toBeGreaterThanOrEqual(3);
  });

  it('the compliance table uses the merged estimate for several ports, and cannot tell without a spacing', () => {
    const doc = demo(),
      k = outfallIndex(doc);
    const single = assessSite(loadSite(JSON.stringify(doc)), { gprimeVersion: 't', siteHash: 'h' }).compliance;
    Object.assign(doc.features[k], { ports: 8, spacing: 0.6, discharge: 8 * 0.4 }); // the same flow per port
    const merged = assessSite(loadSite(JSON.stringify(doc)), { gprimeVersion: 't', siteHash: 'h' }).compliance;
    expect(merged).toHaveLength(single.length);
    merged.forEach((r, i) =>
      expect(r.achievedDilution!).toBeLessThanOrEqual(single[i].achievedDilution! * (1 + 1e-12)),
    );
    expect(merged.some((r, i) => r.achievedDilution! < 0.9 * single[i].achievedDilution!)).toBe(true);
    delete doc.features[k].spacing;
    const missing = assessSite(loadSite(JSON.stringify(doc)), { gprimeVersion: 't', siteHash: 'h' }).compliance;
    expect(missing.every((r) => r.verdict === 'cannot tell' && /spacing/.test(r.note))).toBe(true);
  });
});
