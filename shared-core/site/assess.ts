import { findCalcMethod } from '../calc/registry';
import { resolveArgs, runCalc, type RawArg } from '../calc/resolve';
import type { EstimateModel } from '../calc/model';
import type { CalcMethod, ResultValue, Series } from '../calc/types';
import { ComputationError, InputError } from '../core/errors';
import { SCREENING_CAUTION } from '../core/caution';
import { uniqueWarnings, type Warning } from '../core/warning';
import { ProfileError } from '../profile/profile';
import { boundArgs } from './bindings';
import { namesAsWords, siteMessage } from './words';
import { makeContext, ProfileCache, type EstimateContext } from './context';
import type { Estimate, Site } from './schema';
import { complianceEstimates, farFieldEstimates, siteCompliance, withRequiredDilution } from './compliance';
import { assessConditions, type ConditionOutcome } from './conditions';
import { siteGeometryChecks } from './checks';
import { bandsFromTyped, MONTE_CARLO_JCGM101, type UncertaintyResult } from '../uncertainty';

/** Where an input of an estimate came from. */
export type InputOrigin = 'typed' | 'site' | 'default';

/**
 * The outcome of one estimate: what every view (cards, section, detail charts, compliance, report,
 * CSV/XLSX, bands) reads. `ok`: computed; `incomplete`: the computation stopped early (an integration at its
 * step limit or on a failed step), results are partial; `error`: not computed, `error` says why.
 */
export interface EstimateOutcome {
  id: string;
  method: string;
  title: string;
  feature?: { id: string; name: string; kind: string };
  condition?: { id: string; name: string };
  status: 'ok' | 'incomplete' | 'error';
  /** the arguments the method ran with, in SI */
  inputs: Record<string, ResultValue>;
  /** where each input came from: typed on the estimate, taken from the site (feature, condition, profile), or the method's default */
  origins: Record<string, InputOrigin>;
  results: Record<string, ResultValue>;
  warnings: Warning[];
  sources: string[];
  /** curves for charts, when the method provides them */
  series: Series[];
  /** the typed model result (a jet's path, a release's withdrawal zones…), when the method has one */
  model?: EstimateModel;
  /** why the estimate could not be computed (status 'error') */
  error?: string;
  /** why the computation stopped early (status 'incomplete') */
  incomplete?: string;
  /** uncertainty bands of the results, when the estimate states input uncertainties */
  uncertainty?: UncertaintyResult;
  /** added by the assessment (not in the site file): the near-field run a compliance row needs */
  added?: boolean;
}

/**
 * One row of the mixing-zone compliance table: a constituent of an outfall under one condition, for one zone
 * (acute criteria at the zone of initial dilution, chronic at the mixing-zone boundary). Concentrations are
 * in the row's unit; dilutions are centreline values at the zone's boundary.
 */
export interface ComplianceRow {
  feature: string;
  condition: string;
  constituent: string;
  unit: string;
  zone: 'acute' | 'chronic';
  /** the zone's boundary as a horizontal distance from the port [m] */
  boundary: number | null;
  /** Ce, Ca and Cc: effluent, ambient and criterion concentrations */
  effluent: number | null;
  ambient: number | null;
  criterion: number | null;
  /** dilution needed to meet the criterion, S = (Ce − Ca)/(Cc − Ca) */
  requiredDilution: number | null;
  /** the near-field model's dilution at the boundary (or at the end of the near field, when it ends first) */
  nearFieldDilution: number | null;
  /** the far-field factor from the end of the near field to the boundary, when the boundary lies beyond it */
  farFieldFactor: number | null;
  /** near-field dilution × far-field factor */
  achievedDilution: number | null;
  /** achieved / required − 1 (positive: meets with that margin) */
  margin: number | null;
  verdict: 'meets' | 'does not meet' | 'cannot tell';
  note: string;
  /** the models and runs that gave the achieved dilution, in words */
  models: string;
  /** the id of the near-field estimate whose outcome gave the dilution, and of the far-field one */
  estimate?: string;
  farFieldEstimate?: string;
  /** this condition is the tightest (smallest margin) for the outfall, constituent and zone */
  governing: boolean;
}

