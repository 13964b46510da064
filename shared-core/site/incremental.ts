import { findCalcMethod } from '../calc/registry';
import type { Profile } from '../profile/profile';
import {
  assessSite,
  estimateArgs,
  runEstimate,
  type AssessOptions,
  type Assessment,
  type EstimateOutcome,
} from './assess';
import { makeContext, ProfileCache } from './context';
import type { Estimate, Site } from './schema';

/**
 * An assessor that remembers outcomes: an estimate is recomputed only when what it resolves to changed —
 * its method, bound and typed arguments (the condition's profile by content), uncertainties, names and
 * options. The live workspace keeps one per open document; the result is the same as assessSite's.
 */
export class SiteAssessor {
  private profiles = new ProfileCache();
  private outcomes = new Map<string, EstimateOutcome>();
  /** how many estimates the last assessment computed anew (the rest were reused) */
  computed = 0;

  assess(site: Site, meta: { gprimeVersion: string; siteHash: string }, options: AssessOptions = {}): Assessment {
    this.profiles.keepOnly(site);
    const next = new Map<string, EstimateOutcome>();
    this.computed = 0;
    const assessment = assessSite(site, meta, options, this.profiles, (e, index) => {
      const key = this.signature(site, e, options);
      const known = key === undefined ? undefined : this.outcomes.get(key);
      const o = known ?? runEstimate(site, e, index, options, this.profiles);
      if (!known) this.computed++;
      if (key !== undefined) next.set(key, o);
      return o;
    });
    this.outcomes = next;
    return assessment;
  }

  /** what an estimate resolves to, as text; undefined when it cannot be bound (it is then always rerun) */
  private signature(site: Site, e: Estimate, options: AssessOptions): string | undefined {
    const method = findCalcMethod(e.method);
    if (!method) return undefined;
    try {
      const ctx = makeContext(site, e.condition, e.feature, this.profiles);
      const args = estimateArgs(method, ctx, e);
      const profileKey = ctx.condition ? this.profiles.id(ctx.condition) : '';
      const plain = Object.fromEntries(
        Object.entries(args).map(([k, v]) => [k, isProfile(v) ? `profile:${profileKey}` : v]),
      );
      const names = [ctx.feature?.name, ctx.feature?.kind, ctx.condition?.id, ctx.condition?.name];
      return JSON.stringify([e.id, e.method, e.title, names, plain, e.uncertainty ?? null, options.bands !== false]);
    } catch {
      return undefined;
    }
  }
}

const isProfile = (v: unknown): v is Profile => typeof v === 'object' && v !== null && 'density' in v;
