import type { EstimateOutcome } from '../../../shared-core/site/assess';
import { conditionProfile } from '../../../shared-core/site/context';
import type { Site } from '../../../shared-core/site/schema';
import { buoyantJetTrajectory } from '../../../shared-core/jets/buoyant-jet';
import { withdrawalVelocityProfile } from '../../../shared-core/withdrawal/outflow';
import type { Profile } from '../../../shared-core/profile/profile';
import { readQuantity } from './quantity';

/**
 * What an estimate draws into the section. Chart curves come with each estimate's outcome. Everything here is computed by shared-core functions; this module only arranges it.
 */
export type SectionMark =
  | { kind: 'band'; featureId: string; port: number; top: number; bottom: number; label: string }
  | { kind: 'path'; featureId: string; x: number[]; depth: number[]; radius: number[]; label: string; end?: { x: number; depth: number; label: string } }
  | { kind: 'level'; depth: number; label: string }
  | { kind: 'point'; featureId: string; depth: number; label: string };

export interface EstimateDrawing {
  estimateId: string;
  marks: SectionMark[];
  /** drawn dashed: the result lies outside its method's validity */
  outside: string[];
}

const num = (o: EstimateOutcome, name: string, from: 'inputs' | 'results' = 'results'): number | undefined => {
  const r = o[from][name];
  return r && typeof r.value === 'number' ? r.value : undefined;
};

function profileOf(site: Site, o: EstimateOutcome): Profile | undefined {
  const c = site.conditions.find((x) => x.id === o.condition?.id);
  try {
    return c ? conditionProfile(c) : undefined;
  } catch {
    return undefined;
  }
}

function plume(site: Site, o: EstimateOutcome): Partial<EstimateDrawing> {
  const profile = profileOf(site, o);
  const rhoA = num(o, 'ambient_density', 'inputs');
  const get = (n: string) => num(o, n, 'inputs');
  const [diameter, velocity, angle, portDepth, effluentDensity] = ['diameter', 'velocity', 'angle', 'port_depth', 'effluent_density'].map(get);
  if ([diameter, velocity, angle, portDepth, effluentDensity].some((v) => v === undefined) || (!profile && rhoA === undefined)) return {};
  const t = buoyantJetTrajectory({
    diameter: diameter!, velocity: velocity!, angle: angle!, portDepth: portDepth!, effluentDensity: effluentDensity!,
    ambient: profile && o.inputs.file ? { kind: 'profile', profile } : { kind: 'uniform', density: rhoA! }, current: get('current') ?? 0,
  });
  const p = t.path;
  const last = p.depth.length - 1;
  const featureId = o.feature?.id ?? '';
  return {
    marks: [{ kind: 'path', featureId, x: p.horizontalDistance, depth: p.depth, radius: p.radius, label: o.title, end: { x: p.horizontalDistance[last], depth: p.depth[last], label: t.outcome } }],
  };
}

/** Port depths and flows from the release-blend method's 'Port flows' curve. */
function portFlows(o: EstimateOutcome): { depth: number; flow: number }[] {
  const s = o.series.find((c) => c.title === 'Port flows');
  if (!s) return [];
  return s.x.values.map((depth, i) => ({ depth, flow: s.y[0].values[i] }));
}

function withdrawalBands(site: Site, o: EstimateOutcome): Partial<EstimateDrawing> {
  const profile = profileOf(site, o);
  const featureId = o.feature?.id ?? '';
  if (!profile) return {};
  const marks: SectionMark[] = [];
  portFlows(o).forEach(({ depth, flow }, port) => {
    if (!(flow > 0)) return;
    const v = withdrawalVelocityProfile(profile, depth, flow, { sink: 'point' });
    marks.push({ kind: 'band', featureId, port, top: v.limits.topDepth, bottom: v.limits.bottomDepth, label: `port at ${depth.toFixed(1)} m` });
  });
  return { marks };
}

function layerBand(site: Site, o: EstimateOutcome): Partial<EstimateDrawing> {
  const f = site.features.find((x) => x.id === o.feature?.id);
  const thickness = num(o, 'thickness');
  if (!f || f.kind !== 'intake' || thickness === undefined) return {};
  const depth = readQuantity(f.ports[0].depth, 'm', 'depth').si;
  if (depth === undefined) return {};
  return { marks: [{ kind: 'band', featureId: f.id, port: 0, top: depth - thickness / 2, bottom: depth + thickness / 2, label: 'withdrawal layer' }] };
}

const BUILDERS: Record<string, (site: Site, o: EstimateOutcome) => Partial<EstimateDrawing>> = {
  'buoyant-jet': plume,
  'release-blend': withdrawalBands,
  'withdrawal-layer': layerBand,
  'profile-summary': (_s, o) => ({
    marks: [
      ...(num(o, 'mixed_layer_depth') !== undefined ? [{ kind: 'level' as const, depth: num(o, 'mixed_layer_depth')!, label: 'mixed layer' }] : []),
      ...(num(o, 'thermocline_depth') !== undefined ? [{ kind: 'level' as const, depth: num(o, 'thermocline_depth')!, label: 'thermocline' }] : []),
    ],
  }),
  'plunge-depth': (_s, o) => (num(o, 'plunge_depth') !== undefined && o.feature ? { marks: [{ kind: 'point', featureId: o.feature.id, depth: num(o, 'plunge_depth')!, label: 'plunge point' }] } : {}),
};

const OUTSIDE = /outside the range|extrapolat|not valid|beyond/i;

/** Drawing and extra curves of one estimate; never throws (a failed drawing is simply left out). */
export function drawEstimate(site: Site, o: EstimateOutcome): EstimateDrawing {
  const base: EstimateDrawing = { estimateId: o.id, marks: [], outside: o.warnings.filter((w) => OUTSIDE.test(w)) };
  if (o.status !== 'ok') return base;
  try {
    const extra = BUILDERS[o.method]?.(site, o) ?? {};
    return { ...base, marks: extra.marks ?? [] };
  } catch {
    return base;
  }
}
