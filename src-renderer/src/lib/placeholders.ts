import type { Feature, Site } from '../../../shared-core/site/schema';
import type { EstimateOutcome } from '../../../shared-core/site/assess';
import { blankCondition } from './templates';
import { fieldWords } from './messages';

function numbers(x: unknown, prefix = '', out = new Map<string, number>()): Map<string, number> {
  if (typeof x === 'number') out.set(prefix, x);
  else if (x && typeof x === 'object')
    for (const [k, v] of Object.entries(x))
      numbers(v, Array.isArray(x) ? `${prefix}[${k}]` : prefix ? `${prefix}.${k}` : k, out);
  return out;
}

/** The fields of a feature still at the starting values it was added with (in words, without repeats). */
export function startingFields(f: Feature, added: Feature): string[] {
  const own = numbers(f);
  const same = [...numbers(added)].filter(([path, v]) => own.get(path) === v).map(([p]) => p);
  return [...new Set(same.map((p) => fieldWords(p.replace(/\[\d+\]/g, ''))))];
}

/** Whether a condition still holds the placeholder profile of a new site. */
export function hasPlaceholderProfile(site: Site, conditionId: string | undefined): boolean {
  const c = conditionId ? site.conditions.find((x) => x.id === conditionId) : site.conditions[0];
  const blank = blankCondition('', '').profile;
  return !!c && JSON.stringify(c.profile) === JSON.stringify(blank);
}

/**
 * What an estimate's results rest on that the user has not replaced yet, in sentences (none: empty).
 * `added` holds the features added in this session as they were added (their starting values).
 */
export function placeholderNotes(site: Site, o: EstimateOutcome, added: ReadonlyMap<string, Feature>): string[] {
  const notes: string[] = [];
  if (hasPlaceholderProfile(site, o.condition?.id))
    notes.push(
      `Computed on the placeholder profile of ${o.condition?.name ?? 'the condition'}: import or paste the measured profile.`,
    );
  const f = o.feature && site.features.find((x) => x.id === o.feature!.id);
  const start = f && added.get(f.id);
  const fields = f && start ? startingFields(f, start) : [];
  if (f && fields.length)
    notes.push(`Computed on starting values of ${f.name} (${fields.join(', ')}): replace them with the site's.`);
  return notes;
}
