import type { EstimateModel } from '../calc/model';
import { InputError } from '../core/errors';
import { dilutionAtBoundary, type BoundaryDilution, type MixingZoneBoundary } from '../mixing-zone/boundary';
import { complianceTable } from '../mixing-zone/compliance';
import { si } from './context';
import type { ComplianceRow, EstimateOutcome } from './assess';
import type { Estimate, Outfall, Site } from './schema';

/** The near-field method that gives an outfall's dilution: the merged-diffuser model for several ports. */
const nearFieldMethod = (o: Outfall) => (o.ports > 1 ? 'diffuser-plume' : 'buoyant-jet');

const outfallsWithConstituents = (site: Site) =>
  site.features.flatMap((f, index) => (f.kind === 'outfall' && f.constituents.length > 0 ? [{ f, index }] : []));

/** The estimate of the site that gives an outfall's near-field dilution under a condition (the first one). */
function ownNearField(site: Site, o: Outfall, conditionId: string): Estimate | undefined {
  const first = site.conditions[0]?.id;
  return site.estimates.find(
    (e) => e.method === nearFieldMethod(o) && e.feature === o.id && (e.condition ?? first) === conditionId,
  );
}

/**
 * The near-field estimates the compliance table needs and the site lacks: one per outfall with constituents
 * and condition, with the outfall's and condition's bound inputs only. They are part of the assessment's
 * outcomes (marked `added`), so every view shows the run behind a verdict.
 */
export function complianceEstimates(site: Site): Estimate[] {
  const out: Estimate[] = [];
  for (const { f } of outfallsWithConstituents(site)) {
    if (f.kind !== 'outfall') continue;
    for (const c of site.conditions) {
      if (ownNearField(site, f, c.id)) continue;
      out.push({
        id: `${f.id}--${c.id}--near-field`,
        method: nearFieldMethod(f),
        feature: f.id,
        condition: c.id,
        title: `Near-field dilution of ${f.name} (${c.name}), for compliance`,
        params: {},
      } as Estimate);
    }
  }
  return out;
}

/** The centreline dilution at the boundary from a computed jet or diffuser model, and which run gave it. */
function boundaryDilution(
  model: EstimateModel | undefined,
  edge: MixingZoneBoundary,
  ports: number,
): { at: BoundaryDilution; model: string } | undefined {
  if (model?.kind === 'jet') return { at: dilutionAtBoundary(model.trajectory, edge), model: '' };
  if (model?.kind !== 'diffuser') return undefined;
  const d = model.diffuser;
  const [merged, single] = [dilutionAtBoundary(d.merged, edge), dilutionAtBoundary(d.isolated, edge)];
  const useMerged = merged.dilutionCentreline <= single.dilutionCentreline;
  const which = useMerged && d.merge ? 'merged plumes' : 'single-port plume';
  return {
    at: useMerged ? merged : single,
    model: `${ports} ports, ${which} (the smaller dilution); `,
  };
}

/**
 * Mixing-zone compliance of every outfall with constituents, under every ambient condition, read from the
 * assessment's own near-field outcomes (the estimate the user sees, with its own parameters, or the one the
 * assessment added): the centreline dilution at the mixing-zone boundary, measured horizontally from the port,
 * against each constituent's required dilution (complianceTable). An estimate that did not compute gives
 * 'cannot tell' rows with its reason.
 */
export function siteCompliance(site: Site, outcomes: readonly EstimateOutcome[]): ComplianceRow[] {
  const rows: ComplianceRow[] = [];
  for (const { f, index } of outfallsWithConstituents(site)) {
    if (f.kind !== 'outfall') continue;
    for (const condition of site.conditions) {
      const base = { feature: f.name, condition: condition.name };
      const estimate = ownNearField(site, f, condition.id)?.id ?? `${f.id}--${condition.id}--near-field`;
      const outcome = outcomes.find((o) => o.id === estimate);
      const cannotTell = (note: string) =>
        f.constituents.map((c) => ({
          ...base,
          constituent: c.name,
          unit: c.unit,
          requiredDilution: null,
          achievedDilution: null,
          margin: null,
          verdict: 'cannot tell' as const,
          note,
          estimate,
        }));
      if (!outcome || outcome.status === 'error') {
        rows.push(...cannotTell(`the near-field estimate ${estimate} did not compute: ${outcome?.error ?? 'missing'}`));
        continue;
      }
      try {
        const distance = si(`features[${index}].mixingZone.distance`, f.mixingZone.distance, 'm');
        const found = boundaryDilution(outcome.model, { distance, measure: 'horizontal' }, f.ports);
        if (!found) {
          rows.push(...cannotTell(`the estimate ${estimate} holds no near-field path`));
          continue;
        }
        const partial =
          outcome.status === 'incomplete' ? `the near-field run is incomplete (${outcome.incomplete}); ` : '';
        const table = complianceTable([{ name: condition.name, dilution: found.at }], f.constituents);
        for (const r of table.rows) {
          rows.push({
            ...base,
            constituent: r.constituent,
            unit: r.unit,
            requiredDilution: r.requiredDilution ?? null,
            achievedDilution: r.achievedDilution,
            margin: r.margin ?? null,
            verdict: outcome.status === 'incomplete' ? 'cannot tell' : r.verdict,
            note: partial + found.model + r.note,
            estimate,
          });
        }
      } catch (e) {
        if (!(e instanceof InputError)) throw e;
        rows.push(...cannotTell(e.message));
      }
    }
  }
  return rows;
}
