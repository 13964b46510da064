import { GRAVITY } from '../quantities';
import { parseQuantity } from '../units/units';
import { profileFromTable } from '../profile/csv';
import { twoLayerFit, n2Profile, type TwoLayerFit } from '../profile/stratification';
import { interpolateAt, type Profile } from '../profile/profile';
import type { Condition, Feature, QuantityInput, Site } from './schema';

/** A quantity of the site file in SI; the field path names its place in the file. */
export function si(field: string, q: QuantityInput, unit: string): number {
  return typeof q === 'number' ? q : parseQuantity(field, q, unit);
}

export function siOptional(field: string, q: QuantityInput | undefined, unit: string): number | undefined {
  return q === undefined ? undefined : si(field, q, unit);
}

/** What an estimate sees: the site, its condition with the profile read, and its feature. */
export interface EstimateContext {
  site: Site;
  condition?: Condition;
  conditionIndex: number;
  profile?: Profile;
  fit?: TwoLayerFit;
  feature?: Feature;
  featureIndex: number;
}

/** Reads a condition's profile (memoised per condition object). */
const profileCache = new WeakMap<Condition, Profile>();
export function conditionProfile(c: Condition): Profile {
  let p = profileCache.get(c);
  if (!p) {
    p = profileFromTable(c.profile, { eos: c.eos });
    profileCache.set(c, p);
  }
  return p;
}

/** Buoyancy frequency N [1/s] at a depth from the profile's N² (negative N² counts as 0). */
export function buoyancyFrequencyAt(p: Profile, depth: number): number {
  const { depth: d, n2 } = n2Profile(p);
  return Math.sqrt(Math.max(0, d.length === 1 ? n2[0] : interpolateAt(d, n2, depth)));
}

/** Depth-mean buoyancy frequency between two depths [1/s] from the density difference. */
export function meanBuoyancyFrequency(p: Profile, top: number, bottom: number): number {
  const r1 = interpolateAt(p.depth, p.density, top),
    r2 = interpolateAt(p.depth, p.density, bottom);
  return Math.sqrt(Math.max(0, (GRAVITY * (r2 - r1)) / (((r1 + r2) / 2) * Math.max(bottom - top, 1e-9))));
}

export function makeContext(
  site: Site,
  conditionId: string | undefined,
  featureId: string | undefined,
): EstimateContext {
  const conditionIndex = conditionId ? site.conditions.findIndex((c) => c.id === conditionId) : 0;
  const featureIndex = featureId ? site.features.findIndex((f) => f.id === featureId) : -1;
  const condition = conditionIndex >= 0 ? site.conditions[conditionIndex] : undefined;
  const profile = condition ? conditionProfile(condition) : undefined;
  return {
    site,
    condition,
    conditionIndex,
    profile,
    fit: profile ? twoLayerFit(profile) : undefined,
    feature: featureIndex >= 0 ? site.features[featureIndex] : undefined,
    featureIndex,
  };
}
