import { describe, expect, it } from 'vitest';
import { integrateOde, solveOde, type OdeEvent, type OdeOptions } from '../../../shared-core/numerics/ode';

// Method: Dormand & Prince (1980), J. Comput. Appl. Math. 6, 19–26; step control as in Hairer, Nørsett & Wanner
// (1993), Solving Ordinary Differential Equations I, §II.4. References below are closed-form solutions.
const decay = (_t: number, y: readonly number[]) => [-y[0]];
const oscillator = (_t: number, y: readonly number[]) => [y[1], -y[0]];
const last = (s: { y: number[][] }) => s.y[s.y.length - 1];

describe('Dormand–Prince 5(4) against closed-form solutions', () => {
  it("y' = −y: y(5) = e^−5 to the requested tolerance", () => {
    const s = solveOde(decay, 0, [1], 5, { rtol: 1e-10, atol: 1e-14 });
    expect(s.status).toBe('completed');
    expect(s.t[s.t.length - 1]).toBe(5);
    expect(Math.abs(last(s)[0] / Math.exp(-5) - 1)).toBeLessThan(1e-8);
  });

  it('harmonic oscillator: after ten periods (t = 20π) y = (1, 0) again', () => {
    const s = solveOde(oscillator, 0, [1, 0], 20 * Math.PI, { rtol: 1e-10, atol: 1e-12 });
    expect(Math.abs(last(s)[0] - 1)).toBeLessThan(1e-7);
    expect(Math.abs(last(s)[1])).toBeLessThan(1e-7);
    s.t.forEach((t, i) => expect(Math.abs(s.y[i][0] - Math.cos(t))).toBeLessThan(1e-7));
  });

  it('the global error falls with the tolerance (the step control works), at fewer steps for a looser one', () => {
    const run = (rtol: number) => solveOde(oscillator, 0, [1, 0], 20 * Math.PI, { rtol, atol: rtol * 1e-2 });
    const [loose, tight] = [run(1e-5), run(1e-9)];
    const error = (s: ReturnType<typeof run>) => Math.hypot(last(s)[0] - 1, last(s)[1]);
    expect(error(tight)).toBeLessThan(error(loose) / 100);
    expect(loose.t.length).toBeLessThan(tight.t.length);
  });

  it('counts evaluations: one at the start, six per step attempt (first same as last)', () => {
    let calls = 0;
    const s = integrateOde(
      (_t, y, dy) => {
        calls++;
        dy[0] = -y[0];
      },
      0,
      [1],
      3,
    );
    expect(s.evaluations).toBe(calls);
    expect((calls - 1) % 6).toBe(0);
  });

  it('solveOde (returning arrays) and integrateOde (writing into a buffer) give the same steps', () => {
    const a = solveOde(oscillator, 0, [1, 0], 7, { rtol: 1e-9 });
    const b = integrateOde(
      (_t, y, dy) => {
        dy[0] = y[1];
        dy[1] = -y[0];
      },
      0,
      [1, 0],
      7,
      { rtol: 1e-9 },
    );
    expect(b.t).toEqual(a.t);
    expect(b.y).toEqual(a.y);
  });
});

