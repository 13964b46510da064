import { qty } from '../core/quantity-text';
import { caution, note, outsideValidity, type Warning } from '../core/warning';
import type { OdeStatus } from '../numerics/ode';
import type { JetEvent, JetPath } from './buoyant-jet';
import type { JetLengthScales } from './length-scales';

/** How the near field of a discharge ends. */
export type JetOutcome =
  'surfaces' | 'trapped' | 'reaches bed' | 'returns to port level' | 'falls back on itself' | 'unfinished' | 'failed';

/** a length in a sentence, to three figures, shown in the reader's units */
const len = (x: number) => qty(x, 'm', 3);
const s = (x: number) => (x >= 100 ? x.toFixed(0) : x.toFixed(1));

/** The outcome of a trajectory and a sentence that states it. */
export function describeOutcome(
  events: JetEvent[],
  status: OdeStatus,
  maxRise: number,
  path: JetPath,
): { kind: JetOutcome; text: string } {
  const find = (k: JetEvent['kind']) => events.find((e) => e.kind === k);
  const end = find('end of near field');
  const ret = find('return to port level');
  const neutral = find('neutral buoyancy');
  const last = path.s.length - 1;
  if (status === 'step-failed' || status === 'max-steps') {
    return {
      kind: 'failed',
      text: `The integration stopped early (${status}) ${len(path.s[last])} along the path; the results are incomplete.`,
    };
  }
  const retText = ret
    ? ` It falls back through port level ${len(ret.horizontalDistance)} from the port with a centreline dilution of ${s(ret.dilutionCentreline)}.`
    : '';
  const rise = `The centreline rises at most ${len(maxRise)} above the port.`;
  if (!end) {
    return {
      kind: 'unfinished',
      text: `${rise}${retText} Within the ${len(path.s[last])} of path followed it neither reached the surface or the bed nor became trapped; the near field continues beyond.`,
    };
  }
  const prev = events[events.length - 2];
  switch (prev.kind) {
    case 'surface contact':
      return {
        kind: 'surfaces',
        text: `The plume reaches the surface ${len(end.horizontalDistance)} from the port with a centreline dilution of ${s(end.dilutionCentreline)} (average ${s(end.dilutionAverage)}); from there it spreads along the surface, which this model does not follow.`,
      };
    case 'maximum rise':
    case 'lowest point':
    case 'momentum spent':
      if (prev.kind === 'momentum spent' && !neutral) {
        return {
          kind: 'falls back on itself',
          text: `The jet is stopped ${len(end.z)} above the port with a centreline dilution of ${s(end.dilutionCentreline)} and falls back onto itself (a fountain); the integral model ends there.`,
        };
      }
      return { kind: 'trapped', text: trappedText(events, prev, end, neutral, maxRise) };
    case 'bed contact':
      return {
        kind: 'reaches bed',
        text: `${rise}${retText} The centreline reaches the bed ${len(end.horizontalDistance)} from the port with a centreline dilution of ${s(end.dilutionCentreline)}; beyond it the effluent spreads as a density current on the bed.`,
      };
    case 'return to port level':
      return {
        kind: 'returns to port level',
        text: `${rise}${retText} No bed below the port is known, so the path ends there; the dense effluent then spreads as a current along the bed.`,
      };
    default:
      return { kind: 'unfinished', text: `${rise} The path ends at ${prev.kind}.` };
  }
}

/**
 * A trapped plume in words. A plume that rose, came back down through its neutral level and turned again (its path
 * ends at a lowest point below the highest one) is told in that order, never as an "overshoot" below its top.
 */
function trappedText(
  events: JetEvent[],
  prev: JetEvent,
  end: JetEvent,
  neutral: JetEvent | undefined,
  maxRise: number,
): string {
  const dilution = `the centreline dilution at the turning point is ${s(end.dilutionCentreline)}`;
  const level = neutral?.z ?? end.z;
  const depth = neutral?.depth ?? end.depth;
  const roseFirst = events.some((e) => e.kind === 'maximum rise' && e.s < end.s) && maxRise > end.z;
  if (prev.kind === 'lowest point' && roseFirst)
    return (
      `The density layering traps the plume below the surface: it rises at most ${len(maxRise)} above the port, ` +
      `sinks back through its neutral level ${len(level)} above the port (depth ${len(depth)}) to ${len(end.z)} ` +
      `and will spread sideways near the neutral level; ${dilution}.`
    );
  return (
    `The density layering traps the plume below the surface: it becomes neutrally buoyant ${len(level)} above the port (depth ${len(depth)}), ` +
    `overshoots to ${len(end.z)} and will spread sideways near the neutral level; ${dilution}.`
  );
}

