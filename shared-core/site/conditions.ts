import { siteMessage } from './words';
import type { Series } from '../calc/types';
import type { Warning } from '../core/warning';
import { profileSeries } from '../profile/calc';
import { ProfileError, type ProfileIssue } from '../profile/profile';
import { siteLatitude, type ProfileCache } from './context';
import type { Site } from './schema';

/** How a condition's measured profile reads: its curves for the views, or its problems by row and column. */
export interface ConditionOutcome {
  id: string;
  name: string;
  status: 'ok' | 'error';
  /** why the profile cannot be read (status 'error'), naming the condition */
  error?: string;
  /** the problems of the profile table, each at its 1-based data row and column */
  issues: ProfileIssue[];
  warnings: Warning[];
  /** the profile's curves against depth (temperature, density, N², salinity, extra columns) */
  series: Series[];
  /** depth of the deepest sample [m] */
  deepest?: number;
}

/** Reads every condition's profile once (through the cache the estimates share). */
export function assessConditions(site: Site, cache: ProfileCache): ConditionOutcome[] {
  return site.conditions.map((c, i) => {
    const base = { id: c.id, name: c.name, issues: [] as ProfileIssue[], warnings: [] as Warning[], series: [] };
    const read = cache.read(c, siteLatitude(site));
    if ('error' in read) {
      const message = read.error instanceof Error ? read.error.message : String(read.error);
      const issues = read.error instanceof ProfileError ? read.error.issues : [];
      return {
        ...base,
        status: 'error',
        issues,
        error: siteMessage(`conditions[${i}] (“${c.name}”) profile: ${message}`, site),
      };
    }
    const p = read.profile;
    return {
      ...base,
      status: 'ok',
      warnings: [...p.warnings],
      series: profileSeries(p),
      deepest: p.depth[p.depth.length - 1],
    };
  });
}
