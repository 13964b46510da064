import type { WithdrawalZone } from '../calc/model';
import type { Series } from '../calc/types';
import { qty } from '../core/quantity-text';
import type { Profile } from '../profile/profile';
import type { Port } from './blend';
import { groupFluxProfile, type InterferenceGroup } from './interference';
import { withdrawalVelocityProfile } from './outflow';
import { LayerMemo } from './port-layer';
import type { OptimisedRelease } from './release-optimiser';

/**
 * Chart curves of a release split: the flow of each port, and each open port's (or interfering group's) outflow per metre
 * of depth. `groups` are the combined withdrawals (empty: every port alone); `layers` the point-sink layers already
 * worked out on the profile (by the optimiser of the split).
 */
export function releaseSeries(
  p: Profile,
  ports: readonly Port[],
  flows: readonly number[],
  groups: readonly InterferenceGroup[] = [],
  layers = new LayerMemo(p, { sink: 'point' }),
): Series[] {
  const out: Series[] = [
    {
      kind: 'port-flows',
      title: 'Port flows',
      x: { label: 'Port depth', unit: 'm', values: ports.map((q) => q.depth) },
      y: [
        { label: 'Port flow', unit: 'm3/s', values: [...flows] },
        { label: 'Port capacity', unit: 'm3/s', values: ports.map((q) => q.capacity) },
      ],
      depthAxis: true,
      caption: 'Flow of each port in the release split, with its capacity',
    },
  ];
  const depths = ports.map((q) => q.depth);
  const combined = groups.filter((g) => g.ports.length > 1);
  const inGroup = new Set(combined.flatMap((g) => g.ports));
  ports.forEach((port, i) => {
    if (!(flows[i] > 0) || inGroup.has(i)) return;
    const v = withdrawalVelocityProfile(p, port.depth, flows[i], { sink: 'point' }, layers.layer(port.depth, flows[i]));
    out.push({
      kind: 'withdrawal-outflow',
      title: `Withdrawal at the port at ${qty(port.depth, 'm')}`,
      x: { label: 'Depth', unit: 'm', values: v.depth },
      y: [{ label: 'Outflow per metre of depth', unit: 'm2/s', values: v.fluxPerDepth }],
      depthAxis: true,
      caption: `Velocity distribution in the withdrawal layer of the port at ${qty(port.depth, 'm')} (${qty(flows[i], 'm3/s', 3)})`,
    });
  });
  for (const g of combined) {
    const v = groupFluxProfile(p, depths, flows, g, { sink: 'point' }, layers);
    const names = g.ports.map((i) => qty(depths[i], 'm')).join(', ');
    out.push({
      kind: 'withdrawal-outflow',
      title: `Combined withdrawal of the ports at ${names}`,
      x: { label: 'Depth', unit: 'm', values: v.depth },
      y: [{ label: 'Outflow per metre of depth', unit: 'm2/s', values: v.fluxPerDepth }],
      depthAxis: true,
      caption: `Flow-weighted sum of the velocity distributions of the interfering ports at ${names} (${qty(g.flow, 'm3/s', 3)} in all)`,
    });
  }
  return out;
}

/**
 * The zones a release draws from, in port order: each open port alone (its layer at its own flow), or, for ports that
 * interfere (`groups`: the combined withdrawals), one zone per group, indexed by its shallowest port.
 */
export function withdrawalZones(
  ports: readonly Port[],
  r: OptimisedRelease,
  groups: readonly InterferenceGroup[],
): WithdrawalZone[] {
  const at = (i: number) => qty(ports[i].depth, 'm');
  const combined = groups.filter((g) => g.ports.length > 1);
  const inGroup = new Set(combined.flatMap((g) => g.ports));
  const alone = ports
    .map((_, i) => i)
    .filter((i) => r.flows[i] > 0 && !inGroup.has(i))
    .map((i) => ({
      label: `port at ${at(i)}`,
      port: i,
      top: r.ports[i].limits.topDepth,
      bottom: r.ports[i].limits.bottomDepth,
    }));
  const joined = combined.map((g) => ({
    label: `combined: ports at ${g.ports.map(at).join(', ')}`,
    port: g.ports[0],
    top: g.topDepth,
    bottom: g.bottomDepth,
  }));
  return [...alone, ...joined].sort((x, y) => x.port - y.port);
}
