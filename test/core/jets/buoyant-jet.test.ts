import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buoyantJetTrajectory, type BuoyantJetInput, type JetTrajectory } from '../../../shared-core/jets/buoyant-jet';
import { InputError } from '../../../shared-core/core/errors';
import { GRAVITY } from '../../../shared-core/quantities';
import { runCheckValues } from '../../helpers/check-values';

const RHO_A = 1025;
const rhoFor = (gPrime: number) => RHO_A * (1 - gPrime / GRAVITY);
const uniform = { kind: 'uniform', density: RHO_A } as const;
const event = (t: JetTrajectory, kind: string) => {
  const e = t.events.find((x) => x.kind === kind);
  if (!e) throw new Error(`no ${kind} event; outcome: ${t.outcomeText}`);
  return e;
};

/** The model quantity each check-values case names. */
function compute(inputs: Record<string, number | string>): number {
  switch (inputs.quantity) {
    case 'plume average dilution coefficient':
    case 'plume centreline dilution coefficient': {
      const D = 0.05,
        U = 0.2,
        g = 0.2,
        Q0 = (Math.PI * D * D * U) / 4,
        B = g * Q0;
      const t = buoyantJetTrajectory({
        diameter: D,
        velocity: U,
        angle: 90,
        portDepth: 25,
        effluentDensity: rhoFor(g),
        ambient: uniform,
      });
      const i = t.path.z.findIndex((z) => z >= 20);
      const S = inputs.quantity.startsWith('plume average') ? t.path.dilutionAverage[i] : t.path.dilutionCentreline[i];
      return (S * Q0) / (B ** (1 / 3) * t.path.z[i] ** (5 / 3));
    }
    case 'jet average dilution coefficient':
    case 'jet centreline dilution coefficient': {
      const D = 0.05,
        lQ = (Math.sqrt(Math.PI) / 2) * D;
      const t = buoyantJetTrajectory({
        diameter: D,
        velocity: 2,
        angle: 90,
        portDepth: 25,
        effluentDensity: RHO_A,
        ambient: uniform,
      });
      const i = t.path.z.findIndex((z) => z >= 5);
      const S = inputs.quantity.startsWith('jet average') ? t.path.dilutionAverage[i] : t.path.dilutionCentreline[i];
      return (S * lQ) / t.path.z[i];
    }
    case 'rise in linear stratification': {
      const D = 0.02,
        U = 0.1,
        rhoE = 1000,
        N2 = (GRAVITY * 3) / 60 / 1023;
      const B = (((GRAVITY * (1023 - rhoE)) / 1023) * (Math.PI * D * D * U)) / 4;
      const t = buoyantJetTrajectory({
        diameter: D,
        velocity: U,
        angle: 90,
        portDepth: 60,
        effluentDensity: rhoE,
        ambient: { kind: 'table', depth: [0, 60], density: [1020, 1023] },
      });
      return t.maxRise / (B / N2 ** 1.5) ** 0.25;
    }
    case 'crossflow two-thirds law coefficient': {
      const D = 0.1,
        U = 0.3,
        g = 0.2,
        ua = 0.1,
        B = (g * Math.PI * D * D * U) / 4;
      const t = buoyantJetTrajectory({
        diameter: D,
        velocity: U,
        angle: 90,
        portDepth: 200,
        effluentDensity: rhoFor(g),
        ambient: uniform,
        current: ua,
        horizontalAngle: 90,
      });
      const i = t.path.x.findIndex((x) => x >= 20 * (B / ua ** 3));
      return (t.path.z[i] * ua) / (B ** (1 / 3) * t.path.x[i] ** (2 / 3));
    }
    default: {
      // 60° dense jet, F = 20, in still uniform water
      const D = 0.1,
        g = 0.1,
        F = 20,
        U = F * Math.sqrt(g * D);
      const t = buoyantJetTrajectory({
        diameter: D,
        velocity: U,
        angle: 60,
        portDepth: 30,
        effluentDensity: RHO_A * (1 + g / GRAVITY),
        ambient: uniform,
      });
      if (inputs.quantity === 'dense 60 return distance')
        return event(t, 'return to port level').horizontalDistance / (D * F);
      if (inputs.quantity === 'dense 60 return dilution')
        return event(t, 'return to port level').dilutionCentreline / F;
      const top = event(t, 'maximum rise');
      return (top.z + top.radius) / (D * F);
    }
  }
}

