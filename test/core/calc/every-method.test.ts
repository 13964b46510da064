import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CALC_METHODS } from '../../../shared-core/calc/registry';
import { runCalc, type RawArg } from '../../../shared-core/calc/resolve';
import type { CalcMethod, ParamSpec } from '../../../shared-core/calc/types';
import { InputError } from '../../../shared-core/core/errors';
import { parseProfileCsv } from '../../../shared-core/profile/csv';
import { ProfileError } from '../../../shared-core/profile/profile';

/**
 * Reliability net over every `gprime calc` method: arguments drawn anywhere inside each parameter's hard
 * range either give finite results or a named InputError/ProfileError — never another exception, never NaN.
 * A second pass draws from the ranges met in practice and requires most draws to compute, so the first
 * pass is not passing on refusals alone.
 */
const PROFILE = parseProfileCsv(
  readFileSync(join(resolve(import.meta.dirname, '..', '..', '..'), 'examples', 'demo-profile.csv'), 'utf8'),
);
const RUNS = 40;

/** Everyday ranges by parameter name (the demo profile is 38 m deep). Common practice, no source. */
const PRACTICAL: Record<string, [number, number]> = {
  port_depth: [2, 35],
  depth: [1, 50],
  total_depth: [1, 50],
  upper_thickness: [0.5, 20],
  lower_thickness: [0.5, 20],
  interface_distance: [0.5, 20],
  opening: [0.5, 20],
  obstacle_height: [0.5, 20],
  current_depth: [0.2, 5],
  lock_depth: [0.2, 5],
  rho_upper: [995, 1010],
  rho_lower: [1010, 1030],
  effluent_density: [990, 1060],
  ambient_density: [995, 1030],
  g_prime: [1e-3, 0.3],
  velocity: [0.05, 5],
  diameter: [0.05, 1.5],
  buoyancy_frequency: [1e-3, 0.05],
  basin_length: [200, 2e4],
  wind_speed: [1, 20],
  discharge: [0.1, 500],
  width: [2, 500],
  flux: [1e-3, 1],
  net_discharge: [-300, 300],
  end_width: [500, 5000],
  ports: [2, 20],
  spacing: [0.5, 10],
  diffuser_length: [5, 200],
};
const WHOLE = new Set(['ports', 'modes']);
/** Text parameters other than port lists: a few valid values and one refused (the demo basin is 38 m deep). */
const TEXT: Record<string, string[]> = {
  hypsography: ['0:2e6,10:1.2e6,25:4e5,38:0', '0:5e5,38:1e5', '0:1e6,20:5e5,38:1e4', '5:40,30:40'],
};
/** Inputs given one way or another, never both (the methods refuse both and neither with a named error). */
const ONE_OF: Record<string, string[][]> = {
  'buoyant-jet': [['file'], ['ambient_density']],
  'diffuser-plume': [['file'], ['ambient_density']],
  'vertical-modes': [['file'], ['buoyancy_frequency', 'depth']],
};

const nextUp = (x: number) => (x === 0 ? 1e-9 : x + Math.abs(x) * 1e-12);

function spanArb(lo: number, hi: number): fc.Arbitrary<number> {
  if (lo > 0 && hi / lo > 100)
    return fc
      .double({ min: Math.log(lo), max: Math.log(hi), noNaN: true })
      .map((x) => Math.min(hi, Math.max(lo, Math.exp(x))));
  if (lo >= 0 && hi > 1e3)
    return fc.double({ min: -6, max: Math.log10(hi), noNaN: true }).map((e) => Math.min(hi, Math.max(lo, 10 ** e)));
  return fc.double({ min: lo, max: hi, noNaN: true });
}

function numberArb(
  method: CalcMethod,
  spec: Extract<ParamSpec, { kind: 'number' }>,
  practical: boolean,
): fc.Arbitrary<number> {
  const r = spec.range ?? {};
  let lo = r.minExclusive ? nextUp(r.min ?? -1e3) : (r.min ?? -1e3);
  let hi = r.maxExclusive ? -nextUp(-(r.max ?? 1e3)) : (r.max ?? 1e3);
  const p = practical ? (method.everyday?.[spec.name] ?? PRACTICAL[spec.name]) : undefined;
  if (p) [lo, hi] = [Math.max(lo, p[0]), Math.min(hi, p[1])];
  return WHOLE.has(spec.name) ? fc.integer({ min: Math.ceil(lo), max: Math.floor(hi) }) : spanArb(lo, hi);
}

function argsArb(method: CalcMethod, practical: boolean): fc.Arbitrary<Record<string, RawArg | undefined>> {
  const alternatives = practical ? (method.oneOf ?? ONE_OF[method.id]) : undefined;
  if (!alternatives) return paramsArb(method, practical, new Set(), new Set());
  return fc
    .integer({ min: 0, max: alternatives.length - 1 })
    .chain((k) =>
      paramsArb(
        method,
        practical,
        new Set(alternatives[k]),
        new Set(alternatives.flatMap((a, i) => (i === k ? [] : a))),
      ),
    );
}

/** Arguments with `given` always present and `absent` left out; the rest optional as the method allows. */
function paramsArb(
  method: CalcMethod,
  practical: boolean,
  given: Set<string>,
  absent: Set<string>,
): fc.Arbitrary<Record<string, RawArg | undefined>> {
  const optional = (p: ParamSpec) => !given.has(p.name) && (p.optional || ('default' in p && p.default !== undefined));
  const entries = method.params.map((p): [string, fc.Arbitrary<RawArg | undefined>] => {
    if (absent.has(p.name)) return [p.name, fc.constant(undefined)];
    const maybe = <T extends RawArg>(a: fc.Arbitrary<T>) => (optional(p) ? fc.option(a, { nil: undefined }) : a);
    switch (p.kind) {
      case 'number':
        return [p.name, maybe(numberArb(method, p, practical))];
      case 'choice':
        return [p.name, fc.constantFrom(...p.choices)];
      case 'profile':
        return [p.name, maybe(fc.constant(PROFILE))];
      case 'text':
        return [p.name, fc.constantFrom(...(TEXT[p.name] ?? ['5:40,30:40', '2:10', '1:5,10:5,20:5']))];
    }
  });
  return fc.record(Object.fromEntries(entries));
}

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
