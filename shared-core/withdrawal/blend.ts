import { InputError, formatNumber, formatShort } from '../core/errors';
import { nonNegative, positive, requireInRange } from '../core/range';
import type { MethodInfo } from '../core/method';
import { brentRoot } from '../numerics/roots';
import type { Profile } from '../profile/profile';
import type { OutflowColumn, PortOutflow } from './outflow';
import type { ProfileWithdrawalOptions } from './measured';
import {
  combinedOutflows,
  directOutflow,
  interferenceGroups,
  memoisedOutflow,
  type InterferenceGroup,
  type InterferenceMode,
  type OutflowFunction,
} from './interference';

export const RELEASE_BLEND: MethodInfo = {
  id: 'release-blend-flow-weighted',
  title: 'Blended release of several ports and the split that meets a temperature target',
  source:
    'Mixing of the port outflows by conservation of mass, heat and constituents (Fischer et al. 1979, Ch. 6); each port’s outflow ' +
    'from its own withdrawal layer (Bohan & Grace 1973); ports either independent or, where their layers overlap, combined ' +
    '(see withdrawal-interference-combined).',
  equation: 'c_release = Σ Q_i c̄_i(Q_i) / Σ Q_i, 0 ≤ Q_i ≤ capacity_i, Σ Q_i = release',
  validity: {},
};

/** One intake port: depth below the surface [m] and capacity [m3/s]. */
export interface Port {
  depth: number;
  capacity: number;
}

/** Options of a blend: the sink of the ports and how overlapping layers are treated (default 'independent'). */
export interface BlendOptions extends ProfileWithdrawalOptions {
  interference?: InterferenceMode;
}

export interface BlendResult {
  /** port flows [m3/s] in the order of the ports */
  flows: number[];
  /** each port's outflow; with combined interference, its layer is computed at its group's total flow */
  ports: PortOutflow[];
  /** open ports drawing one combined withdrawal (combined mode), or whose layers overlap (independent mode) */
  groups: InterferenceGroup[];
  /** flow-weighted temperature [degC] and density [kg/m3] of the release */
  temperature: number;
  density: number;
  /** every profile column, flow-weighted over the ports */
  columns: OutflowColumn[];
  warnings: string[];
}

function checkPorts(ports: readonly Port[]): void {
  if (ports.length === 0)
    throw new InputError('ports', '(none)', '', 'at least one port', 'give at least one port as depth:capacity');
  ports.forEach((port, i) => {
    requireInRange(`ports[${i + 1}].depth`, port.depth, 'm', nonNegative);
    requireInRange(`ports[${i + 1}].capacity`, port.capacity, 'm3/s', { ...positive, max: 1e5 });
  });
}

/** Each port's outflow for a split, with the interference groups and their warnings. */
function releaseOutflows(
  ports: readonly Port[],
  flows: readonly number[],
  o: BlendOptions,
  outflow: OutflowFunction,
): { outs: PortOutflow[]; groups: InterferenceGroup[]; warnings: string[] } {
  const depths = ports.map((port) => port.depth);
  const name = (g: InterferenceGroup) =>
    g.ports
      .map((i) => `${formatShort(depths[i])} m`)
      .join(', ')
      .replace(/, ([^,]*)$/, ' and $1');
  if (o.interference === 'combined') {
    const { outflows, groups } = combinedOutflows(depths, flows, outflow);
    const warnings = groups
      .filter((g) => g.ports.length > 1)
      .map(
        (g) =>
          `The ports at ${name(g)} interfere (their withdrawal layers overlap): they are taken as one withdrawal of ${formatNumber(g.flow)} m3/s ` +
          `from ${formatShort(g.topDepth)} m to ${formatShort(g.bottomDepth)} m, each port drawing on a layer computed at that combined flow.`,
      );
    return { outs: outflows, groups, warnings };
  }
  const outs = ports.map((port, i) => outflow(port.depth, flows[i]));
  const groups = interferenceGroups(depths, flows, outflow, 1);
  const warnings = groups
    .filter((g) => g.ports.length > 1)
    .map(
      (g) =>
        `The withdrawal layers of the ports at ${name(g)} overlap, but each is computed as if the other ports were closed (interference ignored).`,
    );
  return { outs, groups, warnings };
}

/**
 * Blended release for a given split among ports. Each flow must lie within its port's capacity.
 * @param flows [m3/s] per port; @returns flow-weighted temperature, density and every profile column
 */