export interface WarningContext {
  events: JetEvent[];
  status: OdeStatus;
  message: string;
  scales: JetLengthScales;
  angleDeg: number;
  dense: boolean;
  current: number;
  velocity: number;
  profileBottom?: number;
  portDepth: number;
  /** the path continues as a merged (plane) plume after the plumes merge */
  merged?: boolean;
  /** the longest path followed [m] */
  pathLength: number;
}

/** Warnings where the model leaves its validity along this path. */
export function pathWarnings(c: WarningContext): Warning[] {
  const w: Warning[] = [];
  const find = (k: JetEvent['kind']) => c.events.find((e) => e.kind === k);
  if (c.status === 'step-failed' || c.status === 'max-steps')
    w.push(caution('integration-incomplete', `The integration did not finish: ${c.message}.`));
  if (c.scales.froude < 0.5)
    w.push(
      outsideValidity(
        'port-froude-very-low',
        `The port Froude number is very low (${c.scales.froude.toFixed(2)}): ambient water may enter the port and the jet starts as a lazy plume; the model is uncertain near the port.`,
      ),
    );
  const surf = find('edge reaches surface'),
    surfC = find('surface contact');
  if (surf && (!surfC || surf.s < surfC.s - 1e-9))
    w.push(
      caution(
        'plume-edge-surfaces',
        `The plume's edge touches the surface ${len(surf.horizontalDistance)} from the port, before its centreline does: surface interaction is not modelled beyond that point.`,
      ),
    );
  const bedEdge = find('edge reaches bed');
  if (bedEdge)
    w.push(
      caution(
        'near-field-bed-contact',
        `The plume's lower edge touches the bed ${len(bedEdge.horizontalDistance)} from the port: it may attach to the bed, which a free-jet model does not describe.`,
      ),
    );
  if (c.dense && c.angleDeg < 15)
    w.push(
      caution(
        'dense-jet-bed-attachment',
        'A dense jet aimed less than 15° above horizontal close to the bed may attach to the bed (wall jet); the free-jet result may overstate its dilution.',
        'angle',
      ),
    );
  const merge = find('plumes merge');
  if (merge && !c.merged)
    w.push(
      caution(
        'plumes-merge-single-port',
        `Neighbouring plumes merge ${len(merge.s)} along the path (centreline dilution ${s(merge.dilutionCentreline)}): beyond it the single-port dilution is too high; use the merged-diffuser estimate.`,
      ),
    );
  if (merge && c.merged)
    w.push(
      note(
        'plumes-merge',
        `Neighbouring plumes merge ${len(merge.s)} along the path (centreline dilution ${s(merge.dilutionCentreline)}); beyond it the path is that of a line plume with the merged fluxes per unit diffuser length.`,
      ),
    );
  if (c.current > c.velocity)
    w.push(
      caution(
        'current-exceeds-jet',
        'The current is faster than the jet: the jet is swept downstream at once and the near-field result depends mostly on the crossflow entrainment coefficient.',
        'current',
      ),
    );
  if (c.dense && c.angleDeg > 15 && c.angleDeg < 80) {
    w.push(
      caution(
        'dense-jet-dilution-low',
        'Integral models of this kind under-predict the dilution of inclined dense jets measured in the laboratory by tens of percent (Roberts, Ferrier & Daviero 1997; Kikkert, Davidson & Nokes 2007); the dilutions here err on the low side.',
        'angle',
      ),
      caution(
        'dense-jet-rise-low',
        'The model’s rise is low: laboratory dense jets rise higher than integral models predict (Lai & Lee 2012 found 10–15 % for theirs; this one is about 20 % below Roberts, Ferrier & Daviero 1997). Do not rely on the model’s rise to show that the jet stays below the surface or an intake; compare the terminal rise from the laboratory correlations.',
        'angle',
      ),
    );
  }
  if (c.status === 'completed' && !find('end of near field'))
    w.push(
      caution(
        'path-length-reached',
        `The path followed ends (longest path followed ${len(c.pathLength)}) before the near field does: the dilution at its end is a lower bound.`,
        'max_path_length',
      ),
    );
  if (c.profileBottom !== undefined && c.portDepth > c.profileBottom)
    w.push(
      caution(
        'port-below-profile',
        `The port (depth ${len(c.portDepth)}) lies below the deepest profile sample (${len(c.profileBottom)}): the ambient there is extrapolated.`,
        'port_depth',
      ),
    );
  return w;
}
