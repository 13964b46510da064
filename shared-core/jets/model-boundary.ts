import type { EstimateModel } from '../calc/model';
import { InputError } from '../core/errors';
import type { JetTrajectory } from './buoyant-jet';
import { dilutionAtBoundary, type BoundaryDilution, type MixingZoneBoundary } from '../mixing-zone/boundary';

/** The boundary dilution of a computed model and the path that gave it. */
export interface ModelBoundaryDilution extends BoundaryDilution {
  /**
   * 'jet': the one buoyant-jet path; for a diffuser the smaller of its two paths at the boundary: 'merged plumes'
   * (the merged path, when the plumes merge) or 'single-port plume'
   */
  path: 'jet' | 'merged plumes' | 'single-port plume';
  /** the trajectory the dilution was read from */
  trajectory: JetTrajectory;
}

/**
 * Centreline dilution at the mixing-zone boundary read from an already computed model (no integration): the jet's
 * path, or for a diffuser the smaller of the merged and the single-port dilution there (merging can only lower it).
 * @param model a 'jet' or 'diffuser' model from the buoyant-jet or diffuser-plume calc output
 * @param boundary distance [m] from the port (horizontal) or along the path
 * @throws InputError for a model without a jet path
 */
export function boundaryDilutionOfModel(model: EstimateModel, boundary: MixingZoneBoundary): ModelBoundaryDilution {
  if (model.kind === 'jet')
    return { ...dilutionAtBoundary(model.trajectory, boundary), path: 'jet', trajectory: model.trajectory };
  if (model.kind !== 'diffuser')
    throw new InputError(
      'model',
      model.kind,
      '',
      'a jet or diffuser model',
      `a ${model.kind} model has no plume path to read a mixing-zone dilution from`,
    );
  const d = model.diffuser;
  const merged = dilutionAtBoundary(d.merged, boundary),
    single = dilutionAtBoundary(d.isolated, boundary);
  return merged.dilutionCentreline <= single.dilutionCentreline
    ? { ...merged, path: d.merge ? 'merged plumes' : 'single-port plume', trajectory: d.merged }
    : { ...single, path: 'single-port plume', trajectory: d.isolated };
}
