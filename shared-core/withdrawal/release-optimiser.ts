import { qty } from '../core/quantity-text';
import { positive, requireInRange } from '../core/range';
import { caution } from '../core/warning';
import type { Profile } from '../profile/profile';
import { blendRelease, checkPorts, type BlendOptions, type BlendResult, type Port } from './blend';
import { combinedOutflows, memoisedOutflow, type LimitsFunction, type OutflowFunction } from './interference';
import { LayerMemo } from './port-layer';
import { goldenMax, meetGoal } from './search';

/** Target of the optimiser: one temperature, or a band [min, max] [degC]. */
export type ReleaseTarget = { temperature: number } | { min: number; max: number };

export interface OptimisedRelease extends BlendResult {
  feasible: boolean;
  /** the lowest and highest release temperatures the ports can give at this release [degC] */
  achievable: { min: number; max: number };
}

/** Release temperature of a split [degC] (port outflows memoised over one optimisation). */
type TemperatureOf = (flows: number[]) => number;

/** Evaluations the search for a split around a jump may spend (bounded work, whatever the number of ports). */
const PAIR_SEARCH_EVALUATIONS = 4000;

/** Size of the trial move that decides whether a pair of ports is worth a search, as a share of its range. */
const PROBE = 1e-3;

const clamp = (x: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, x));

/**
 * The release temperature of a split. Only the ports whose flow (or, combined, whose group's flow) changed are
 * recomputed: the others come from the memo.
 */
function releaseTemperature(
  ports: readonly Port[],
  release: number,
  o: BlendOptions,
  outflow: OutflowFunction,
  limitsOf: LimitsFunction,
) {
  const depths = ports.map((port) => port.depth);
  return (f: number[]): number => {
    const outs =
      o.interference === 'combined'
        ? combinedOutflows(depths, f, outflow, limitsOf).outflows
        : ports.map((port, i) => outflow(port.depth, f[i]));
    return outs.reduce((s, out, i) => s + f[i] * out.temperature, 0) / release;
  };
}

/**
 * Split that drives the release temperature to its extreme (sign −1: coldest, +1: warmest): the ports filled in order of
 * their temperature, then flow traded between the partly filled port and its neighbours in that order where a small trial
 * move shows a gain (the outflows depend on their flows). The work is bounded whatever the number of ports.
 */
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
  const window = fillWindow(order, flows);
  const score = (f: number[]) => sign * temperatureOf(f);
  for (let sweep = 0, moved = true; sweep < 2 && moved; sweep++) {
    moved = false;
    for (const [i, j] of pairsOf(window)) {
      const { lo, hi, at } = pairMove(ports, flows, i, j);
      if (!(hi - lo > 1e-9 * release)) continue;
      // a golden-section search along the pair only where a small move either way improves the split
      const now = score(flows),
        step = PROBE * (hi - lo);
      if (!(score(at(Math.min(hi, step))) > now || score(at(Math.max(lo, -step))) > now)) continue;
      const best = goldenMax((t) => score(at(t)), lo, hi);
      if (score(at(best)) > now) {
        flows.splice(0, flows.length, ...at(best));
        moved = true;
      }
    }
  }
  return flows;
}

/** The (up to) three ports around the last one the fill opened, in the fill order; returned in index order. */
function fillWindow(order: readonly number[], flows: readonly number[]): number[] {
  let last = 0;
  order.forEach((i, k) => {
    if (flows[i] > 0) last = k;
  });
  const start = clamp(last - 1, 0, Math.max(0, order.length - 3));
  return order.slice(start, start + 3).sort((a, b) => a - b);
}

/** Every pair (i < j) of an ascending list of ports. */
function pairsOf(list: readonly number[]): [number, number][] {
  return list.flatMap((i, k) => list.slice(k + 1).map((j): [number, number] => [i, j]));
}