runCheckValues('jets', 'buoyant-jet', compute);

describe('buoyant-jet against an independent scipy integration (generators/buoyant_jet_scipy.py)', () => {
  const file = JSON.parse(
    readFileSync(resolve(import.meta.dirname, '../../check-values/jets/generators/buoyant-jet-scipy.json'), 'utf8'),
  );
  for (const r of file.results) {
    const c = r.case;
    it(c.name, () => {
      const input: BuoyantJetInput = {
        diameter: c.diameter,
        velocity: c.velocity,
        angle: c.angle,
        horizontalAngle: c.horizontalAngle,
        portDepth: c.portDepth,
        effluentDensity: c.effluentDensity,
        maxPath: c.maxPath,
        ambient: c.table
          ? { kind: 'table', depth: c.table.depth, density: c.table.density }
          : { kind: 'uniform', density: c.ambientDensity },
        current: c.currentTable ?? c.current ?? 0,
      };
      const t = buoyantJetTrajectory(input);
      expect(t.evaluations).toBeGreaterThan(0);
      for (const [kind, ref] of Object.entries(r.events) as [string, Record<string, number>][]) {
        const e = event(t, kind);
        for (const key of [
          's',
          'z',
          'horizontalDistance',
          'radius',
          'dilutionCentreline',
          'dilutionAverage',
        ] as const) {
          const v = (e as unknown as Record<string, number>)[key];
          expect(Math.abs(v - ref[key]), `${kind}.${key}: ${v} vs scipy ${ref[key]}`).toBeLessThanOrEqual(
            2e-5 * Math.max(1, Math.abs(ref[key])),
          );
        }
      }
    });
  }
});