export interface Assessment {
  format: 'gprime-assessment';
  project: Site['project'];
  waterBody: string;
  gprimeVersion: string;
  /** SHA-256 of the site file's bytes, computed by the caller */
  siteHash: string;
  units: Site['units'];
  caution: string;
  /** how each condition's profile reads */
  conditions: ConditionOutcome[];
  /** checks of the site as a whole (a port below the bed or above the surface, a profile below the bed) */
  checks: Warning[];
  estimates: EstimateOutcome[];
  /** mixing-zone compliance per outfall, condition and constituent */
  compliance: ComplianceRow[];
}

function describeInputs(
  method: CalcMethod,
  args: Record<string, unknown>,
  conditionName?: string,
): Record<string, ResultValue> {
  const out: Record<string, ResultValue> = {};
  for (const spec of method.params) {
    const v = args[spec.name];
    if (v === undefined) continue;
    if (spec.kind === 'number') out[spec.name] = { value: v as number, unit: spec.unit };
    else if (spec.kind === 'profile')
      out[spec.name] = { value: `measured profile${conditionName ? ` of “${conditionName}”` : ''}`, unit: '' };
    else out[spec.name] = { value: String(v), unit: '' };
  }
  return out;
}

/** `bands: false` skips the Monte Carlo bands (the live workspace computes them apart, off the main thread). */
export interface AssessOptions {
  bands?: boolean;
  /** told how many Monte Carlo draws of a band are done (the workspace shows progress) */
  bandProgress?: (done: number, total: number) => void;
}

/** The message of an error raised inside one estimate; an unexpected one is named as an internal error. */
function failureMessage(err: unknown, method: string): string {
  if (err instanceof InputError || err instanceof ProfileError) return err.message;
  if (err instanceof ComputationError) return `${method} could not compute a result: ${err.message}`;
  const text = err instanceof Error ? err.message : String(err);
  return `internal error in ${method} (please report it): ${text}`;
}

/** The bound and typed arguments of an estimate, before defaults and range checks. */
export function estimateArgs(method: CalcMethod, ctx: EstimateContext, e: Estimate): Record<string, RawArg> {
  const known = new Set(method.params.map((p) => p.name));
  const bound = Object.fromEntries(Object.entries(boundArgs(method.id, ctx, e)).filter(([k]) => known.has(k)));
  return { ...bound, ...e.params } as Record<string, RawArg>;
}

/** Where an estimate's condition profile failed: the condition named, then the reader's message. */
function conditionFailure(site: Site, conditionId: string | undefined, err: unknown): string {
  const i = conditionId ? site.conditions.findIndex((c) => c.id === conditionId) : 0;
  const c = site.conditions[i];
  const message = err instanceof Error ? err.message : String(err);
  return c ? `conditions[${i}] (“${c.name}”) profile: ${message}` : message;
}

/**
 * Runs one estimate of a site. Never throws: a bad input, a profile that cannot be read or a failure
 * inside the method marks this estimate only ('error', with the reason naming the site field).
 */
