import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runCheckValues } from '../../helpers/check-values';
import { InputError } from '../../../shared-core/core/errors';
import { makeProfile } from '../../../shared-core/profile/profile';
import { plungeDepthAkiyamaStefan1984, mixAtPlunge } from '../../../shared-core/inflows/plunge';
import { entrainmentEllisonTurner1959, entrainmentParker1987 } from '../../../shared-core/inflows/entrainment';
import { underflowEllisonTurner1959 } from '../../../shared-core/inflows/underflow';
import { riverInflowPath } from '../../../shared-core/inflows/river';

const saltProfile = () => {
  const depth = Array.from({ length: 81 }, (_, i) => i * 0.5);
  return makeProfile({
    depth,
    temperature: depth.map(() => 10),
    salinity: depth.map((d) => 30 + (2 * d) / 40),
    eos: 'teos10',
  });
};
const uniform = makeProfile({ depth: [0, 100], temperature: [10, 10], salinity: [30, 30], eos: 'teos10' });

runCheckValues(
  'inflows',
  'plunge-depth-akiyama-stefan1984',
  (i) =>
    plungeDepthAkiyamaStefan1984(
      Number(i.discharge),
      Number(i.width),
      Number(i.g_prime),
      i.plunge_froude === undefined ? undefined : Number(i.plunge_froude),
    ).value,
);

runCheckValues('inflows', 'plunge-initial-mixing', (i) => {
  const m = mixAtPlunge(10, { density: Number(i.rho_in) }, { density: Number(i.rho_s) }, Number(i.phi));
  return i.quantity === 'density' ? m.values.density : m.discharge;
});

runCheckValues('inflows', 'entrainment-ellison-turner1959', (i) => entrainmentEllisonTurner1959(Number(i.Ri)).value);
runCheckValues('inflows', 'entrainment-parker1987', (i) => entrainmentParker1987(Number(i.Ri)).value);

runCheckValues('inflows', 'underflow-ellison-turner1959', (i) => {
  if (i.case === 'uniform') {
    const r = underflowEllisonTurner1959(uniform, {
      discharge: 10,
      width: 50,
      density: uniform.density[0] + 0.5,
      temperature: 10,
      startDepth: 2,
      bedSlope: 0.02,
      dragCoefficient: 0.005,
      distanceToPoint: 1000,
    });
    return i.quantity === 'discharge' ? r.path.discharge.at(-1)! : r.travelTimeToPoint!;
  }
  const p = saltProfile();
  const rho0 = p.density[40];
  const r = underflowEllisonTurner1959(p, {
    discharge: 5,
    width: 40,
    density: rho0,
    temperature: 10,
    startDepth: 2,
    bedSlope: 0.01,
    dragCoefficient: 0.005,
  });
  return i.quantity === 'insertion_depth' ? r.insertionDepth! : r.path.discharge.at(-1)!;
});