export function blendRelease(
  p: Profile,
  ports: readonly Port[],
  flows: readonly number[],
  o: BlendOptions,
  outflow: OutflowFunction = directOutflow(p, o),
): BlendResult {
  checkPorts(ports);
  if (flows.length !== ports.length)
    throw new InputError(
      'flows',
      flows.length,
      '',
      `${ports.length} values`,
      `give one flow per port (${ports.length})`,
    );
  flows.forEach((q, i) => requireInRange(`flows[${i + 1}]`, q, 'm3/s', { min: 0, max: ports[i].capacity }));
  const total = flows.reduce((a, b) => a + b, 0);
  if (!(total > 0)) throw new InputError('flows', total, 'm3/s', '> 0 m3/s in total', 'at least one port must be open');
  const { outs, groups, warnings: interference } = releaseOutflows(ports, flows, o, outflow);
  const columns = outs[0].columns.map((c, k) => ({
    name: c.name,
    unit: c.unit,
    value: outs.reduce((s, out, i) => s + flows[i] * out.columns[k].value, 0) / total,
  }));
  const get = (name: string) => columns.find((c) => c.name === name)!.value;
  const warnings = [...new Set([...outs.flatMap((o2, i) => (flows[i] > 0 ? o2.warnings : [])), ...interference])];
  return {
    flows: [...flows],
    ports: outs,
    groups,
    temperature: get('temperature'),
    density: get('density'),
    columns,
    warnings,
  };
}

/** Target of the optimiser: one temperature, or a band [min, max] [degC]. */
export type ReleaseTarget = { temperature: number } | { min: number; max: number };

export interface OptimisedRelease extends BlendResult {
  feasible: boolean;
  /** the lowest and highest release temperatures the ports can give at this release [degC] */
  achievable: { min: number; max: number };
}

/** Release temperature of a split [degC] (port outflows memoised over one optimisation). */
type TemperatureOf = (flows: number[]) => number;

/** Split that drives the release temperature to its extreme (sign −1: coldest, +1: warmest). */
function extremeSplit(
  ports: readonly Port[],
  release: number,
  temperatureOf: TemperatureOf,
  outflow: OutflowFunction,
  sign: -1 | 1,
): number[] {
  const nominal = ports.map((port) => outflow(port.depth, Math.min(port.capacity, release)).temperature);
  const order = ports.map((_, i) => i).sort((a, b) => sign * (nominal[b] - nominal[a]));
  const flows = ports.map(() => 0);
  let left = release;
  for (const i of order) {
    flows[i] = Math.min(ports[i].capacity, left);
    left -= flows[i];
  }
  // refine: move flow between each pair of ports by a golden-section search (the port outflows depend on their flows)
  const score = (f: number[]) => sign * temperatureOf(f);
  for (let sweep = 0; sweep < 2; sweep++) {
    for (let i = 0; i < ports.length; i++)
      for (let j = i + 1; j < ports.length; j++) {
        const { lo, hi, at } = pairMove(ports, flows, i, j);
        if (!(hi - lo > 1e-9 * release)) continue;
        const best = goldenMax((t) => score(at(t)), lo, hi);
        if (score(at(best)) > score(flows)) flows.splice(0, flows.length, ...at(best));
      }
  }
  return flows;
}

const clamp = (x: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, x));

function goldenMax(f: (t: number) => number, a: number, b: number): number {
  const r = (Math.sqrt(5) - 1) / 2;
  let c = b - r * (b - a),
    d = a + r * (b - a),
    fc = f(c),
    fd = f(d);
  for (let k = 0; k < 40 && b - a > 1e-9 * (Math.abs(a) + Math.abs(b) + 1); k++) {
    if (fc > fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - r * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + r * (b - a);
      fd = f(d);
    }
  }
  const ends = [a, b, (a + b) / 2].map((t) => ({ t, v: f(t) }));
  return ends.reduce((m, e) => (e.v > m.v ? e : m)).t;
}

/** Moving flow t from port j to port i of a split, each kept within its capacity. */
function pairMove(ports: readonly Port[], base: readonly number[], i: number, j: number) {
  const lo = -Math.min(base[i], ports[j].capacity - base[j]),
    hi = Math.min(base[j], ports[i].capacity - base[i]);
  const at = (t: number) => {
    const f = [...base];
    f[i] = clamp(f[i] + t, 0, ports[i].capacity);
    f[j] = clamp(f[j] - t, 0, ports[j].capacity);
    return f;
  };
  return { lo, hi, at };
}

/**
 * A point of [lo, hi] where f meets the goal within tol: Brent's method on the whole interval, then on each of 16 pieces
 * (the release temperature jumps where ports begin to interfere, and Brent's method then converges on the jump).
 * `closest` is the point evaluated whose value came nearest the goal.
 */
function meetGoal(
  f: (t: number) => number,
  lo: number,
  hi: number,
  goal: number,
  tol: number,
): { t?: number; closest: number; miss: number } {
  let closest = lo,
    miss = Infinity;
  const g = (t: number) => {
    const d = f(t) - goal;
    if (Math.abs(d) < miss) {
      miss = Math.abs(d);
      closest = t;
    }
    return d;
  };
  const attempt = (a: number, b: number) => {
    const r = brentRoot(g, a, b, 1e-10 * (hi - lo));
    return r !== undefined && Math.abs(g(r)) <= tol ? r : undefined;
  };
  let t = attempt(lo, hi);
  for (let k = 0; t === undefined && k < 16; k++)
    t = attempt(lo + ((hi - lo) * k) / 16, lo + ((hi - lo) * (k + 1)) / 16);
  return { t, closest, miss };
}

