import { InputError, formatNumber } from '../core/errors';
import { nonNegative, positive, requireInRange } from '../core/range';
import type { MethodInfo } from '../core/method';
import { brentRoot } from '../numerics/roots';
import type { Profile } from '../profile/profile';
import { portOutflow, type OutflowColumn, type PortOutflow } from './outflow';
import type { ProfileWithdrawalOptions } from './measured';

export const RELEASE_BLEND: MethodInfo = {
  id: 'release-blend-flow-weighted',
  title: 'Blended release of several ports and the split that meets a temperature target',
  source:
    'Mixing of the port outflows by conservation of mass, heat and constituents (Fischer et al. 1979, Ch. 6); each port’s outflow ' +
    'from its own withdrawal layer (Bohan & Grace 1973), ports treated as independent (no interference between layers).',
  equation: 'c_release = Σ Q_i c̄_i(Q_i) / Σ Q_i, 0 ≤ Q_i ≤ capacity_i, Σ Q_i = release',
  validity: {},
};

/** One intake port: depth below the surface [m] and capacity [m3/s]. */
export interface Port {
  depth: number;
  capacity: number;
}

export interface BlendResult {
  /** port flows [m3/s] in the order of the ports */
  flows: number[];
  ports: PortOutflow[];
  /** flow-weighted temperature [degC] and density [kg/m3] of the release */
  temperature: number;
  density: number;
  /** every profile column, flow-weighted over the ports */
  columns: OutflowColumn[];
  warnings: string[];
}

function checkPorts(ports: readonly Port[]): void {
  if (ports.length === 0) throw new InputError('ports', '(none)', '', 'at least one port', 'give at least one port as depth:capacity');
  ports.forEach((port, i) => {
    requireInRange(`ports[${i + 1}].depth`, port.depth, 'm', nonNegative);
    requireInRange(`ports[${i + 1}].capacity`, port.capacity, 'm3/s', { ...positive, max: 1e5 });
  });
}

/**
 * Blended release for a given split among ports. Each flow must lie within its port's capacity.
 * @param flows [m3/s] per port; @returns flow-weighted temperature, density and every profile column
 */
export function blendRelease(p: Profile, ports: readonly Port[], flows: readonly number[], o: ProfileWithdrawalOptions): BlendResult {
  checkPorts(ports);
  if (flows.length !== ports.length) throw new InputError('flows', flows.length, '', `${ports.length} values`, `give one flow per port (${ports.length})`);
  flows.forEach((q, i) => requireInRange(`flows[${i + 1}]`, q, 'm3/s', { min: 0, max: ports[i].capacity }));
  const total = flows.reduce((a, b) => a + b, 0);
  if (!(total > 0)) throw new InputError('flows', total, 'm3/s', '> 0 m3/s in total', 'at least one port must be open');
  const outs = ports.map((port, i) => portOutflow(p, port.depth, flows[i], o));
  const columns = outs[0].columns.map((c, k) => ({ name: c.name, unit: c.unit, value: outs.reduce((s, out, i) => s + flows[i] * out.columns[k].value, 0) / total }));
  const get = (name: string) => columns.find((c) => c.name === name)!.value;
  const warnings = [...new Set(outs.flatMap((o2, i) => (flows[i] > 0 ? o2.warnings : [])))];
  if (ports.filter((_, i) => flows[i] > 0).length > 1) warnings.push('Each port’s withdrawal layer is computed as if the other ports were closed; layers of nearby open ports interfere.');
  return { flows: [...flows], ports: outs, temperature: get('temperature'), density: get('density'), columns, warnings };
}

/** Target of the optimiser: one temperature, or a band [min, max] [degC]. */
export type ReleaseTarget = { temperature: number } | { min: number; max: number };

export interface OptimisedRelease extends BlendResult {
  feasible: boolean;
  /** the lowest and highest release temperatures the ports can give at this release [degC] */
  achievable: { min: number; max: number };
}

const temperatureOf = (p: Profile, ports: readonly Port[], flows: number[], o: ProfileWithdrawalOptions, release: number) =>
  ports.reduce((s, port, i) => s + (flows[i] > 0 ? flows[i] * portOutflow(p, port.depth, flows[i], o).temperature : 0), 0) / release;

