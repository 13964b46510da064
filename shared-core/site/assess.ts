import { findCalcMethod } from '../calc/registry';
import { resolveArgs, runCalc, type RawArg } from '../calc/resolve';
import type { CalcMethod, ResultValue, Series } from '../calc/types';
import { InputError } from '../core/errors';
import { SCREENING_CAUTION } from '../core/caution';
import { ProfileError } from '../profile/profile';
import { boundArgs } from './bindings';
import { makeContext } from './context';
import type { Estimate, Site } from './schema';
import { siteCompliance } from './compliance';
import { bandsFromTyped, MONTE_CARLO_JCGM101, type UncertaintyResult } from '../uncertainty';

export interface EstimateOutcome {
  id: string;
  method: string;
  title: string;
  feature?: { id: string; name: string; kind: string };
  condition?: { id: string; name: string };
  status: 'ok' | 'error';
  /** the arguments the method ran with, in SI */
  inputs: Record<string, ResultValue>;
  results: Record<string, ResultValue>;
  warnings: string[];
  sources: string[];
  /** curves for charts, when the method provides them */
  series: Series[];
  /** why the estimate could not be computed (status 'error') */
  error?: string;
  /** uncertainty bands of the results, when the estimate states input uncertainties */
  uncertainty?: UncertaintyResult;
}

/** One row of the mixing-zone compliance table: a constituent of an outfall under one condition. */
export interface ComplianceRow {
  feature: string;
  condition: string;
  constituent: string;
  unit: string;
  /** dilution needed to meet the criterion at the mixing-zone boundary, S = (Ce − Ca)/(Cc − Ca) */
  requiredDilution: number | null;
  /** dilution the near-field model gives at the mixing-zone boundary */
  achievedDilution: number | null;
  /** achieved / required − 1 (positive: meets with that margin) */
  margin: number | null;
  verdict: 'meets' | 'does not meet' | 'cannot tell';
  note: string;
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

/** Runs one estimate of a site; a bad input gives status 'error' with the reason, never an exception. */
/** `bands: false` skips the Monte Carlo bands (the live workspace computes them apart, off the main thread). */
export interface AssessOptions {
  bands?: boolean;
}

export function runEstimate(site: Site, e: Estimate, index: number, options: AssessOptions = {}): EstimateOutcome {
  const method = findCalcMethod(e.method);
  const base = {
    id: e.id,
    method: e.method,
    title: e.title ?? method?.title ?? e.method,
    inputs: {},
    results: {},
    warnings: [] as string[],
    sources: [] as string[],
    series: [] as Series[],
  };
  const ctx = makeContext(site, e.condition, e.feature);
  const feature = ctx.feature && { id: ctx.feature.id, name: ctx.feature.name, kind: ctx.feature.kind };
  const condition = ctx.condition && { id: ctx.condition.id, name: ctx.condition.name };
  const fail = (error: string): EstimateOutcome => ({ ...base, feature, condition, status: 'error', error });
  if (!method) return fail(`estimates[${index}].method: "${e.method}" is not a gprime method (see gprime calc --list)`);
  if (e.feature && !ctx.feature) return fail(`estimates[${index}].feature: no feature with id "${e.feature}"`);
  if (e.condition && !ctx.condition)
    return fail(`estimates[${index}].condition: no condition with id "${e.condition}"`);
  try {
    const known = new Set(method.params.map((p) => p.name));
    const bound = Object.fromEntries(Object.entries(boundArgs(method.id, ctx)).filter(([k]) => known.has(k)));
    const raw: Record<string, RawArg> = { ...bound, ...e.params };
    const out = runCalc(method, raw);
    const inputs = describeInputs(method, resolveArgs(method, raw), ctx.condition?.name);
    const warnings = [...(ctx.profile?.warnings ?? []), ...out.warnings];
    const wantsBand = options.bands !== false && e.uncertainty && Object.keys(e.uncertainty).length > 0;
    const uncertainty = wantsBand ? bandsFromTyped(method, raw, e.uncertainty!) : undefined;
    return {
      ...base,
      feature,
      condition,
      status: 'ok',
      inputs,
      results: out.results,
      warnings: [...new Set(warnings)],
      sources: out.sources,
      series: out.series ?? [],
      ...(uncertainty ? { uncertainty, sources: [...out.sources, MONTE_CARLO_JCGM101.source] } : {}),
    };
  } catch (err) {
    if (err instanceof InputError || err instanceof ProfileError) return fail(err.message);
    throw err;
  }
}

/** Evaluates every estimate of a site. Deterministic: the same site gives the same numbers. */
export function assessSite(
  site: Site,
  meta: { gprimeVersion: string; siteHash: string },
  options: AssessOptions = {},
): Assessment {
  return {
    format: 'gprime-assessment',
    project: site.project,
    waterBody: site.waterBody.name,
    gprimeVersion: meta.gprimeVersion,
    siteHash: meta.siteHash,
    units: site.units,
    caution: SCREENING_CAUTION,
    estimates: site.estimates.map((e, i) => runEstimate(site, e, i, options)),
    compliance: siteCompliance(site),
  };
}
