import { findCalcMethod } from '../calc/registry';
import { resolveArgs } from '../calc/resolve';
import { InputError } from '../core/errors';
import { ProfileError } from '../profile/profile';
import { buoyantJetTrajectory } from '../jets/buoyant-jet';
import { buoyantJetInputFromArgs, diffuserInputFromArgs } from '../jets/calc';
import { diffuserPlume } from '../jets/diffuser';
import { dilutionAtBoundary, type BoundaryDilution, type MixingZoneBoundary } from '../mixing-zone/boundary';
import { complianceTable } from '../mixing-zone/compliance';
import { boundArgs } from './bindings';
import { makeContext, si } from './context';
import type { ComplianceRow } from './assess';
import type { Site } from './schema';

/**
 * Mixing-zone compliance of every outfall with constituents, under every ambient condition: the buoyant-jet
 * model (feature + condition bindings) gives the centreline dilution at the mixing-zone boundary, measured
 * horizontally from the port; complianceTable() compares it with each constituent's required dilution.
 * An outfall with several ports uses the merged-diffuser model (diffuser-plume): the smaller of the merged and the
 * single-port dilutions at the boundary; without a port spacing it cannot tell.
 * A condition the model cannot run for gives 'cannot tell' rows with the reason.
 */
export function siteCompliance(site: Site): ComplianceRow[] {
  const method = findCalcMethod('buoyant-jet'),
    diffuser = findCalcMethod('diffuser-plume');
  if (!method || !diffuser) return [];
  const rows: ComplianceRow[] = [];
  site.features.forEach((feature, index) => {
    if (feature.kind !== 'outfall' || feature.constituents.length === 0) return;
    for (const condition of site.conditions) {
      const base = { feature: feature.name, condition: condition.name };
      try {
        const ctx = makeContext(site, condition.id, feature.id);
        const distance = si(`features[${index}].mixingZone.distance`, feature.mixingZone.distance, 'm');
        const edge: MixingZoneBoundary = { distance, measure: 'horizontal' };
        let boundary: BoundaryDilution;
        let model = '';
        if (feature.ports > 1) {
          const d = diffuserPlume(diffuserInputFromArgs(resolveArgs(diffuser, boundArgs(diffuser.id, ctx))));
          const [a, b] = [dilutionAtBoundary(d.merged, edge), dilutionAtBoundary(d.isolated, edge)];
          boundary = a.dilutionCentreline <= b.dilutionCentreline ? a : b;
          model = `${feature.ports} ports, ${boundary === a && d.merge ? 'merged plumes' : 'single-port plume'} (the smaller dilution); `;
        } else {
          boundary = dilutionAtBoundary(
            buoyantJetTrajectory(buoyantJetInputFromArgs(resolveArgs(method, boundArgs(method.id, ctx)))),
            edge,
          );
        }
        const table = complianceTable([{ name: condition.name, dilution: boundary }], feature.constituents);
        for (const r of table.rows) {
          rows.push({
            ...base,
            constituent: r.constituent,
            unit: r.unit,
            requiredDilution: r.requiredDilution ?? null,
            achievedDilution: r.achievedDilution,
            margin: r.margin ?? null,
            verdict: r.verdict,
            note: model + r.note,
          });
        }
      } catch (e) {
        if (!(e instanceof InputError || e instanceof ProfileError)) throw e;
        for (const c of feature.constituents) {
          rows.push({
            ...base,
            constituent: c.name,
            unit: c.unit,
            requiredDilution: null,
            achievedDilution: null,
            margin: null,
            verdict: 'cannot tell',
            note: e.message,
          });
        }
      }
    }
  });
  return rows;
}