/** Split that drives the release temperature to its extreme (sign −1: coldest, +1: warmest). */
function extremeSplit(p: Profile, ports: readonly Port[], release: number, o: ProfileWithdrawalOptions, sign: -1 | 1): number[] {
  const nominal = ports.map((port) => portOutflow(p, port.depth, Math.min(port.capacity, release), o).temperature);
  const order = ports.map((_, i) => i).sort((a, b) => sign * (nominal[b] - nominal[a]));
  const flows = ports.map(() => 0);
  let left = release;
  for (const i of order) { flows[i] = Math.min(ports[i].capacity, left); left -= flows[i]; }
  // refine: move flow between each pair of ports by a golden-section search (the port outflows depend on their flows)
  const score = (f: number[]) => sign * temperatureOf(p, ports, f, o, release);
  for (let sweep = 0; sweep < 2; sweep++) {
    for (let i = 0; i < ports.length; i++) for (let j = i + 1; j < ports.length; j++) {
      const lo = -Math.min(flows[i], ports[j].capacity - flows[j]), hi = Math.min(flows[j], ports[i].capacity - flows[i]);
      if (!(hi - lo > 1e-9 * release)) continue;
      const at = (t: number) => { const f = [...flows]; f[i] = clamp(f[i] + t, 0, ports[i].capacity); f[j] = clamp(f[j] - t, 0, ports[j].capacity); return f; };
      const best = goldenMax((t) => score(at(t)), lo, hi);
      if (score(at(best)) > score(flows)) flows.splice(0, flows.length, ...at(best));
    }
  }
  return flows;
}

const clamp = (x: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, x));

function goldenMax(f: (t: number) => number, a: number, b: number): number {
  const r = (Math.sqrt(5) - 1) / 2;
  let c = b - r * (b - a), d = a + r * (b - a), fc = f(c), fd = f(d);
  for (let k = 0; k < 40 && b - a > 1e-9 * (Math.abs(a) + Math.abs(b) + 1); k++) {
    if (fc > fd) { b = d; d = c; fd = fc; c = b - r * (b - a); fc = f(c); } else { a = c; c = d; fc = fd; d = a + r * (b - a); fd = f(d); }
  }
  const ends = [a, b, (a + b) / 2].map((t) => ({ t, v: f(t) }));
  return ends.reduce((m, e) => (e.v > m.v ? e : m)).t;
}

/**
 * Finds port flows (each within its capacity, summing to the release) whose blended temperature meets the target or lies in
 * the band. The coldest and warmest splits bound what is achievable; between them the flows are interpolated linearly
 * (a path that keeps every port within capacity) and the target is found by Brent's method. When the target cannot be met,
 * `feasible` is false and the closest achievable split is returned.
 * @param release [m3/s] total release; @returns the split, its blend, feasibility and the achievable range [degC]
 */
export function optimiseRelease(p: Profile, ports: readonly Port[], release: number, target: ReleaseTarget, o: ProfileWithdrawalOptions): OptimisedRelease {
  checkPorts(ports);
  const capacity = ports.reduce((s, port) => s + port.capacity, 0);
  requireInRange('release', release, 'm3/s', { ...positive, max: capacity });
  const band = 'temperature' in target
    ? { min: requireInRange('target_temperature', target.temperature, 'degC', { min: -3, max: 60 }), max: target.temperature }
    : { min: requireInRange('target_min', target.min, 'degC', { min: -3, max: 60 }), max: requireInRange('target_max', target.max, 'degC', { min: target.min, max: 60 }) };
  const cold = extremeSplit(p, ports, release, o, -1), warm = extremeSplit(p, ports, release, o, 1);
  const tCold = temperatureOf(p, ports, cold, o, release), tWarm = temperatureOf(p, ports, warm, o, release);
  const achievable = { min: Math.min(tCold, tWarm), max: Math.max(tCold, tWarm) };
  const goal = clamp((band.min + band.max) / 2, achievable.min, achievable.max);
  const path = (t: number) => cold.map((q, i) => clamp((1 - t) * q + t * warm[i], 0, ports[i].capacity));
  let flows: number[];
  if (goal <= tCold + 1e-9 || tWarm - tCold < 1e-9) flows = cold;
  else if (goal >= tWarm - 1e-9) flows = warm;
  else flows = path(brentRoot((t) => temperatureOf(p, ports, path(t), o, release) - goal, 0, 1, 1e-10) ?? 0.5);
  const blend = blendRelease(p, ports, flows, o);
  const tol = 1e-3;
  const feasible = blend.temperature >= band.min - tol && blend.temperature <= band.max + tol;
  const warnings = [...blend.warnings];
  if (!feasible) {
    const wanted = band.min === band.max ? `${formatNumber(band.min)} °C` : `${formatNumber(band.min)}–${formatNumber(band.max)} °C`;
    warnings.push(`The target ${wanted} cannot be met at a release of ${formatNumber(release)} m3/s: the ports give ${achievable.min.toFixed(2)}–${achievable.max.toFixed(2)} °C; the closest achievable split is reported.`);
  }
  return { ...blend, feasible, achievable, warnings };
}
