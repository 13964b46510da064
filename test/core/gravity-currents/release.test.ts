import { describe, expect, it } from 'vitest';
import { gravityCurrentCalcMethods } from '../../../shared-core/gravity-currents/calc';
import { resolveArgs, runCalc } from '../../../shared-core/calc/resolve';
import fc from 'fast-check';
import { runCheckValues } from '../../helpers/check-values';
import {
  lockReleaseHuppertSimpson1980,
  lockReleaseFrontAt,
  lockReleaseSeries,
  viscousFrontCoefficientHuppert1982,
  constantFluxRelease,
  constantFluxSeries,
  frontAt,
  frontSpeedSlopeBritterLinden1980,
  slopeCurrentSeries,
  PHASE_ORDER,
  type SpreadingGeometry,
  type LockReleaseInput,
} from '../../../shared-core/gravity-currents';
import { InputError } from '../../../shared-core/core/errors';

const n = (x: number | string | undefined) => (x === undefined ? undefined : Number(x));
const geom = (x: unknown) => x as SpreadingGeometry;

runCheckValues(
  'gravity-currents',
  'viscous-current-huppert-1982',
  (i) => viscousFrontCoefficientHuppert1982(n(i.alpha)!, geom(i.geometry)).value,
);

runCheckValues('gravity-currents', 'lock-release-huppert-simpson-1980', (i) => {
  const input: LockReleaseInput = {
    gPrime: n(i.g_prime)!,
    lockLength: n(i.lock_length)!,
    lockDepth: n(i.lock_depth)!,
    totalDepth: n(i.total_depth),
    geometry: geom(i.geometry),
    kinematicViscosity: n(i.kinematic_viscosity)!,
  };
  const model = lockReleaseHuppertSimpson1980(input);
  if (i.output === 'inertial_start') return model.pieces.find((p) => p.phase === 'inertial')!.xStart;
  const s = lockReleaseFrontAt(model, n(i.time)!);
  if (i.output === 'froude_total') return s.speed / Math.sqrt(input.gPrime * input.totalDepth!);
  const planar = input.geometry === 'planar';
  return planar
    ? s.position / (Math.cbrt(input.gPrime * model.volume) * s.time ** (2 / 3))
    : s.position / ((input.gPrime * model.volume) ** 0.25 * Math.sqrt(s.time));
});

runCheckValues('gravity-currents', 'constant-flux-release', (i) => {
  const input = {
    gPrime: n(i.g_prime)!,
    flux: n(i.flux)!,
    geometry: geom(i.geometry),
    kinematicViscosity: n(i.kinematic_viscosity)!,
  };
  const s = frontAt(constantFluxRelease(input).pieces, n(i.time)!);
  const scale = (input.gPrime * input.flux ** 3) / (3 * input.kinematicViscosity);
  if (i.output === 'speed_over_b13') return s.speed / Math.cbrt(input.gPrime * input.flux);
  return input.geometry === 'planar'
    ? s.position / (scale ** 0.2 * s.time ** 0.8)
    : s.position / (scale ** 0.125 * Math.sqrt(s.time));
});

runCheckValues('gravity-currents', 'slope-current-britter-linden-1980', (i) => {
  const r = frontSpeedSlopeBritterLinden1980(n(i.g_prime)!, n(i.flux)!, n(i.slope)!);
  return i.output === 'ratio' ? r.value / Math.cbrt(n(i.g_prime)! * n(i.flux)!) : r.value;
});

const releaseArb = fc.record({
  gPrime: fc.double({ min: 1e-3, max: 1, noNaN: true }),
  lockLength: fc.double({ min: 0.05, max: 500, noNaN: true }),
  lockDepth: fc.double({ min: 0.05, max: 20, noNaN: true }),
  extra: fc.double({ min: 1, max: 20, noNaN: true }),
  geometry: fc.constantFrom<SpreadingGeometry>('planar', 'axisymmetric'),
  kinematicViscosity: fc.double({ min: 1e-7, max: 1e-2, noNaN: true }),
});
const times = [0, 1, 3, 10, 30, 100, 300, 1e3, 3e3, 1e4, 3e4, 1e5, 1e6];