describe('buoyant-jet properties', () => {
  const arb = fc.record({
    diameter: fc.double({ min: 0.05, max: 1, noNaN: true }),
    velocity: fc.double({ min: 0.3, max: 5, noNaN: true }),
    angle: fc.double({ min: -30, max: 90, noNaN: true }),
    horizontalAngle: fc.double({ min: -180, max: 180, noNaN: true }),
    gPrime: fc.double({ min: -0.4, max: 0.4, noNaN: true }),
    current: fc.double({ min: 0, max: 0.5, noNaN: true }),
    portDepth: fc.double({ min: 5, max: 60, noNaN: true }),
  });
  const run = (p: {
    diameter: number;
    velocity: number;
    angle: number;
    horizontalAngle: number;
    gPrime: number;
    current: number;
    portDepth: number;
  }) =>
    buoyantJetTrajectory({
      ...p,
      effluentDensity: rhoFor(p.gPrime),
      ambient: { kind: 'table', depth: [0, 10, 80], density: [1022, 1024, 1025.5] },
      bedDepth: p.portDepth + 2,
    });

  it('dilution is at least 1 and never decreases along the path; no NaN', () => {
    fc.assert(
      fc.property(arb, (p) => {
        const t = run(p);
        expect(['completed', 'terminal-event']).toContain(t.status);
        for (const col of [t.path.dilutionCentreline, t.path.dilutionAverage, t.path.x, t.path.z, t.path.radius])
          expect(col.every(Number.isFinite)).toBe(true);
        t.path.dilutionAverage.forEach((s, i) => {
          expect(s).toBeGreaterThanOrEqual(1 - 1e-12);
          if (i > 0) expect(s).toBeGreaterThanOrEqual(t.path.dilutionAverage[i - 1] * (1 - 1e-12));
        });
        t.path.dilutionCentreline.forEach((s) => expect(s).toBeGreaterThanOrEqual(1));
        expect(t.outcomeText.length).toBeGreaterThan(20);
      }),
      { numRuns: 40 },
    );
  });

  it('jets at ±horizontal angle to the current are mirror images', () => {
    fc.assert(
      fc.property(arb, (p) => {
        const a = run({ ...p, horizontalAngle: Math.abs(p.horizontalAngle) });
        const b = run({ ...p, horizontalAngle: -Math.abs(p.horizontalAngle) });
        expect(b.path.y.length).toBe(a.path.y.length);
        a.path.y.forEach((y, i) => {
          expect(b.path.y[i]).toBeCloseTo(-y, 6);
          expect(b.path.dilutionAverage[i]).toBeCloseTo(a.path.dilutionAverage[i], 6);
        });
      }),
      { numRuns: 15 },
    );
  });

  it('a vertical plume in still water stays on the vertical axis', () => {
    const t = buoyantJetTrajectory({
      diameter: 0.2,
      velocity: 1,
      angle: 90,
      portDepth: 20,
      effluentDensity: 1000,
      ambient: uniform,
    });
    expect(Math.max(...t.path.horizontalDistance)).toBeLessThan(1e-9);
    expect(t.outcome).toBe('surfaces');
  });

  it('reports trapping, the bed and merging of neighbouring plumes in words and events', () => {
    const trapped = buoyantJetTrajectory({
      diameter: 0.1,
      velocity: 0.5,
      angle: 90,
      portDepth: 40,
      effluentDensity: 1000,
      ambient: { kind: 'table', depth: [0, 40], density: [1022, 1026] },
    });
    expect(trapped.outcome).toBe('trapped');
    expect(trapped.outcomeText).toMatch(/traps/);
    const dense = buoyantJetTrajectory({
      diameter: 0.1,
      velocity: 2,
      angle: 45,
      portDepth: 20,
      effluentDensity: 1050,
      ambient: uniform,
      bedDepth: 21,
      portSpacing: 1,
    });
    expect(dense.outcome).toBe('reaches bed');
    expect(dense.events.map((e) => e.kind)).toEqual(
      expect.arrayContaining([
        'maximum rise',
        'return to port level',
        'bed contact',
        'plumes merge',
        'end of near field',
      ]),
    );
    const merging = dense.warnings.find((w) => w.code === 'plumes-merge-single-port');
    expect(merging?.severity).toBe('caution');
    expect(merging?.message).toMatch(/merge/);
    const inclined = dense.warnings.find((w) => w.code === 'dense-jet-dilution-low');
    expect(inclined).toMatchObject({ severity: 'caution', input: 'angle' });
    expect(inclined?.message).toMatch(/under-predict/);
    expect(dense.warnings.map((w) => w.code)).toContain('near-field-bed-contact');
    const warm = buoyantJetTrajectory({
      diameter: 0.3,
      velocity: 1.5,
      angle: 0,
      portDepth: 10,
      effluentDensity: 1020,
      effluentTemperature: 30,
      ambient: { kind: 'table', depth: [0, 10], density: [1024, 1024], temperature: [15, 15] },
    });
    expect(warm.path.temperatureExcess?.[0]).toBeCloseTo(15, 9);
    const dT = warm.path.temperatureExcess!;
    warm.path.dilutionAverage.forEach((s, i) => expect(dT[i] * s).toBeCloseTo(15, 5));
  });
});

describe('buoyant-jet bad input', () => {
  const base: BuoyantJetInput = {
    diameter: 0.2,
    velocity: 1,
    angle: 30,
    portDepth: 20,
    effluentDensity: 1000,
    ambient: uniform,
  };
  it.each([
    ['diameter', { diameter: 0 }],
    ['velocity', { velocity: -1 }],
    ['angle', { angle: 120 }],
    ['port_depth', { portDepth: Number.NaN }],
    ['effluent_density', { effluentDensity: 50 }],
    ['bed_depth', { bedDepth: 5 }],
    ['current', { current: -0.2 }],
  ])('%s is refused with an InputError', (_name, patch) => {
    expect(() => buoyantJetTrajectory({ ...base, ...patch })).toThrow(InputError);
  });
  it('random input never throws anything but an InputError', () => {
    fc.assert(
      fc.property(
        fc.record({
          diameter: fc.double(),
          velocity: fc.double(),
          angle: fc.double(),
          portDepth: fc.double(),
          effluentDensity: fc.double(),
        }),
        (p) => {
          try {
            const t = buoyantJetTrajectory({ ...p, ambient: uniform, maxPath: 200 });
            expect(Number.isFinite(t.maxRise)).toBe(true);
          } catch (e) {
            expect(e).toBeInstanceOf(InputError);
          }
        },
      ),
      { numRuns: 60 },
    );
  });
});
