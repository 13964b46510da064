import type { ProfileWithdrawal, SideLimit } from './measured';
import type { Profile } from '../profile/profile';
import { firstIndex } from './depth-cursor';

/** One side of a layer as the velocity shape needs it. */
interface SideShape {
  /** distance over which the distance term falls to zero [m] */
  reach: number;
  /** the density difference at which the density term falls to zero [kg/m3]; 0: no density term */
  densityLimit: number;
  /** the side has no extent (the port at the surface or the bed) */
  empty: boolean;
}

function sideShape(side: SideLimit, other: SideLimit): SideShape {
  return {
    reach: side.cutByBoundary
      ? Math.min(side.unboundedHalfThickness, Math.max(side.distance, other.distance))
      : side.distance,
    densityLimit: !side.cutByBoundary && side.densityDifference > 0 ? side.densityDifference : 0,
    empty: side.distance === 0,
  };
}

/**
 * The velocity shape v/v_max of one port's withdrawal layer (Bohan & Grace 1973): 1 − max((Δρ/Δρ_limit)², (a/a_limit)²)
 * on each side. In linear stratification both terms are the same parabola; in neutral (mixed) water the distance term
 * keeps the velocity falling away from the port, so a port drawing from a mixed layer does not draw its far end as strongly
 * as its own level. A side stopped by the surface or the bed falls off over its unbounded half-thickness, but at most over
 * the longer of the two sides (so neutral water, whose unbounded half-thickness is infinite, is weighted like the layer on
 * the other side; continuous as N → 0). The side constants are worked out once per layer.
 */
export class LayerShape {
  private readonly upper: SideShape;
  private readonly lower: SideShape;

  constructor(
    private readonly w: ProfileWithdrawal,
    /** density at the port [kg/m3] */
    private readonly rhoPort: number,
  ) {
    this.upper = sideShape(w.upper, w.lower);
    this.lower = sideShape(w.lower, w.upper);
  }

  /** v/v_max in [0, 1] at depth d [m] where the density is rho [kg/m3]. */
  at(d: number, rho: number): number {
    const w = this.w;
    if (d < w.topDepth || d > w.bottomDepth) return 0;
    const side = d < w.portDepth ? this.upper : this.lower;
    if (side.empty) return 1;
    let s = 1 - (Math.abs(d - w.portDepth) / side.reach) ** 2;
    if (side.densityLimit > 0) s = Math.min(s, 1 - (Math.abs(rho - this.rhoPort) / side.densityLimit) ** 2);
    return Math.min(1, Math.max(0, s));
  }
}

const GRID = 401;

/**
 * Integration nodes of a layer, ascending and distinct: a uniform grid of 401 points from limit to limit plus the port and
 * the profile samples inside the layer, so the trapezoid rule never straddles a kink of the profile.
 */
export function layerNodes(p: Profile, w: ProfileWithdrawal): number[] {
  const span = w.bottomDepth - w.topDepth;
  const extra: number[] = [];
  for (let k = firstIndex(p.depth, (d) => d > w.topDepth); k < p.depth.length && p.depth[k] < w.bottomDepth; k++)
    extra.push(p.depth[k]);
  extra.splice(
    firstIndex(extra, (d) => d > w.portDepth),
    0,
    w.portDepth,
  );
  const out: number[] = [];
  let j = 0;
  for (let i = 0; i < GRID; i++) {
    const g = w.topDepth + (span * i) / (GRID - 1);
    for (; j < extra.length && extra[j] < g; j++) pushDistinct(out, extra[j]);
    pushDistinct(out, g);
  }
  for (; j < extra.length; j++) pushDistinct(out, extra[j]);
  return out;
}

function pushDistinct(list: number[], x: number): void {
  if (list.length === 0 || list[list.length - 1] !== x) list.push(x);
}
