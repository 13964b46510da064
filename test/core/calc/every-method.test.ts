import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { argsArb } from '../../helpers/calc-args';
import { CALC_METHODS } from '../../../shared-core/calc/registry';
import { runCalc, type RawArg } from '../../../shared-core/calc/resolve';
import type { CalcMethod } from '../../../shared-core/calc/types';
import { InputError } from '../../../shared-core/core/errors';
import { ProfileError } from '../../../shared-core/profile/profile';

/**
 * Reliability net over every `gprime calc` method: arguments drawn anywhere inside each parameter's hard
 * range either give finite results or a named InputError/ProfileError — never another exception, never NaN.
 * A second pass draws from the ranges met in practice and requires most draws to compute, so the first
 * pass is not passing on refusals alone.
 */
const RUNS = 40;

/** Runs the method; true when it computed, false when it refused with a named input error. */
function computes(method: CalcMethod, args: Record<string, RawArg | undefined>): boolean {
  try {
    const out = runCalc(method, args);
    const declared = new Set(method.results.map((r) => r.name));
    for (const [name, r] of Object.entries(out.results)) {
      expect(declared.has(name), `${method.id} returns the undeclared result ${name}`).toBe(true);
      if (typeof r.value === 'number') expect(Number.isFinite(r.value), `${name} = ${r.value}`).toBe(true);
    }
    for (const series of out.series ?? []) {
      expect(series.kind, `a series of ${method.id} has no kind`).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
      for (const axis of [series.x, ...series.y])
        expect(axis.values.every(Number.isFinite), `${series.kind}: ${axis.label} holds NaN or Infinity`).toBe(true);
    }
    for (const w of out.warnings) {
      expect(w.code, `a warning of ${method.id} has no code: ${JSON.stringify(w)}`).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
      expect(['note', 'caution', 'outside-validity']).toContain(w.severity);
      expect(w.message.length).toBeGreaterThan(10);
    }
    return true;
  } catch (e) {
    if (!(e instanceof InputError || e instanceof ProfileError)) throw e;
    expect(e.message.length).toBeGreaterThan(10);
    return false;
  }
}

describe('every calc method on arbitrary arguments', () => {
  for (const method of CALC_METHODS) {
    it(`${method.id}: anywhere in the hard ranges, finite results or a named input error`, () => {
      fc.assert(
        fc.property(argsArb(method, false), (args) => {
          computes(method, args);
        }),
        { numRuns: RUNS, seed: 20261202 },
      );
    }, 120_000);
    it(`${method.id}: in everyday ranges, most draws compute`, () => {
      let computed = 0;
      fc.assert(
        fc.property(argsArb(method, true), (args) => {
          if (computes(method, args)) computed++;
        }),
        { numRuns: RUNS, seed: 20261203 },
      );
      expect(computed, `${computed} of ${RUNS} draws computed`).toBeGreaterThanOrEqual(RUNS / 2);
    }, 120_000);
  }
});