/** Pairs of ports near each other in depth (each with the next two deeper ones: at most 2n), in index order. */
function nearbyPairs(ports: readonly Port[]): [number, number][] {
  const byDepth = ports.map((_, i) => i).sort((a, b) => ports[a].depth - ports[b].depth || a - b);
  const pairs = byDepth.flatMap((a, r) =>
    byDepth.slice(r + 1, r + 3).map((b): [number, number] => (a < b ? [a, b] : [b, a])),
  );
  return pairs.sort((x, y) => x[0] - y[0] || x[1] - y[1]);
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
 * A split meeting the goal found by moving flow between two ports near each other in depth, starting from `base`;
 * gives up after PAIR_SEARCH_EVALUATIONS evaluations.
 */
function pairSearch(
  ports: readonly Port[],
  base: readonly number[],
  release: number,
  temperatureOf: TemperatureOf,
  goal: number,
  tol: number,
): number[] | undefined {
  let spent = 0;
  const counted: TemperatureOf = (f) => {
    spent++;
    return temperatureOf(f);
  };
  for (const [i, j] of nearbyPairs(ports)) {
    if (spent >= PAIR_SEARCH_EVALUATIONS) return undefined;
    const move = pairMove(ports, base, i, j);
    if (!(move.hi - move.lo > 1e-9 * release)) continue;
    const r = meetGoal((x) => counted(move.at(x)), move.lo, move.hi, goal, tol).t;
    if (r !== undefined) return move.at(r);
  }
  return undefined;
}

/** The target as a band [degC], checked. */
function targetBand(target: ReleaseTarget): { min: number; max: number } {
  return 'temperature' in target
    ? {
        min: requireInRange('target_temperature', target.temperature, 'degC', { min: -3, max: 60 }),
        max: target.temperature,
      }
    : {
        min: requireInRange('target_min', target.min, 'degC', { min: -3, max: 60 }),
        max: requireInRange('target_max', target.max, 'degC', { min: target.min, max: 60 }),
      };
}

/**
 * Finds port flows (each within its capacity, summing to the release) whose blended temperature meets the target or lies in
 * the band. The coldest and warmest splits bound what is achievable; between them the flows are interpolated linearly
 * (a path that keeps every port within capacity) and the target is found by Brent's method. Where the target falls in a
 * jump of the release temperature (a layer limit jumping at a boundary or a profile step; ports starting to interfere),
 * flow is moved between pairs of ports near each other in depth from the closest split to find another crossing. When the
 * target cannot be met, `feasible` is false and the closest achievable split is returned. The work grows linearly with the
 * number of ports: a bounded number of evaluations, each recomputing only the ports whose flow changed.
 * @param release [m3/s] total release; @param layers port layers of this profile and sink (the caller may chart from them)
 * @returns the split, its blend, feasibility and the achievable range [degC]
 */
export function optimiseRelease(
  p: Profile,
  ports: readonly Port[],
  release: number,
  target: ReleaseTarget,
  o: BlendOptions,
  layers = new LayerMemo(p, o),
): OptimisedRelease {
  checkPorts(ports);
  const capacity = ports.reduce((s, port) => s + port.capacity, 0);
  requireInRange('release', release, 'm3/s', { ...positive, max: capacity });
  const band = targetBand(target);
  const outflow = memoisedOutflow(p, o, 'temperature-density', layers);
  const temperatureOf = releaseTemperature(ports, release, o, outflow, (d, q) => layers.limits(d, q));
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
  const blend = blendRelease(p, ports, flows, o, layers);
  const feasible = blend.temperature >= band.min - tol && blend.temperature <= band.max + tol;
  const warnings = [...blend.warnings];
  if (!feasible) {
    const wanted =
      band.min === band.max ? qty(band.min, 'degC') : `${qty(band.min, 'degC')} to ${qty(band.max, 'degC')}`;
    warnings.push(
      jump && goal > achievable.min && goal < achievable.max
        ? caution(
            'target-in-jump',
            `The target ${wanted} lies in a jump of the release temperature (a withdrawal layer changes abruptly where it reaches the surface, the bed or a sharp step of the profile, or where ports start to interfere): no split found gives it; the closest split found is reported.`,
            'target_temperature',
          )
        : caution(
            'target-not-achievable',
            `The target ${wanted} cannot be met at a release of ${qty(release, 'm3/s')}: the ports give ${qty(achievable.min, 'degC', 3)} to ${qty(achievable.max, 'degC', 3)}; the closest achievable split is reported.`,
            'target_temperature',
          ),
    );
  }
  return { ...blend, feasible, achievable, warnings };
}
