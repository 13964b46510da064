import type { Profile } from '../profile/profile';
import { DepthCursor } from './depth-cursor';
import { LayerShape, layerNodes } from './layer-shape';
import { withdrawalLimitsBohanGrace1973, type ProfileWithdrawal, type ProfileWithdrawalOptions } from './measured';

/**
 * One port's withdrawal layer on a measured profile, worked out once for every column it averages and every chart it
 * draws: the limits, v/v_max on the integration nodes, and the weight of each profile sample in the flow-weighted mean.
 */
export interface PortLayer {
  limits: ProfileWithdrawal;
  /** integration nodes from the upper to the lower limit [m] (the port alone when the layer has no extent) */
  depth: number[];
  /** v/v_max at the nodes [1] */
  rel: number[];
  /** ∫ v/v_max dd by the trapezoid rule [m]; 0 when the layer has no extent */
  area: number;
  /**
   * weight of each profile sample in c̄ = ∫ v c dd / ∫ v dd = Σ w_j c_j (the trapezoid rule on the nodes, each node's
   * value interpolated linearly between two samples, gathered per sample); empty when `area` is 0
   */
  sampleWeights: Float64Array;
}

/** The layer of a port at a depth [m] and discharge [m3/s] on the profile (see PortLayer). */
export function portLayer(p: Profile, portDepth: number, discharge: number, o: ProfileWithdrawalOptions): PortLayer {
  return layerOfLimits(p, withdrawalLimitsBohanGrace1973(p, portDepth, discharge, o));
}

function layerOfLimits(p: Profile, limits: ProfileWithdrawal): PortLayer {
  if (!(limits.bottomDepth - limits.topDepth > 0))
    return { limits, depth: [limits.portDepth], rel: [1], area: 0, sampleWeights: new Float64Array(0) };
  const depth = layerNodes(p, limits);
  const cursor = new DepthCursor(p.depth);
  const shape = new LayerShape(limits, cursor.seek(limits.portDepth).value(p.density));
  const rel = new Array<number>(depth.length);
  const weights = new Float64Array(p.depth.length);
  let area = 0;
  for (let i = 0; i < depth.length; i++) {
    cursor.seek(depth[i]);
    rel[i] = shape.at(depth[i], cursor.value(p.density));
    // node i carries half of each trapezoid it bounds
    const span = (i > 0 ? depth[i] - depth[i - 1] : 0) + (i < depth.length - 1 ? depth[i + 1] - depth[i] : 0);
    const w = 0.5 * rel[i] * span;
    area += w;
    cursor.spread(w, weights);
  }
  if (area > 0) for (let j = 0; j < weights.length; j++) weights[j] /= area;
  return { limits, depth, rel, area, sampleWeights: weights };
}

/** The flow-weighted mean of a profile column over a layer of positive area: Σ w_j c_j. */
export function layerMean(layer: PortLayer, column: readonly number[]): number {
  let s = 0;
  for (let j = 0; j < column.length; j++) s += layer.sampleWeights[j] * column[j];
  return s;
}

/**
 * Port layers of one profile and sink, memoised by port depth, then discharge: the limits alone (all an interference
 * test needs) or with the shape. The release optimiser, the blend of its split and the charts of that split then work
 * out each layer once.
 */
export class LayerMemo {
  private readonly byDepth = new Map<number, Map<number, { limits: ProfileWithdrawal; layer?: PortLayer }>>();

  constructor(
    readonly profile: Profile,
    readonly options: ProfileWithdrawalOptions,
  ) {}

  limits(depth: number, discharge: number): ProfileWithdrawal {
    return this.entry(depth, discharge).limits;
  }

  layer(depth: number, discharge: number): PortLayer {
    const e = this.entry(depth, discharge);
    return (e.layer ??= layerOfLimits(this.profile, e.limits));
  }

  private entry(depth: number, discharge: number) {
    let memo = this.byDepth.get(depth);
    if (!memo) this.byDepth.set(depth, (memo = new Map()));
    let e = memo.get(discharge);
    if (!e) {
      e = { limits: withdrawalLimitsBohanGrace1973(this.profile, depth, discharge, this.options) };
      memo.set(discharge, e);
    }
    return e;
  }
}