describe('lock release: invariants', () => {
  it('position rises and speed falls with time; phases follow in order; arrivals invert positions', () => {
    fc.assert(
      fc.property(releaseArb, (r) => {
        const input = { ...r, totalDepth: r.lockDepth * r.extra };
        const s = lockReleaseSeries(input, times, [r.lockLength * 2, r.lockLength * 20]);
        for (let k = 1; k < times.length; k++) {
          expect(s.position[k]).toBeGreaterThanOrEqual(s.position[k - 1]);
          expect(PHASE_ORDER.indexOf(s.phase[k])).toBeGreaterThanOrEqual(PHASE_ORDER.indexOf(s.phase[k - 1]));
          expect(Number.isFinite(s.speed[k])).toBe(true);
        }
        for (const a of s.arrivals) {
          const back = lockReleaseSeries(input, [a.time]).position[0];
          expect(back).toBeCloseTo(a.distance, 6);
        }
      }),
      { numRuns: 60 },
    );
  });
  it('front speed rises with g′ at a fixed time', () => {
    fc.assert(
      fc.property(releaseArb, fc.double({ min: 1.1, max: 5, noNaN: true }), (r, k) => {
        const input = { ...r, totalDepth: r.lockDepth * r.extra };
        const slow = lockReleaseFrontAt(lockReleaseHuppertSimpson1980(input), 10).position;
        const fast = lockReleaseFrontAt(
          lockReleaseHuppertSimpson1980({ ...input, gPrime: input.gPrime * k }),
          10,
        ).position;
        expect(fast).toBeGreaterThan(slow);
      }),
      { numRuns: 40 },
    );
  });
  it('a full-depth field-scale lock slumps, then spreads inertially, then viscously', () => {
    const m = lockReleaseHuppertSimpson1980({
      gPrime: 0.1,
      lockLength: 3,
      lockDepth: 2,
      totalDepth: 2,
      geometry: 'planar',
      kinematicViscosity: 1e-6,
    });
    expect(m.pieces.map((p) => p.phase)).toEqual(['slumping', 'inertial', 'viscous']);
  });
  it('a very viscous small release is viscous from the start', () => {
    const m = lockReleaseHuppertSimpson1980({
      gPrime: 0.01,
      lockLength: 0.01,
      lockDepth: 0.01,
      geometry: 'planar',
      kinematicViscosity: 0.5,
    });
    expect(m.pieces[0].phase).toBe('viscous');
    expect(m.warnings.map((w) => w.code)).toContain('viscous-from-release');
  });
});

describe('constant-flux and slope currents', () => {
  it('constant-flux fronts: inertial then viscous, continuous at the transition', () => {
    const { pieces } = constantFluxRelease({
      gPrime: 0.05,
      flux: 0.01,
      geometry: 'axisymmetric',
      kinematicViscosity: 1e-6,
    });
    expect(pieces.map((p) => p.phase)).toEqual(['inertial', 'viscous']);
    const t = pieces[1].tStart;
    expect(frontAt(pieces, t * (1 - 1e-9)).position).toBeCloseTo(frontAt(pieces, t).position, 6);
  });
  it('constant-flux series refuses t = 0 for a point source with unbounded speed', () => {
    expect(() =>
      constantFluxSeries({ gPrime: 0.05, flux: 0.01, geometry: 'axisymmetric', kinematicViscosity: 1e-6 }, [0]),
    ).toThrow(InputError);
  });
  it('slope currents: x = U t, steady phase, warning outside 5–90°', () => {
    const s = slopeCurrentSeries(0.1, 0.02, 10, [0, 100], [50]);
    expect(s.position[1]).toBeCloseTo(100 * s.speed[1], 9);
    expect(s.arrivals[0].time).toBeCloseTo(50 / s.speed[0], 9);
    expect(frontSpeedSlopeBritterLinden1980(0.1, 0.02, 2).warnings).toMatchObject([
      { code: 'validity-range', severity: 'outside-validity', input: 'slope' },
      { code: 'head-entrainment', severity: 'note' },
    ]);
    expect(frontSpeedSlopeBritterLinden1980(0.1, 0.02, 0.3).warnings[1]).toMatchObject({
      code: 'decelerating-head',
      input: 'slope',
    });
  });
});

describe('release models: bad input', () => {
  it('never an uncaught non-InputError, never NaN', () => {
    fc.assert(
      fc.property(fc.double(), fc.double(), fc.double(), fc.double(), fc.double(), (g, x0, h0, H, t) => {
        try {
          const m = lockReleaseHuppertSimpson1980({
            gPrime: g,
            lockLength: x0,
            lockDepth: h0,
            totalDepth: H,
            geometry: 'planar',
            kinematicViscosity: 1e-6,
          });
          const s = lockReleaseFrontAt(m, t);
          expect(Number.isFinite(s.position) && Number.isFinite(s.speed)).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(InputError);
        }
      }),
    );
    expect(() =>
      lockReleaseHuppertSimpson1980({
        gPrime: 0.1,
        lockLength: 1,
        lockDepth: 2,
        totalDepth: 1,
        geometry: 'planar',
        kinematicViscosity: 1e-6,
      }),
    ).toThrow(/total_depth/);
    expect(() => viscousFrontCoefficientHuppert1982(-1, 'planar')).toThrow(InputError);
  });
});

describe('release charts', () => {
  it('name their curves by kind', () => {
    const lock = gravityCurrentCalcMethods.find((m) => m.id === 'lock-release')!;
    const out = runCalc(lock, resolveArgs(lock, { g_prime: '0.1', lock_length: '1', lock_depth: '0.2', time: '10' }));
    expect(out.series?.map((s) => s.kind)).toEqual(['front-position', 'front-speed']);
  });
});

describe('flux-release from a point source (axisymmetric)', () => {
  it('computes through the calc method: its chart starts after t = 0, where a point source has no front', () => {
    const method = gravityCurrentCalcMethods.find((m) => m.id === 'flux-release')!;
    const out = runCalc(method, { geometry: 'axisymmetric', g_prime: 0.1, flux: 0.01, time: 600 });
    expect(out.results.front_position.value).toBeGreaterThan(0);
    const position = out.series!.find((s) => s.kind === 'front-position')!;
    expect(position.x.values[0]).toBeGreaterThan(0);
    expect(position.y.every((y) => y.values.every(Number.isFinite))).toBe(true);
  });
});
