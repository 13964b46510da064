import type { Profile } from '../profile/profile';
import { ENTRAINMENT_LAWS } from './entrainment';
import { PLUNGE_AKIYAMA_STEFAN_1984, PLUNGE_INITIAL_MIXING } from './plunge';
import { riverInflowPath, type RiverInflow } from './river';
import { UNDERFLOW_NORMAL_STATE } from './underflow';

/** How far the insertion depth moves across the published ranges of the river-inflow coefficients. */
export interface InsertionSpread {
  /** shallowest and deepest insertion depth over the combinations [m]; the deepest is the bottom when one reaches it */
  low: number;
  high: number;
  /** combinations whose current reaches the bottom of the profile without inserting */
  reachingBottom: number;
  /** combinations run */
  runs: number;
}

/** The ends of a descriptor's validity range, read from the method (not re-typed). */
function ends(range: { min?: number; max?: number }, name: string): [number, number] {
  if (range.min === undefined || range.max === undefined) throw new Error(`${name} has no closed validity range`);
  return [range.min, range.max];
}

/**
 * Insertion depth of a river inflow for every corner of the published coefficient ranges: both entrainment laws (Parker
 * et al. 1987; Ellison & Turner 1959 as fitted by Turner 1986), the ends of the drag-coefficient range of the underflow
 * method, of the plunge-line mixing ratio Φ and of the plunge Froude number F_p (the validity ranges of their
 * descriptors). 2⁴ = 16 runs of `riverInflowPath`.
 * @returns the shallowest and deepest insertion [m]; a run that reaches the bottom counts as the bottom depth
 */
export function insertionDepthSpread(p: Profile, inflow: RiverInflow): InsertionSpread {
  const drags = ends(UNDERFLOW_NORMAL_STATE.validity.drag_coefficient, 'drag_coefficient');
  const mixings = ends(PLUNGE_INITIAL_MIXING.validity.initial_mixing, 'initial_mixing');
  const froudes = ends(PLUNGE_AKIYAMA_STEFAN_1984.validity.plunge_froude, 'plunge_froude');
  const bottom = p.depth[p.depth.length - 1];
  let low = Infinity,
    high = -Infinity,
    reachingBottom = 0,
    runs = 0;
  for (const law of ENTRAINMENT_LAWS)
    for (const dragCoefficient of drags)
      for (const initialMixing of mixings)
        for (const plungeFroude of froudes) {
          const r = riverInflowPath(p, { ...inflow, law, dragCoefficient, initialMixing, plungeFroude });
          const d = r.underflow.insertionDepth ?? bottom;
          if (r.underflow.insertionDepth === undefined) reachingBottom++;
          low = Math.min(low, d);
          high = Math.max(high, d);
          runs++;
        }
  return { low, high, reachingBottom, runs };
}
