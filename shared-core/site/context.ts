import { GRAVITY } from '../quantities';
import { InputError } from '../core/errors';
import { parseQuantity } from '../units/units';
import { profileFromTable } from '../profile/csv';
import { twoLayerFit, n2Profile, type TwoLayerFit } from '../profile/stratification';
import { interpolateAt, type Profile } from '../profile/profile';
import type { Condition, Feature, QuantityInput, Site } from './schema';

/** Quantities typed with a unit, already read ("98 ft" as m…): a live edit binds every estimate again, and reading a
 * unit costs tens of microseconds. Read values only (a refusal names its field, so it is never kept); bounded. */
const readQuantities = new Map<string, number>();
const MAX_READ_QUANTITIES = 4096;

/** A quantity of the site file in SI; the field path names its place in the file. */
export function si(field: string, q: QuantityInput, unit: string): number {
  if (typeof q === 'number') return q;
  // a required field emptied in the workspace: say so by name, never an internal error
  if (typeof q !== 'string') throw new InputError(field, '', unit, 'a value', 'the field is empty; give a value');
  const key = `${unit}\u0000${q}`;
  let value = readQuantities.get(key);
  if (value === undefined) {
    value = parseQuantity(field, q, unit);
    if (readQuantities.size >= MAX_READ_QUANTITIES) readQuantities.clear();
    readQuantities.set(key, value);
  }
  return value;
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

/** A condition's profile as read, with its two-layer fit, or why it could not be read. */
type ReadProfile = { profile: Profile; fit: TwoLayerFit } | { error: unknown };

/**
 * Profiles read once per distinct table: the key is the table's content, so an edited copy of a site (or
 * one that crossed to a worker) finds the profiles of unchanged conditions already read.
 */
export class ProfileCache {
  private byContent = new Map<string, ReadProfile>();
  private keys = new WeakMap<object, string>();
  private ids = new Map<string, number>();
  private nextId = 0;

  /** a key of the condition's profile table and equation of state (content, not identity) */
  key(c: Condition): string {
    let k = this.keys.get(c.profile);
    if (k === undefined) {
      k = JSON.stringify(c.profile);
      this.keys.set(c.profile, k);
    }
    return `${c.eos ?? ''}|${k}`;
  }

  /** a short id of the condition's profile content, the same while the content is kept (the key can be long) */
  id(c: Condition): number {
    const key = this.key(c);
    let id = this.ids.get(key);
    if (id === undefined) this.ids.set(key, (id = this.nextId++));
    return id;
  }

  /** `latitude` [deg] is the site's, for depth from a pressure column (the reader's default when absent) */
  read(c: Condition, latitude?: number): ReadProfile {
    const key = latitude === undefined ? this.key(c) : `${latitude}|${this.key(c)}`;
    let r = this.byContent.get(key);
    if (!r) {
      try {
        const profile = profileFromTable(c.profile, { eos: c.eos, latitude });
        r = { profile, fit: twoLayerFit(profile) };
      } catch (error) {
        r = { error };
      }
      this.byContent.set(key, r);
    }
    return r;
  }

  /** forgets profiles no longer in the site */
  keepOnly(site: Site): void {
    const latitude = siteLatitude(site);
    const live = new Set(
      site.conditions.flatMap((c) => [this.key(c), latitude === undefined ? '' : `${latitude}|${this.key(c)}`]),
    );
    for (const k of this.byContent.keys()) if (!live.has(k)) this.byContent.delete(k);
    for (const k of this.ids.keys()) if (!live.has(k)) this.ids.delete(k);
  }
}

/** The site's latitude [deg] for depth from pressure; undefined when not given or unreadable (its field says why). */
export function siteLatitude(site: Site): number | undefined {
  try {
    return siOptional('waterBody.latitude', site.waterBody.latitude, 'deg');
  } catch {
    return undefined;
  }
}

/** Reads a condition's profile (throws the reader's ProfileError). */
export function conditionProfile(c: Condition, cache = new ProfileCache()): Profile {
  const r = cache.read(c);
  if ('error' in r) throw r.error;
  return r.profile;
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
  cache = new ProfileCache(),
): EstimateContext {
  const conditionIndex = conditionId ? site.conditions.findIndex((c) => c.id === conditionId) : 0;
  const featureIndex = featureId ? site.features.findIndex((f) => f.id === featureId) : -1;
  const condition = conditionIndex >= 0 ? site.conditions[conditionIndex] : undefined;
  const read = condition ? cache.read(condition, siteLatitude(site)) : undefined;
  if (read && 'error' in read) throw read.error;
  return {
    site,
    condition,
    conditionIndex,
    profile: read?.profile,
    fit: read?.fit,
    feature: featureIndex >= 0 ? site.features[featureIndex] : undefined,
    featureIndex,
  };
}
