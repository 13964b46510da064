import { InputError } from '../core/errors';
import { requireInRange } from '../core/range';
import type { MethodInfo, Scalar } from '../core/method';
import { note } from '../core/warning';

export const REQUIRED_DILUTION: MethodInfo = {
  id: 'required-dilution',
  title: 'Dilution required to meet a criterion',
  source:
    'Fischer, H.B., List, E.J., Koh, R.C.Y., Imberger, J., Brooks, N.H. (1979). Mixing in Inland and Coastal Waters. Academic Press, ' +
    '§9.1 (dilution S = (C₀ − C_a)/(C − C_a) of a tracer mixed with ambient water of concentration C_a); U.S. EPA (1991). ' +
    'Technical Support Document for Water Quality-based Toxics Control, EPA/505/2-90-001, §4.3 (mass balance at the mixing-zone edge).',
  equation: 'S_req = (C_e − C_a)/(C_c − C_a)',
  validity: {},
};

/** Whether the criterion is an upper limit (toxicant, temperature) or a lower limit (dissolved oxygen). */
export type LimitKind = 'maximum' | 'minimum';

/**
 * Dilution needed so that effluent of concentration C_e mixed with ambient C_a meets the criterion C_c:
 * S = (C_e − C_a)/(C_c − C_a) [1]. The limit is read as a maximum (toxicant, temperature rise) unless `limit`
 * says otherwise or the effluent lies below the criterion and the ambient above it (a minimum, e.g. dissolved oxygen). When the effluent already meets the
 * criterion the result is 1 with a note.
 * @param effluent, ambient, criterion [any unit, the same for all three]
 * @returns S_req [1] ≥ 1
 * @source Fischer et al. (1979) §9.1; U.S. EPA (1991) §4.3
 * @throws InputError when the ambient itself does not meet the criterion (no dilution can meet it)
 */
export function requiredDilution(effluent: number, ambient: number, criterion: number, limit?: LimitKind): Scalar {
  const ce = requireInRange('effluent', effluent, '', {});
  const ca = requireInRange('ambient', ambient, '', {});
  const cc = requireInRange('criterion', criterion, '', {});
  const kind: LimitKind = limit ?? (ce < cc && ca > cc ? 'minimum' : 'maximum');
  const sign = kind === 'maximum' ? 1 : -1;
  if (sign * (ce - cc) <= 0) {
    return {
      value: 1,
      unit: '1',
      method: REQUIRED_DILUTION.id,
      warnings: [note('criterion-met-undiluted', 'The effluent already meets the criterion before any dilution.')],
    };
  }
  if (sign * (cc - ca) <= 0) {
    const word = kind === 'maximum' ? 'at or above' : 'at or below';
    throw new InputError(
      'ambient',
      ca,
      '',
      `${kind === 'maximum' ? 'below' : 'above'} the criterion ${cc}`,
      `the ambient is already ${word} the criterion (${cc}): no dilution can meet it`,
    );
  }
  return { value: (ce - ca) / (cc - ca), unit: '1', method: REQUIRED_DILUTION.id, warnings: [] };
}
