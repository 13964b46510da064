import { qty } from '../core/quantity-text';
import type { EstimateModel } from '../calc/model';
import { formatShort, InputError } from '../core/errors';
import type { JetTrajectory } from '../jets/buoyant-jet';
import type { BoundaryDilution } from '../mixing-zone/boundary';
import { boundaryDilutionOfModel, type ModelBoundaryDilution } from '../jets/model-boundary';
import { complianceTable, type Constituent as RegulatedConstituent } from '../mixing-zone/compliance';
import { si, siOptional } from './context';
import type { ComplianceRow, EstimateOutcome } from './assess';
import type { Constituent, Estimate, Outfall, Site } from './schema';

/**
 * The verdict rule of every compliance row, in words for the calc sheet. The ±20 % band is a screening
 * allowance for model uncertainty (common practice, no source), not a value from a standard.
 */
export const VERDICT_RULE =
  'meets when the achieved dilution exceeds the required dilution by more than 20 %; does not meet when it falls ' +
  'short by more than 20 %; otherwise cannot tell (a ±20 % screening band for model uncertainty, a conventional ' +
  'allowance rather than a value from a standard). Margin = achieved ÷ required − 1.';

export type Zone = 'acute' | 'chronic';
const ZONES: readonly Zone[] = ['acute', 'chronic'];

/** The near-field method that gives an outfall's dilution: the merged-diffuser model for several ports. */
const nearFieldMethod = (o: Outfall) => (o.ports > 1 ? 'diffuser-plume' : 'buoyant-jet');

const outfallsWithConstituents = (site: Site) =>
  site.features.flatMap((f, index) =>
    f.kind === 'outfall' && f.constituents.length > 0 ? [{ f: f as Outfall, index }] : [],
  );

const conditionOf = (site: Site, e: Estimate) => e.condition ?? site.conditions[0]?.id;

/** The estimate of the site that gives an outfall's near-field dilution under a condition (the first one). */
function ownNearField(site: Site, o: Outfall, conditionId: string): Estimate | undefined {
  return site.estimates.find(
    (e) => e.method === nearFieldMethod(o) && e.feature === o.id && conditionOf(site, e) === conditionId,
  );
}

const nearFieldId = (site: Site, o: Outfall, conditionId: string) =>
  ownNearField(site, o, conditionId)?.id ?? `${o.id}-${conditionId}-near`;
const farFieldId = (o: Outfall, conditionId: string, zone: Zone) => `${o.id}-${conditionId}-far-${zone}`;

/**
 * The near-field estimates the compliance table needs and the site lacks: one per outfall with constituents
 * and condition, with the outfall's and condition's bound inputs only. They join the assessment's outcomes
 * (marked `added`), so every view shows the run behind a verdict.
 */
export function complianceEstimates(site: Site): Estimate[] {
  return outfallsWithConstituents(site).flatMap(({ f }) =>
    site.conditions
      .filter((c) => !ownNearField(site, f, c.id))
      .map((c): Estimate => ({
        id: nearFieldId(site, f, c.id),
        method: nearFieldMethod(f),
        feature: f.id,
        condition: c.id,
        title: `Near-field dilution of ${f.name} (${c.name}), for compliance`,
        params: {},
      })),
  );
}

/** The zone's boundary [m from the port] for an outfall, or undefined when the permit states no such zone. */
function zoneDistance(f: Outfall, index: number, zone: Zone): number | undefined {
  const at = `features[${index}].mixingZone`;
  if (zone === 'chronic') return si(`${at}.distance`, f.mixingZone.distance, 'm');
  const zid = f.mixingZone.zid;
  if (!zid) return undefined;
  if ('distance' in zid) return si(`${at}.zid.distance`, zid.distance, 'm');
  return zid.depthMultiple * si(`features[${index}].portDepth`, f.portDepth, 'm');
}

/** The governing path's dilution at the boundary, read from a computed jet or diffuser model (undefined for others). */
function governingPath(model: EstimateModel | undefined, edge: number): ModelBoundaryDilution | undefined {
  if (model?.kind !== 'jet' && model?.kind !== 'diffuser') return undefined;
  return boundaryDilutionOfModel(model, { distance: edge, measure: 'horizontal' });
}

/** Width of the wastefield where the near field ends [m]: the plume's diameter, plus the diffuser's length. */
function wastefieldWidth(model: EstimateModel, path: JetTrajectory): number {
  const r = path.path.radius[path.path.radius.length - 1];
  return 2 * r + (model.kind === 'diffuser' ? (model.diffuser.length ?? 0) : 0);
}

/**
 * The far-field runs the table needs: one per outfall, condition and zone whose boundary lies beyond the end
 * of the near field, when the condition has a current. Their inputs come from the near-field outcome.
 */