/**
 * Finds port flows (each within its capacity, summing to the release) whose blended temperature meets the target or lies in
 * the band. The coldest and warmest splits bound what is achievable; between them the flows are interpolated linearly
 * (a path that keeps every port within capacity) and the target is found by Brent's method. Where the target falls in a
 * jump of the release temperature (a layer limit jumping at a boundary or a profile step; ports starting to interfere), flow is moved between each pair of ports
 * from the closest split to find another crossing. When the target cannot be met, `feasible` is false and the closest
 * achievable split is returned.
 * @param release [m3/s] total release; @returns the split, its blend, feasibility and the achievable range [degC]
 */
export function optimiseRelease(
  p: Profile,
  ports: readonly Port[],
  release: number,
  target: ReleaseTarget,
  o: BlendOptions,
): OptimisedRelease {
  checkPorts(ports);
  const capacity = ports.reduce((s, port) => s + port.capacity, 0);
  requireInRange('release', release, 'm3/s', { ...positive, max: capacity });
  const band =
    'temperature' in target
      ? {
          min: requireInRange('target_temperature', target.temperature, 'degC', { min: -3, max: 60 }),
          max: target.temperature,
        }
      : {
          min: requireInRange('target_min', target.min, 'degC', { min: -3, max: 60 }),
          max: requireInRange('target_max', target.max, 'degC', { min: target.min, max: 60 }),
        };
  const outflow = memoisedOutflow(p, o);
  const temperatureOf: TemperatureOf = (f) =>
    releaseOutflows(ports, f, o, outflow).outs.reduce((s, out, i) => s + f[i] * out.temperature, 0) / release;
  const cold = extremeSplit(ports, release, temperatureOf, outflow, -1),
    warm = extremeSplit(ports, release, temperatureOf, outflow, 1);
  const tCold = temperatureOf(cold),
    tWarm = temperatureOf(warm);
  const achievable = { min: Math.min(tCold, tWarm), max: Math.max(tCold, tWarm) };
  const goal = clamp((band.min + band.max) / 2, achievable.min, achievable.max);
  const tol = 1e-3;
  const path = (t: number) => cold.map((q, i) => clamp((1 - t) * q + t * warm[i], 0, ports[i].capacity));
  let flows: number[];
  let jump = false;
  if (goal <= tCold + 1e-9 || tWarm - tCold < 1e-9) flows = cold;
  else if (goal >= tWarm - 1e-9) flows = warm;
  else {
    const onPath = meetGoal((x) => temperatureOf(path(x)), 0, 1, goal, tol / 2);
    if (onPath.t !== undefined) flows = path(onPath.t);
    else {
      const other = pairSearch(ports, path(onPath.closest), release, temperatureOf, goal, tol / 2);
      flows = other ?? path(onPath.closest);
      jump = other === undefined;
    }
  }
  const blend = blendRelease(p, ports, flows, o, outflow);
  const feasible = blend.temperature >= band.min - tol && blend.temperature <= band.max + tol;
  const warnings = [...blend.warnings];
  if (!feasible) {
    const wanted =
      band.min === band.max ? `${formatNumber(band.min)} °C` : `${formatNumber(band.min)}–${formatNumber(band.max)} °C`;
    warnings.push(
      jump && goal > achievable.min && goal < achievable.max
        ? `The target ${wanted} lies in a jump of the release temperature (a withdrawal layer changes abruptly where it reaches the surface, the bed or a sharp step of the profile, or where ports start to interfere): no split found gives it; the closest split found is reported.`
        : `The target ${wanted} cannot be met at a release of ${formatNumber(release)} m3/s: the ports give ${achievable.min.toFixed(2)}–${achievable.max.toFixed(2)} °C; the closest achievable split is reported.`,
    );
  }
  return { ...blend, feasible, achievable, warnings };
}

/** A split meeting the goal found by moving flow between one pair of ports, starting from `base`. */
function pairSearch(
  ports: readonly Port[],
  base: readonly number[],
  release: number,
  temperatureOf: TemperatureOf,
  goal: number,
  tol: number,
): number[] | undefined {
  for (let i = 0; i < ports.length; i++)
    for (let j = i + 1; j < ports.length; j++) {
      const move = pairMove(ports, base, i, j);
      if (!(move.hi - move.lo > 1e-9 * release)) continue;
      const r = meetGoal((x) => temperatureOf(move.at(x)), move.lo, move.hi, goal, tol).t;
      if (r !== undefined) return move.at(r);
    }
  return undefined;
}
