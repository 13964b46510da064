import type { EstimateOutcome } from '../../../shared-core/site/assess';
import type { JetTrajectory } from '../../../shared-core/jets/buoyant-jet';

/**
 * What an estimate draws into the section, read from its outcome's typed model (the jet's path, the
 * release's withdrawal zones…) and results: nothing is computed here, this module only arranges it.
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
  /** drawn dashed: the messages of the warnings that put the result outside its method's validity */
  outside: string[];
}

const num = (o: EstimateOutcome, name: string): number | undefined => {
  const r = o.results[name];
  return r && typeof r.value === 'number' ? r.value : undefined;
};

function jetPath(o: EstimateOutcome, t: JetTrajectory, withRadius: boolean, endLabel?: string): SectionMark {
  const p = t.path;
  const last = p.depth.length - 1;
  return {
    kind: 'path',
    featureId: o.feature?.id ?? '',
    x: [...p.horizontalDistance],
    depth: [...p.depth],
    radius: withRadius ? [...p.radius] : p.depth.map(() => 0),
    label: o.title,
    ...(endLabel ? { end: { x: p.horizontalDistance[last], depth: p.depth[last], label: endLabel } } : {}),
  };
}

function modelMarks(o: EstimateOutcome): SectionMark[] {
  const m = o.model;
  const featureId = o.feature?.id ?? '';
  switch (m?.kind) {
    case 'jet':
      return [jetPath(o, m.trajectory, true, m.trajectory.outcome)];
    case 'diffuser':
      // the governing centreline, no width (a row of plumes) and no end label (the single-port path carries one)
      return [jetPath(o, m.diffuser.governing === 'merged' ? m.diffuser.merged : m.diffuser.isolated, false)];
    case 'withdrawal-zones':
      return m.zones.map((z) => ({
        kind: 'band',
        featureId,
        port: z.port,
        top: z.top,
        bottom: z.bottom,
        label: z.label,
      }));
    case 'withdrawal-layer':
      return [{ kind: 'band', featureId, port: 0, top: m.top, bottom: m.bottom, label: 'withdrawal layer' }];
    default:
      return [];
  }
}

function resultMarks(o: EstimateOutcome): SectionMark[] {
  const marks: SectionMark[] = [];
  const level = (name: string, label: string) => {
    const depth = num(o, name);
    if (depth !== undefined) marks.push({ kind: 'level', depth, label });
  };
  if (o.method === 'profile-summary') {
    level('mixed_layer_depth', 'mixed layer');
    level('thermocline_depth', 'thermocline');
  }
  const plunge = num(o, 'plunge_depth');
  if (o.method === 'plunge-depth' && plunge !== undefined && o.feature)
    marks.push({ kind: 'point', featureId: o.feature.id, depth: plunge, label: 'plunge point' });
  return marks;
}

/** Drawing of one estimate; an estimate that did not compute draws nothing. */
export function drawEstimate(o: EstimateOutcome): EstimateDrawing {
  const outside = o.warnings.filter((w) => w.severity === 'outside-validity').map((w) => w.message);
  if (o.status === 'error') return { estimateId: o.id, marks: [], outside };
  return { estimateId: o.id, marks: [...modelMarks(o), ...resultMarks(o)], outside };
}