export function farFieldEstimates(site: Site, outcomes: readonly EstimateOutcome[]): Estimate[] {
  const out: Estimate[] = [];
  for (const { f, index } of outfallsWithConstituents(site)) {
    site.conditions.forEach((c, ci) => {
      const near = outcomes.find((o) => o.id === nearFieldId(site, f, c.id));
      if (!near || near.status !== 'ok' || !near.model) return;
      let current: number | undefined;
      try {
        current = siOptional(`conditions[${ci}].current`, c.current, 'm/s');
      } catch {
        return; // the near-field estimate reports the bad current
      }
      if (!current) return;
      for (const zone of ZONES) {
        if (!f.constituents.some((k) => k[zone] !== undefined)) continue;
        const edge = zoneDistance(f, index, zone);
        const g = edge === undefined ? undefined : governingPath(near.model, edge);
        if (edge === undefined || !g) continue;
        const x = g.trajectory.path.horizontalDistance;
        const beyond = edge - x[x.length - 1];
        if (beyond <= 0 || g.reached) continue;
        out.push({
          id: farFieldId(f, c.id, zone),
          method: 'far-field',
          feature: f.id,
          condition: c.id,
          title: `Far-field dilution of ${f.name} (${c.name}) to the ${zone === 'acute' ? 'zone of initial dilution' : 'mixing-zone boundary'}`,
          params: { width: wastefieldWidth(near.model, g.trajectory), current, distance: beyond },
        });
      }
    });
  }
  return out;
}

/** A constituent's concentrations in the row's unit; a linked row reads the outfall's effluent field. */
function concentrations(f: Outfall, index: number, c: Constituent): { effluent: number; ambient: number } {
  if (c.of === 'temperature')
    return {
      effluent: si(`features[${index}].effluent.temperature`, f.effluent.temperature, 'degC'),
      ambient: c.ambient,
    };
  if (c.of === 'salinity')
    return {
      effluent: siOptional(`features[${index}].effluent.salinity`, f.effluent.salinity, 'PSU') ?? 0,
      ambient: c.ambient,
    };
  return { effluent: c.effluent ?? NaN, ambient: c.ambient };
}

/** The constituent rows of an outfall for the required-dilution method and the table (Ce, Ca, Cc). */
export function regulated(f: Outfall, index: number, zone: Zone): RegulatedConstituent[] {
  return f.constituents.flatMap((c) => {
    const criterion = c[zone];
    return criterion === undefined ? [] : [{ name: c.name, unit: c.unit, ...concentrations(f, index, c), criterion }];
  });
}

/**
 * Mixing-zone compliance of every outfall with constituents, under every ambient condition and for each zone
 * a criterion applies to (acute: zone of initial dilution; chronic: mixing-zone boundary), read from the
 * assessment's own outcomes: the near-field estimate the user sees (or the one the assessment added) gives the
 * centreline dilution at the boundary, measured horizontally from the port; where the near field ends before
 * the boundary, the far-field run multiplies it. Each row marks whether its condition governs (the smallest
 * margin for that outfall, constituent and zone). An estimate that did not compute gives 'cannot tell'.
 */
export function siteCompliance(site: Site, outcomes: readonly EstimateOutcome[]): ComplianceRow[] {
  const rows: ComplianceRow[] = [];
  for (const { f, index } of outfallsWithConstituents(site)) {
    for (const zone of ZONES) {
      let constituents: RegulatedConstituent[], edge: number | undefined;
      try {
        constituents = regulated(f, index, zone);
        edge = constituents.length ? zoneDistance(f, index, zone) : undefined;
      } catch (e) {
        if (!(e instanceof InputError)) throw e;
        rows.push(...site.conditions.flatMap((c) => cannotTell(f, c.name, zone, f.constituents, e.message)));
        continue;
      }
      if (!constituents.length) continue;
      if (edge === undefined) {
        const why = 'an acute criterion is given but the outfall states no zone of initial dilution';
        rows.push(...site.conditions.flatMap((c) => cannotTell(f, c.name, zone, f.constituents, why)));
        continue;
      }
      const zoneRows = site.conditions.flatMap((c) => zoneRowsFor(site, outcomes, f, c.id, zone, edge!, constituents));
      markGoverning(zoneRows);
      rows.push(...zoneRows);
    }
  }
  return rows;
}

function cannotTell(
  f: Outfall,
  condition: string,
  zone: Zone,
  list: readonly { name: string; unit: string }[],
  note: string,
) {
  return list.map((c): ComplianceRow => ({
    feature: f.name,
    condition,
    constituent: c.name,
    unit: c.unit,
    zone,
    boundary: null,
    effluent: null,
    ambient: null,
    criterion: null,
    requiredDilution: null,
    nearFieldDilution: null,
    farFieldFactor: null,
    achievedDilution: null,
    margin: null,
    verdict: 'cannot tell',
    note,
    models: '',
    governing: false,
  }));
}