describe('inflow invariants', () => {
  it('the plunge depth rises with discharge and falls with g′ and F_p', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 500, noNaN: true }),
        fc.double({ min: 1e-3, max: 0.5, noNaN: true }),
        (q, g) => {
          const h = plungeDepthAkiyamaStefan1984(q, 50, g).value;
          expect(plungeDepthAkiyamaStefan1984(q * 1.2, 50, g).value).toBeGreaterThan(h);
          expect(plungeDepthAkiyamaStefan1984(q, 50, g * 1.2).value).toBeLessThan(h);
          expect(plungeDepthAkiyamaStefan1984(q, 50, g, 0.6).value).toBeLessThan(h);
        },
      ),
    );
  });

  it('entrainment never rises with Ri and is never negative', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 5, noNaN: true }), fc.double({ min: 0, max: 5, noNaN: true }), (a, b) => {
        const [lo, hi] = [Math.min(a, b), Math.max(a, b)];
        for (const f of [entrainmentParker1987, entrainmentEllisonTurner1959]) {
          expect(f(hi).value).toBeLessThanOrEqual(f(lo).value);
          expect(f(hi).value).toBeGreaterThanOrEqual(0);
        }
      }),
    );
  });

  it('in a stable profile the underflow grows, gets lighter, and inserts where its density meets the ambient', () => {
    const p = saltProfile();
    fc.assert(
      fc.property(
        fc.integer({ min: 10, max: 79 }),
        fc.double({ min: 0.5, max: 50, noNaN: true }),
        fc.double({ min: 0.003, max: 0.1, noNaN: true }),
        (k, q, s) => {
          const r = underflowEllisonTurner1959(p, {
            discharge: q,
            width: 30,
            density: p.density[k],
            temperature: 10,
            startDepth: 1,
            bedSlope: s,
          });
          const { discharge, density, time } = r.path;
          for (let i = 1; i < discharge.length; i++) {
            expect(discharge[i]).toBeGreaterThanOrEqual(discharge[i - 1]);
            expect(density[i]).toBeLessThanOrEqual(density[i - 1] + 1e-9);
            expect(time[i]).toBeGreaterThan(time[i - 1]);
          }
          expect(r.insertionDepth).toBeDefined();
          expect(r.insertionDepth!).toBeLessThanOrEqual(k * 0.5 + 1e-6);
        },
      ),
      { numRuns: 30 },
    );
  });

  it('the river chain plunges, mixes and inserts in the invented demo profile', () => {
    const p = makeProfile({
      depth: [0.5, 4, 8, 12, 20, 30, 38],
      temperature: [24.8, 24.7, 21.6, 14.6, 10.5, 9.4, 9.1],
    });
    const r = riverInflowPath(p, {
      discharge: 25,
      width: 60,
      temperature: 13,
      sediment: 0.3,
      bedSlope: 0.01,
      distanceToPoint: 6000,
    });
    expect(r.plungeDepth).toBeGreaterThan(0);
    expect(r.mixed.discharge).toBeCloseTo(27.5, 9);
    expect(r.underflow.insertionDepth).toBeGreaterThan(r.plungeDepth);
    expect(r.underflow.travelTimeToPoint).toBeUndefined();
    expect(r.warnings.find((w) => w.code === 'leaves-bed-before-point')).toMatchObject({
      severity: 'note',
      input: 'distance',
    });
  });
});

describe('inflow bad input', () => {
  it('throws InputError for meaningless values, never anything else', () => {
    for (const x of [NaN, 0, -1, Infinity]) {
      expect(() => plungeDepthAkiyamaStefan1984(x, 10, 0.01)).toThrow(InputError);
      expect(() => plungeDepthAkiyamaStefan1984(10, x, 0.01)).toThrow(InputError);
      expect(() => plungeDepthAkiyamaStefan1984(10, 10, x)).toThrow(InputError);
      expect(() =>
        underflowEllisonTurner1959(uniform, {
          discharge: 10,
          width: 10,
          density: 1030,
          temperature: 10,
          startDepth: 1,
          bedSlope: x,
        }),
      ).toThrow(InputError);
    }
    expect(() => entrainmentParker1987(-0.1)).toThrow(InputError);
    // a current lighter than the water where it starts does not flow down the bed
    expect(() =>
      underflowEllisonTurner1959(uniform, {
        discharge: 10,
        width: 10,
        density: 1000,
        temperature: 10,
        startDepth: 1,
        bedSlope: 0.01,
      }),
    ).toThrow(InputError);
    // warmer (lighter) river water does not plunge
    expect(() => riverInflowPath(uniform, { discharge: 10, width: 10, temperature: 25, bedSlope: 0.01 })).toThrow(
      InputError,
    );
  });

  it('random underflow inputs give a finite path or an InputError', () => {
    const p = saltProfile();
    fc.assert(
      fc.property(
        fc.double({ min: -1, max: 1e3 }),
        fc.double({ min: 1000, max: 1040 }),
        fc.double({ min: -1, max: 45 }),
        fc.double({ min: -0.01, max: 0.5 }),
        (q, rho, d, s) => {
          try {
            const r = underflowEllisonTurner1959(p, {
              discharge: q,
              width: 20,
              density: rho,
              temperature: 10,
              startDepth: d,
              bedSlope: s,
            });
            for (const col of Object.values(r.path))
              (col as number[]).forEach((v) => expect(Number.isFinite(v)).toBe(true));
          } catch (e) {
            expect(e).toBeInstanceOf(InputError);
          }
        },
      ),
      { numRuns: 40 },
    );
  });
});
