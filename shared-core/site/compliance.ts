import { findCalcMethod } from '../calc/registry';
import { resolveArgs } from '../calc/resolve';
import { InputError } from '../core/errors';
import { ProfileError } from '../profile/profile';
import { buoyantJetTrajectory } from '../jets/buoyant-jet';
import { buoyantJetInputFromArgs } from '../jets/calc';
import { dilutionAtBoundary } from '../mixing-zone/boundary';
import { complianceTable } from '../mixing-zone/compliance';
import { boundArgs } from './bindings';
import { makeContext, si } from './context';
import type { ComplianceRow } from './assess';
import type { Site } from './schema';

/**
 * Mixing-zone compliance of every outfall with constituents, under every ambient condition: the buoyant-jet
 * model (feature + condition bindings) gives the centreline dilution at the mixing-zone boundary, measured
 * horizontally from the port; complianceTable() compares it with each constituent's required dilution.
 * A condition the model cannot run for gives 'cannot tell' rows with the reason.
 */
export function siteCompliance(site: Site): ComplianceRow[] {
  const method = findCalcMethod('buoyant-jet');
  if (!method) return [];
  const rows: ComplianceRow[] = [];
  site.features.forEach((feature, index) => {
    if (feature.kind !== 'outfall' || feature.constituents.length === 0) return;
    for (const condition of site.conditions) {
      const base = { feature: feature.name, condition: condition.name };
      try {
        const ctx = makeContext(site, condition.id, feature.id);
        const t = buoyantJetTrajectory(buoyantJetInputFromArgs(resolveArgs(method, boundArgs(method.id, ctx))));
        const distance = si(`features[${index}].mixingZone.distance`, feature.mixingZone.distance, 'm');
        const boundary = dilutionAtBoundary(t, { distance, measure: 'horizontal' });
        const table = complianceTable([{ name: condition.name, dilution: boundary }], feature.constituents);
        for (const r of table.rows) {
          rows.push({
            ...base, constituent: r.constituent, unit: r.unit, requiredDilution: r.requiredDilution ?? null,
            achievedDilution: r.achievedDilution, margin: r.margin ?? null, verdict: r.verdict, note: r.note,
          });
        }
      } catch (e) {
        if (!(e instanceof InputError || e instanceof ProfileError)) throw e;
        for (const c of feature.constituents) {
          rows.push({ ...base, constituent: c.name, unit: c.unit, requiredDilution: null, achievedDilution: null, margin: null, verdict: 'cannot tell', note: e.message });
        }
      }
    }
  });
  return rows;
}
