import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import fc from 'fast-check';
import type { RawArg } from '../../shared-core/calc/resolve';
import type { CalcMethod, ParamSpec } from '../../shared-core/calc/types';
import { parseProfileCsv } from '../../shared-core/profile/csv';

/**
 * Arguments for every `gprime calc` method, drawn anywhere inside each parameter's hard range or in the ranges met in
 * practice (the method's own everyday ranges, else the table below), for the reliability net and the validity-read check.
 */
export const PROFILE = parseProfileCsv(
  readFileSync(join(resolve(import.meta.dirname, '..', '..'), 'examples', 'demo-profile.csv'), 'utf8'),
);

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

export function argsArb(method: CalcMethod, practical: boolean): fc.Arbitrary<Record<string, RawArg | undefined>> {
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
