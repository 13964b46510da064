import type { MethodInfo } from '../core/method';
import type { Profile } from '../profile/profile';
import { DepthCursor, firstIndex, mergeAscending } from './depth-cursor';
import { portOutflow, withdrawalVelocityProfile, type OutflowColumns, type PortOutflow } from './outflow';
import type { ProfileWithdrawal, ProfileWithdrawalOptions } from './measured';
import { LayerMemo } from './port-layer';

export const WITHDRAWAL_INTERFERENCE: MethodInfo = {
  id: 'withdrawal-interference-combined',
  title: 'Interfering intake ports: overlapping withdrawal layers treated as one combined withdrawal',
  source:
    'Multiple-port selective withdrawal of the U.S. Army Engineer Waterways Experiment Station: Smith, D.R., Wilhelms, S.C., ' +
    'Holland, J.P., Dortch, M.S., Davis, J.E. (1987). Improved description of selective withdrawal through point sinks. ' +
    'Tech. Rep. E-87-2; Howington, S.E. (1990). Intake structure operation study, Elk Creek Dam, Oregon. Tech. Rep. HL-90-16 ' +
    '(overlapping zones combined into one zone from the upper limit of the upper port to the lower limit of the ' +
    'lower port at the total flow, velocity distribution the flow-weighted sum of the ports’ distributions). Layer limits and velocity shapes: Bohan & Grace (1973), see ' +
    'withdrawal-limits-bohan-grace1973 and withdrawal-velocity-bohan-grace1973.',
  equation:
    'open ports sorted by depth; ports i above j interfere when d_bottom,i(Q_i) > d_top,j(Q_j); a group draws Q_g = Σ Q_i; each member’s ' +
    'layer is computed with Q_g and groups whose zones overlap join, until none do; zone = [d_top,upper(Q_g), d_bottom,lower(Q_g)]; ' +
    'q(d) = Σ Q_i v_i(d; Q_g)/∫v_i dd; port outflow c̄_i = ∫ v_i c dd / ∫ v_i dd; release c = Σ Q_i c̄_i / Σ Q_i',
  validity: {},
  provenance:
    'The combination rule is as commonly described for the multiple-port reports cited; the exact form used in those reports was not compared.',
};

/** Whether the withdrawal layers of open ports are combined where they overlap, or each port is taken alone. */
export type InterferenceMode = 'combined' | 'independent';

/** Open ports drawing one combined withdrawal. */
export interface InterferenceGroup {
  /** indices of the member ports, shallowest first */
  ports: number[];
  /** total flow of the group [m3/s] */
  flow: number;
  /** limits of the combined zone [m below the surface] */
  topDepth: number;
  bottomDepth: number;
}

/** A port's outflow at a depth and flow; callers may memoise it (the optimiser evaluates the same flows often). */
export type OutflowFunction = (depth: number, flow: number) => PortOutflow;

/** The limits of a port's withdrawal layer at a depth and flow (all an interference test needs). */
export type LimitsFunction = (depth: number, flow: number) => ProfileWithdrawal;

export const directOutflow =
  (p: Profile, o: ProfileWithdrawalOptions): OutflowFunction =>
  (depth, flow) =>
    portOutflow(p, depth, flow, o);

/**
 * A memoised outflow function for one profile and set of options (keyed by depth, then flow), drawing its layers from
 * `layers` (of the same profile and sink). The optimiser evaluates many splits in which most ports keep their flow;
 * their outflows are then looked up, not recomputed.
 */
export function memoisedOutflow(
  p: Profile,
  o: ProfileWithdrawalOptions,
  which: OutflowColumns = 'all',
  layers = new LayerMemo(p, o),
): OutflowFunction {
  const byDepth = new Map<number, Map<number, PortOutflow>>();
  return (depth, flow) => {
    let memo = byDepth.get(depth);
    if (!memo) byDepth.set(depth, (memo = new Map()));
    let out = memo.get(flow);
    if (!out) {
      out = portOutflow(p, depth, flow, o, which, layers.layer(depth, flow));
      memo.set(flow, out);
    }
    return out;
  };
}