function zoneRowsFor(
  site: Site,
  outcomes: readonly EstimateOutcome[],
  f: Outfall,
  conditionId: string,
  zone: Zone,
  edge: number,
  constituents: RegulatedConstituent[],
): ComplianceRow[] {
  const condition = site.conditions.find((c) => c.id === conditionId)!;
  const id = nearFieldId(site, f, conditionId);
  const near = outcomes.find((o) => o.id === id);
  const fail = (why: string) =>
    cannotTell(f, condition.name, zone, constituents, why).map((r) => ({ ...r, boundary: edge, estimate: id }));
  if (!near || near.status === 'error')
    return fail(`the near-field estimate “${near?.title ?? id}” did not compute: ${near?.error ?? 'missing'}`);
  const g = governingPath(near.model, edge);
  if (!g) return fail(`the estimate “${near.title}” holds no near-field path`);
  const atEdge: BoundaryDilution = g;
  const far = outcomes.find((o) => o.id === farFieldId(f, conditionId, zone));
  const factor =
    far?.status === 'ok' && typeof far.results.dilution?.value === 'number' ? far.results.dilution.value : undefined;
  const xEnd = g.trajectory.path.horizontalDistance[g.trajectory.path.horizontalDistance.length - 1];
  const farNote =
    factor === undefined
      ? ''
      : `the near field ends (${g.trajectory.outcome}) ${qty(xEnd, 'm', 4)} from the port; the far field (4/3-law) ` +
        `from there to the boundary multiplies its dilution by ${formatShort(factor)}`;
  const dilution: BoundaryDilution =
    factor === undefined
      ? atEdge
      : { ...atEdge, dilutionCentreline: atEdge.dilutionCentreline * factor, reached: true, note: farNote };
  const nearName = `${near.method} (${id}${near.model?.kind === 'diffuser' ? `, ${g.path}` : ''})`;
  const models = factor === undefined ? nearName : `${nearName} × far-field (${far!.id})`;
  const noCurrent =
    !atEdge.reached && !condition.current ? '; no ambient current is given, so the far field is not computed' : '';
  const extrapolated = [near, ...(factor === undefined ? [] : [far!])].flatMap((o) =>
    o.warnings.filter((w) => w.severity === 'outside-validity').map((w) => `${o.title}: ${w.message}`),
  );
  // the far field only adds dilution: a near field that meets on its own meets with the band (see VERDICT_RULE)
  const nearAlone = (req: number | undefined) => req !== undefined && atEdge.dilutionCentreline >= req * (1 + BAND);
  const partial = near.status === 'incomplete' ? `the near-field run is incomplete (${near.incomplete}); ` : '';
  const table = complianceTable([{ name: condition.name, dilution }], constituents);
  return table.rows.map((r, k): ComplianceRow => ({
    feature: f.name,
    condition: condition.name,
    constituent: r.constituent,
    unit: r.unit,
    zone,
    boundary: edge,
    effluent: constituents[k].effluent,
    ambient: constituents[k].ambient,
    criterion: constituents[k].criterion,
    requiredDilution: r.requiredDilution ?? null,
    nearFieldDilution: atEdge.dilutionCentreline,
    farFieldFactor: factor ?? null,
    achievedDilution: r.achievedDilution,
    margin: r.margin ?? null,
    verdict: verdictOf(r.verdict, near.status === 'incomplete', extrapolated.length > 0, nearAlone(r.requiredDilution)),
    note:
      partial +
      r.note +
      noCurrent +
      (extrapolated.length ? `; outside the validity of a method it relies on — ${extrapolated.join('; ')}` : ''),
    models,
    estimate: id,
    ...(factor !== undefined ? { farFieldEstimate: far!.id } : {}),
    governing: false,
  }));
}

/** The band of the verdict rule (VERDICT_RULE). */
const BAND = 0.2;

/**
 * A row's verdict: an incomplete near-field run cannot tell; "meets" that rests on an extrapolated run
 * (outside a method's validity) cannot tell either, unless the near field meets on its own.
 */
function verdictOf(table: ComplianceRow['verdict'], incomplete: boolean, extrapolated: boolean, nearAlone: boolean) {
  if (incomplete) return 'cannot tell';
  if (table === 'meets' && extrapolated && !nearAlone) return 'cannot tell';
  return table;
}

/** Marks, per constituent, the condition with the smallest margin (the tightest) as governing. */
function markGoverning(rows: ComplianceRow[]): void {
  for (const name of new Set(rows.map((r) => r.constituent))) {
    const scored = rows.filter((r) => r.constituent === name && r.margin !== null);
    if (!scored.length) continue;
    scored.reduce((a, b) => (b.margin! < a.margin! ? b : a)).governing = true;
  }
}

/**
 * The near-field run's "dilution along the path" chart with the required dilution of each zone it feeds as a
 * flat line, so the crossing can be seen (in the workspace and the report alike).
 */
export function withRequiredDilution(o: EstimateOutcome, rows: readonly ComplianceRow[]): EstimateOutcome {
  const lines = new Map<string, number>();
  for (const r of rows)
    if (r.estimate === o.id && r.requiredDilution !== null)
      lines.set(`Required, ${r.constituent} (${r.zone})`, r.requiredDilution);
  if (!lines.size) return o;
  const series = o.series.map((s) =>
    s.kind !== 'dilution-along-path'
      ? s
      : {
          ...s,
          y: [
            ...s.y,
            ...[...lines].map(([label, value]) => ({ label, unit: '1', values: s.x.values.map(() => value) })),
          ],
        },
  );
  return { ...o, series };
}
