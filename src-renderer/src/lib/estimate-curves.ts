import type { EstimateOutcome } from '../../../shared-core/site/assess';
import { conditionProfile } from '../../../shared-core/site/context';
import type { Site } from '../../../shared-core/site/schema';
import { buoyantJetTrajectory } from '../../../shared-core/jets/buoyant-jet';
import type { Profile } from '../../../shared-core/profile/profile';
import { readQuantity } from './quantity';

/**
 * What an estimate draws into the section. Chart curves come with each estimate's outcome. Everything here is computed by shared-core functions; this module only arranges it.
 */
export type SectionMark =
  | { kind: 'band'; featureId: string; port: number; top: number; bottom: number; label: string }
  | {
      kind: 'path';
      featureId: string;
      x: number[];
      depth: number[];
      radius: number[];
      label: string;
      end?: { x: number; depth: number; label: string };
    }
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
  const [diameter, velocity, angle, portDepth, effluentDensity] = [
    'diameter',
    'velocity',
    'angle',
    'port_depth',
    'effluent_density',
  ].map(get);
  if (
    [diameter, velocity, angle, portDepth, effluentDensity].some((v) => v === undefined) ||
    (!profile && rhoA === undefined)
  )
    return {};
  const t = buoyantJetTrajectory({
    diameter: diameter!,
    velocity: velocity!,
    angle: angle!,
    portDepth: portDepth!,
    effluentDensity: effluentDensity!,
    ambient: profile && o.inputs.file ? { kind: 'profile', profile } : { kind: 'uniform', density: rhoA! },
    current: get('current') ?? 0,
  });
  const p = t.path;
  const last = p.depth.length - 1;
  const featureId = o.feature?.id ?? '';
  return {
    marks: [
      {
        kind: 'path',
        featureId,
        x: p.horizontalDistance,
        depth: p.depth,
        radius: p.radius,
        label: o.title,
        end: { x: p.horizontalDistance[last], depth: p.depth[last], label: t.outcome },
      },
    ],
  };
}

/**
 * Withdrawal zones from the release-blend method's own outflow curves (one per open port, or one per group of
 * interfering ports), so the section shows exactly what the estimate computed.
 */
function withdrawalBands(_site: Site, o: EstimateOutcome): Partial<EstimateDrawing> {
  const featureId = o.feature?.id ?? '';
  const marks: SectionMark[] = [];
  o.series
    .filter((c) => c.y[0]?.label === 'Outflow per metre of depth')
    .forEach((c, port) => {
      const drawn = c.x.values.filter((_d, i) => c.y[0].values[i] > 0);
      if (drawn.length === 0) return;
      const label = c.title.replace(/^Withdrawal at the /, '').replace(/^Combined withdrawal of the /, 'combined: ');
      marks.push({ kind: 'band', featureId, port, top: Math.min(...drawn), bottom: Math.max(...drawn), label });
    });
  return { marks };
}

function layerBand(site: Site, o: EstimateOutcome): Partial<EstimateDrawing> {
  const f = site.features.find((x) => x.id === o.feature?.id);
  const thickness = num(o, 'thickness');
  if (!f || f.kind !== 'intake' || thickness === undefined) return {};
  const depth = readQuantity(f.ports[0].depth, 'm', 'depth').si;
  if (depth === undefined) return {};
  return {
    marks: [
      {
        kind: 'band',
        featureId: f.id,
        port: 0,
        top: depth - thickness / 2,
        bottom: depth + thickness / 2,
        label: 'withdrawal layer',
      },
    ],
  };
}

/** A diffuser's governing centreline from its own 'Plume centreline' curve (width not drawn: it is a row of plumes). */
function diffuserPath(_site: Site, o: EstimateOutcome): Partial<EstimateDrawing> {
  const c = o.series.find((x) => x.title === 'Plume centreline');
  if (!c || c.x.values.length < 2) return {};
  // no end label: the single-port path of the same outfall usually ends close by and carries one
  return {
    marks: [
      {
        kind: 'path',
        featureId: o.feature?.id ?? '',
        x: c.x.values,
        depth: c.y[0].values,
        radius: c.x.values.map(() => 0),
        label: o.title,
      },
    ],
  };
}

const BUILDERS: Record<string, (site: Site, o: EstimateOutcome) => Partial<EstimateDrawing>> = {
  'buoyant-jet': plume,
  'diffuser-plume': diffuserPath,
  'release-blend': withdrawalBands,
  'withdrawal-layer': layerBand,
  'profile-summary': (_s, o) => ({
    marks: [
      ...(num(o, 'mixed_layer_depth') !== undefined
        ? [{ kind: 'level' as const, depth: num(o, 'mixed_layer_depth')!, label: 'mixed layer' }]
        : []),
      ...(num(o, 'thermocline_depth') !== undefined
        ? [{ kind: 'level' as const, depth: num(o, 'thermocline_depth')!, label: 'thermocline' }]
        : []),
    ],
  }),
  'plunge-depth': (_s, o) =>
    num(o, 'plunge_depth') !== undefined && o.feature
      ? { marks: [{ kind: 'point', featureId: o.feature.id, depth: num(o, 'plunge_depth')!, label: 'plunge point' }] }
      : {},
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