describe('events', () => {
  const half: OdeEvent = { name: 'half', g: (_t, y) => y[0] - 0.5, direction: 'falling' };
  const opts: OdeOptions = { rtol: 1e-10, atol: 1e-14 };

  it('a falling crossing fires at t = ln 2 for y = e^−t and the run goes on when it is not terminal', () => {
    const s = solveOde(decay, 0, [1], 3, { ...opts, events: [half] });
    expect(s.status).toBe('completed');
    expect(s.events).toHaveLength(1);
    expect(Math.abs(s.events[0].t - Math.LN2)).toBeLessThan(1e-9);
    expect(Math.abs(s.events[0].y[0] - 0.5)).toBeLessThan(1e-9);
  });

  it('a terminal event stops the run at the crossing, which ends the solution', () => {
    const s = solveOde(decay, 0, [1], 3, { ...opts, events: [{ ...half, terminal: true }] });
    expect(s.status).toBe('terminal-event');
    expect(s.message).toMatch(/half/);
    expect(Math.abs(s.t[s.t.length - 1] - Math.LN2)).toBeLessThan(1e-9);
    expect(last(s)[0]).toBeLessThanOrEqual(0.5 + 1e-12);
  });

  it('the direction filters crossings; crossings on one step are reported in order', () => {
    expect(solveOde(decay, 0, [1], 3, { ...opts, events: [{ ...half, direction: 'rising' }] }).events).toEqual([]);
    const zeros: OdeEvent = { name: 'y = 0', g: (_t, y) => y[0] };
    const s = solveOde(oscillator, 0, [1, 0], 10, { ...opts, hMax: 20, events: [zeros] });
    // cos t = 0 at π/2, 3π/2, 5π/2
    expect(s.events.map((e) => e.t / Math.PI)).toEqual([0.5, 1.5, 2.5].map((x) => expect.closeTo(x, 9)));
  });

  it('an event set evaluated in one call fires as the same events given one by one', () => {
    const list: OdeEvent[] = [half, { name: 'quarter', g: (_t, y) => y[0] - 0.25, terminal: true }];
    const set = {
      events: list,
      g: (_t: number, y: readonly number[], out: number[]) => {
        out[0] = y[0] - 0.5;
        out[1] = y[0] - 0.25;
      },
    };
    const a = solveOde(decay, 0, [1], 3, { ...opts, events: list }),
      b = solveOde(decay, 0, [1], 3, { ...opts, events: set });
    expect(b.events).toEqual(a.events);
    expect(b.events.map((e) => e.t)).toEqual([expect.closeTo(Math.LN2, 9), expect.closeTo(2 * Math.LN2, 9)]);
  });
});

describe('an integration that cannot finish says so', () => {
  it("the step limit gives 'max-steps' with the steps taken so far", () => {
    const s = solveOde(oscillator, 0, [1, 0], 1000, { maxSteps: 5 });
    expect(s.status).toBe('max-steps');
    expect(s.message).toMatch(/5 steps/);
    expect(s.t.length).toBeLessThanOrEqual(6);
    expect(s.t[s.t.length - 1]).toBeLessThan(1000);
  });

  it("a right-hand side that turns non-finite gives 'step-failed' before that point", () => {
    const s = solveOde((t, y) => [t < 1 ? -y[0] : Number.NaN], 0, [1], 2);
    expect(s.status).toBe('step-failed');
    expect(s.message).toMatch(/non-finite/);
    expect(s.t[s.t.length - 1]).toBeLessThanOrEqual(1);
    expect(s.y.flat().every(Number.isFinite)).toBe(true);
  });

  it("a blow-up (y' = y², y(0) = 1, singular at t = 1) gives 'step-failed' at the singularity", () => {
    const s = solveOde((_t, y) => [y[0] * y[0]], 0, [1], 2);
    expect(s.status).toBe('step-failed');
    expect(Math.abs(s.t[s.t.length - 1] - 1)).toBeLessThan(1e-5);
  });

  it('integrates forwards only: t1 < t0 or a NaN end is refused, t1 = t0 is the initial point', () => {
    expect(() => solveOde(decay, 1, [1], 0)).toThrow(RangeError);
    expect(() => solveOde(decay, 0, [1], Number.NaN)).toThrow(RangeError);
    expect(() => solveOde(decay, Number.NEGATIVE_INFINITY, [1], 0)).toThrow(RangeError);
    const s = solveOde(decay, 2, [1], 2);
    expect(s).toMatchObject({ status: 'completed', t: [2], y: [[1]], evaluations: 0 });
  });

  it('an open end (t1 = ∞) runs to a terminal event', () => {
    const s = solveOde(decay, 0, [1], Infinity, {
      events: [{ name: 'tenth', g: (_t, y) => y[0] - 0.1, terminal: true }],
    });
    expect(s.status).toBe('terminal-event');
    expect(Math.abs(s.t[s.t.length - 1] - Math.log(10))).toBeLessThan(1e-6);
  });
});
