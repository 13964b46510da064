import { InputError } from '../core/errors';
import { qty } from '../core/quantity-text';
import { nonNegative, positive, requireInRange } from '../core/range';
import type { MethodInfo } from '../core/method';
import { LIMITS } from '../core/limits';
import { caution, note, uniqueWarnings, type Warning } from '../core/warning';
import type { Profile } from '../profile/profile';
import { portOutflow, type OutflowColumn, type PortOutflow } from './outflow';
import type { ProfileWithdrawalOptions } from './measured';
import {
  combinedOutflows,
  interferenceGroups,
  type InterferenceGroup,
  type InterferenceMode,
  type OutflowFunction,
} from './interference';
import { LayerMemo } from './port-layer';

export const RELEASE_BLEND: MethodInfo = {
  id: 'release-blend-flow-weighted',
  title: 'Blended release of several ports and the split that meets a temperature target',
  source:
    'Mixing of the port outflows by conservation of mass, heat and constituents (Fischer et al. 1979, Ch. 6); each port’s outflow ' +
    'from its own withdrawal layer (Bohan & Grace 1973); ports either independent or, where their layers overlap, combined ' +
    '(see the combined withdrawal of interfering ports).',
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
  warnings: Warning[];
}

/** Refuses an empty port list or one longer than LIMITS.intakePorts (the work of a blend grows with the ports). */
export function checkPortCount(count: number): void {
  if (count === 0)
    throw new InputError('ports', '(none)', '', 'at least one port', 'give at least one port as depth:capacity');
  if (count > LIMITS.intakePorts)
    throw new InputError(
      'ports',
      count,
      '',
      `at most ${LIMITS.intakePorts} ports`,
      `${count} ports is more than the limit of ${LIMITS.intakePorts} ports of one intake`,
    );
}

/** Refuses a port list that is empty, too long, or has a negative depth or a non-positive capacity. */
export function checkPorts(ports: readonly Port[]): void {
  checkPortCount(ports.length);
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
  layers: LayerMemo,
): { outs: PortOutflow[]; groups: InterferenceGroup[]; warnings: Warning[] } {
  const outflow: OutflowFunction = (depth, flow) =>
    portOutflow(layers.profile, depth, flow, o, 'all', layers.layer(depth, flow));
  const limitsOf = (depth: number, flow: number) => layers.limits(depth, flow);
  const depths = ports.map((port) => port.depth);
  const name = (g: InterferenceGroup) =>
    g.ports
      .map((i) => qty(depths[i], 'm'))
      .join(', ')
      .replace(/, ([^,]*)$/, ' and $1');
  if (o.interference === 'combined') {
    const { outflows, groups } = combinedOutflows(depths, flows, outflow, limitsOf);
    const warnings = groups
      .filter((g) => g.ports.length > 1)
      .map((g) =>
        note(
          'ports-interfere',
          `The ports at ${name(g)} interfere (their withdrawal layers overlap): they are taken as one withdrawal of ${qty(g.flow, 'm3/s')} ` +
            `from ${qty(g.topDepth, 'm')} to ${qty(g.bottomDepth, 'm')}, each port drawing on a layer computed at that combined flow.`,
          'ports',
        ),
      );
    return { outs: outflows, groups, warnings };
  }
  const outs = ports.map((port, i) => outflow(port.depth, flows[i]));
  const groups = interferenceGroups(depths, flows, limitsOf, 1);
  const warnings = groups
    .filter((g) => g.ports.length > 1)
    .map((g) =>
      caution(
        'interference-ignored',
        `The withdrawal layers of the ports at ${name(g)} overlap, but each is computed as if the other ports were closed (interference ignored).`,
        'interference',
      ),
    );
  return { outs, groups, warnings };
}

/**
 * Blended release for a given split among ports. Each flow must lie within its port's capacity.
 * @param flows [m3/s] per port; @param layers the port layers already worked out on this profile and sink
 * @returns flow-weighted temperature, density and every profile column
 */
export function blendRelease(
  p: Profile,
  ports: readonly Port[],
  flows: readonly number[],
  o: BlendOptions,
  layers = new LayerMemo(p, o),
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
  const { outs, groups, warnings: interference } = releaseOutflows(ports, flows, o, layers);
  const columns = outs[0].columns.map((c, k) => ({
    name: c.name,
    unit: c.unit,
    value: outs.reduce((s, out, i) => s + flows[i] * out.columns[k].value, 0) / total,
  }));
  const get = (name: string) => columns.find((c) => c.name === name)!.value;
  const warnings = uniqueWarnings([...outs.flatMap((o2, i) => (flows[i] > 0 ? o2.warnings : [])), ...interference]);
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