export function runEstimate(
  site: Site,
  e: Estimate,
  index: number,
  options: AssessOptions = {},
  cache = new ProfileCache(),
): EstimateOutcome {
  const method = findCalcMethod(e.method);
  const base = {
    id: e.id,
    method: e.method,
    title: e.title ?? method?.title ?? e.method,
    inputs: {},
    origins: {},
    results: {},
    warnings: [] as Warning[],
    sources: [] as string[],
    series: [] as Series[],
  };
  // as makeContext: an estimate without a condition sees the first one
  const condition = e.condition ? site.conditions.find((c) => c.id === e.condition) : site.conditions[0];
  const found = site.features.find((f) => f.id === e.feature);
  const where = {
    ...(found ? { feature: { id: found.id, name: found.name, kind: found.kind } } : {}),
    ...(condition ? { condition: { id: condition.id, name: condition.name } } : {}),
  };
  const fail = (error: string): EstimateOutcome => ({
    ...base,
    ...where,
    status: 'error',
    error: siteMessage(error, site, e.method),
  });
  if (!method) return fail(`estimates[${index}].method: "${e.method}" is not a gprime method (see gprime calc --list)`);
  if (e.feature && !found) return fail(`estimates[${index}].feature: no feature with id "${e.feature}"`);
  if (e.condition && !condition) return fail(`estimates[${index}].condition: no condition with id "${e.condition}"`);
  let ctx: EstimateContext;
  try {
    ctx = makeContext(site, e.condition, e.feature, cache);
  } catch (err) {
    return fail(conditionFailure(site, e.condition, err));
  }
  try {
    const raw = estimateArgs(method, ctx, e);
    const out = runCalc(method, raw);
    const inputs = describeInputs(method, resolveArgs(method, raw), ctx.condition?.name);
    const origins = Object.fromEntries(
      Object.keys(inputs).map((k): [string, InputOrigin] => [
        k,
        k in e.params ? 'typed' : raw[k] !== undefined ? 'site' : 'default',
      ]),
    );
    // warnings name parameters in words ("the longest path followed", not max_path_length)
    const worded = (w: Warning): Warning => ({ ...w, message: namesAsWords(w.message, method.id) });
    const warnings = uniqueWarnings([...(ctx.profile?.warnings ?? []), ...out.warnings]).map(worded);
    const wantsBand = options.bands !== false && e.uncertainty && Object.keys(e.uncertainty).length > 0;
    const band = wantsBand
      ? bandsFromTyped(method, raw, e.uncertainty!, { progress: options.bandProgress })
      : undefined;
    const uncertainty = band && { ...band, warnings: band.warnings.map(worded) };
    return {
      ...base,
      ...where,
      status: out.incomplete ? 'incomplete' : 'ok',
      ...(out.incomplete ? { incomplete: namesAsWords(out.incomplete, method.id) } : {}),
      inputs,
      origins,
      results: out.results,
      warnings,
      sources: uncertainty ? [...out.sources, MONTE_CARLO_JCGM101.source] : out.sources,
      series: out.series ?? [],
      ...(out.model ? { model: out.model } : {}),
      ...(uncertainty ? { uncertainty } : {}),
    };
  } catch (err) {
    return fail(failureMessage(err, method.title));
  }
}

/** The estimates of a site plus the near-field runs its compliance table needs and the site lacks. */
export function assessedEstimates(site: Site): { estimate: Estimate; index: number; added: boolean }[] {
  const own = site.estimates.map((estimate, index) => ({ estimate, index, added: false }));
  const extra = complianceEstimates(site).map((estimate, k) => ({
    estimate,
    index: site.estimates.length + k,
    added: true,
  }));
  return [...own, ...extra];
}

/** Evaluates every estimate of a site. Deterministic: the same site gives the same numbers. */
export function assessSite(
  site: Site,
  meta: { gprimeVersion: string; siteHash: string },
  options: AssessOptions = {},
  cache = new ProfileCache(),
  run: (e: Estimate, index: number) => EstimateOutcome = (e, index) => runEstimate(site, e, index, options, cache),
): Assessment {
  const mark = (o: EstimateOutcome, added: boolean) => (added ? { ...o, added: true } : o);
  const first = assessedEstimates(site).map(({ estimate, index, added }) => mark(run(estimate, index), added));
  const start = first.length;
  const far = farFieldEstimates(site, first).map((e, k) => mark(run(e, start + k), true));
  const computed = [...first, ...far];
  const compliance = siteCompliance(site, computed);
  const estimates = computed.map((o) => withRequiredDilution(o, compliance));
  const conditions = assessConditions(site, cache);
  return {
    format: 'gprime-assessment',
    project: site.project,
    waterBody: site.waterBody.name,
    gprimeVersion: meta.gprimeVersion,
    siteHash: meta.siteHash,
    units: site.units,
    caution: SCREENING_CAUTION,
    conditions,
    // worded here, so that the workspace, the CLI and the report read the same sentence
    checks: siteGeometryChecks(
      site,
      conditions.map((c) => c.deepest),
    ).map((w) => ({ ...w, message: siteMessage(w.message, site) })),
    estimates,
    compliance,
  };
}
