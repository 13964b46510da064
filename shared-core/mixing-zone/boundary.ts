import { qty } from '../core/quantity-text';
import { requireInRange, nonNegative } from '../core/range';
import type { JetTrajectory } from '../jets/buoyant-jet';

/** Where the regulatory mixing zone ends: a horizontal distance from the port, or a distance along the path. */
export type MixingZoneBoundary = { measure: 'horizontal'; distance: number } | { measure: 'path'; distance: number };

export interface BoundaryDilution {
  /** centreline (minimum) and average dilution at the boundary, or at the end of the near field when it ends first [1] */
  dilutionCentreline: number;
  dilutionAverage: number;
  /** false when the computed near field ends inside the mixing zone: the value then omits far-field mixing (errs low) */
  reached: boolean;
  /** where the value was taken: along-path distance [m] */
  pathDistance?: number;
  note: string;
}

/**
 * Dilution at the mixing-zone boundary, interpolated linearly along the trajectory. When the near field
 * ends inside the mixing zone (surface, bed, trapping) the dilution at its end is returned with reached = false:
 * further mixing in the far field is not included, so the value errs on the low (safe) side.
 * For a dense jet whose return-point dilution was chosen apart from the model's (`t.denseJet`, see dense-jet-lab.ts),
 * the model's dilution at and beyond its return point is scaled by the chosen ÷ model ratio, and the note says so.
 * @param t a buoyant-jet trajectory; @param boundary distance [m] from the port (horizontal) or along the path
 */
export function dilutionAtBoundary(t: JetTrajectory, boundary: MixingZoneBoundary): BoundaryDilution {
  const d = modelDilutionAtBoundary(t, boundary);
  const dense = t.denseJet;
  if (!dense || dense.factor === 1 || d.pathDistance === undefined || d.pathDistance < dense.returnPathDistance)
    return d;
  const f = dense.factor;
  return {
    ...d,
    dilutionCentreline: Math.max(1, d.dilutionCentreline * f),
    dilutionAverage: Math.max(1, d.dilutionAverage * f),
    note: `${d.note}; beyond the return point the model's dilution is scaled by ${f.toPrecision(3)} to the ${dense.choice === 'lab' ? 'laboratory' : 'cautious'} return dilution (dense-jet dilution used: ${dense.choice})`,
  };
}

function modelDilutionAtBoundary(t: JetTrajectory, boundary: MixingZoneBoundary): BoundaryDilution {
  const R = requireInRange('boundary_distance', boundary.distance, 'm', nonNegative);
  const key = boundary.measure === 'horizontal' ? 'horizontalDistance' : 's';
  const xs = t.path[key],
    n = xs.length;
  for (let i = 1; i < n; i++) {
    if (xs[i] >= R && xs[i - 1] < R) {
      const f = (R - xs[i - 1]) / (xs[i] - xs[i - 1]);
      const lerp = (c: number[]) => c[i - 1] + f * (c[i] - c[i - 1]);
      return {
        dilutionCentreline: lerp(t.path.dilutionCentreline),
        dilutionAverage: lerp(t.path.dilutionAverage),
        reached: true,
        pathDistance: lerp(t.path.s),
        note: `at the boundary, ${qty(R, 'm')} ${boundary.measure === 'horizontal' ? 'from the port' : 'along the path'}`,
      };
    }
  }
  if (xs[0] >= R)
    return {
      dilutionCentreline: 1,
      dilutionAverage: 1,
      reached: true,
      pathDistance: 0,
      note: 'the boundary is at the port: no dilution',
    };
  return {
    dilutionCentreline: t.path.dilutionCentreline[n - 1],
    dilutionAverage: t.path.dilutionAverage[n - 1],
    reached: false,
    pathDistance: t.path.s[n - 1],
    note: `the near field ends (${t.outcome}) before the boundary; far-field mixing up to the boundary is not included`,
  };
}