function envelope(
  depths: readonly number[],
  members: number[],
  flow: number,
  limitsOf: LimitsFunction,
): InterferenceGroup {
  let topDepth = Infinity,
    bottomDepth = -Infinity;
  for (const i of members) {
    const l = limitsOf(depths[i], flow);
    topDepth = Math.min(topDepth, l.topDepth);
    bottomDepth = Math.max(bottomDepth, l.bottomDepth);
  }
  return { ports: members, flow, topDepth, bottomDepth };
}

/**
 * Groups of open ports whose withdrawal layers overlap. The first pass compares each port's layer at its own flow with the
 * next deeper port's; a group's layers are then recomputed with its total flow and groups whose zones overlap join, until
 * no zones overlap (`rounds` = 1 stops after the first pass, for reporting overlap without combining).
 * @param depths [m] port depths; @param flows [m3/s] port flows (0 = closed)
 */
export function interferenceGroups(
  depths: readonly number[],
  flows: readonly number[],
  limitsOf: LimitsFunction,
  rounds = Infinity,
): InterferenceGroup[] {
  const open = depths
    .map((_, i) => i)
    .filter((i) => flows[i] > 0)
    .sort((a, b) => depths[a] - depths[b] || a - b);
  let groups = open.map((i) => envelope(depths, [i], flows[i], limitsOf));
  for (let round = 0; round < Math.min(rounds, open.length); round++) {
    const joined: InterferenceGroup[] = [];
    let changed = false;
    for (const g of groups) {
      const prev = joined[joined.length - 1];
      if (prev && prev.bottomDepth > g.topDepth) {
        const members = [...prev.ports, ...g.ports].sort((a, b) => depths[a] - depths[b] || a - b);
        joined[joined.length - 1] = {
          ports: members,
          flow: prev.flow + g.flow,
          topDepth: prev.topDepth,
          bottomDepth: Math.max(prev.bottomDepth, g.bottomDepth),
        };
        changed = true;
      } else joined.push(g);
    }
    if (!changed) break;
    groups = joined.map((g) => (g.ports.length > 1 && rounds > 1 ? envelope(depths, g.ports, g.flow, limitsOf) : g));
  }
  return groups;
}

/**
 * Outflow of every port with interference: a member of a group draws from its own layer computed at the group's total
 * flow (so two ports at one depth act as one port of their summed flow); `discharge` stays the port's own flow.
 * Closed ports report the values at their depth. Groups are those of interferenceGroups().
 */
export function combinedOutflows(
  depths: readonly number[],
  flows: readonly number[],
  outflow: OutflowFunction,
  limitsOf: LimitsFunction,
): { outflows: PortOutflow[]; groups: InterferenceGroup[] } {
  const groups = interferenceGroups(depths, flows, limitsOf);
  const groupFlow = depths.map(() => 0);
  for (const g of groups) for (const i of g.ports) groupFlow[i] = g.flow;
  const outflows = depths.map((d, i) =>
    flows[i] > 0 ? { ...outflow(d, groupFlow[i]), discharge: flows[i] } : outflow(d, 0),
  );
  return { outflows, groups };
}

/**
 * Outflow per metre of depth of a group, q(d) = Σ Q_i v_i(d; Q_g)/∫v_i dd, on the union of the members' grids [m2/s].
 * Its integral over depth is the group's flow.
 */
export function groupFluxProfile(
  p: Profile,
  depths: readonly number[],
  flows: readonly number[],
  g: InterferenceGroup,
  o: ProfileWithdrawalOptions,
  layers = new LayerMemo(p, o),
): { depth: number[]; fluxPerDepth: number[] } {
  const members = g.ports.map((i) => ({
    share: flows[i] / g.flow,
    v: withdrawalVelocityProfile(p, depths[i], g.flow, o, layers.layer(depths[i], g.flow)),
  }));
  const depth = mergeAscending(members.map((m) => m.v.depth));
  const fluxPerDepth = depth.map(() => 0);
  // each member adds its piecewise-linear curve over its own span only (it is zero outside it)
  for (const m of members) {
    const v = m.v;
    if (v.depth.length < 2) continue;
    const cursor = new DepthCursor(v.depth);
    const last = v.depth[v.depth.length - 1];
    for (let k = firstIndex(depth, (d) => d >= v.depth[0]); k < depth.length && depth[k] <= last; k++)
      fluxPerDepth[k] += m.share * cursor.seek(depth[k]).value(v.fluxPerDepth);
  }
  return { depth, fluxPerDepth };
}
