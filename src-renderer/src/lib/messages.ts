import type { Site } from '../../../shared-core/site/schema';
import { namesAsWords as wordsOf, siteMessage } from '../../../shared-core/site/words';
import { sentenceIn } from '../../../shared-core/units/sentence';
import type { UnitSystem } from '../../../shared-core/units/units';

export { fieldWords, placeName } from '../../../shared-core/site/words';

/**
 * Shared-core text (a warning, an error, a text result, an outcome sentence, a chart caption) as the
 * workspace shows it: parameter names and site-file paths in words, every quantity in the workspace's unit
 * system (`ws.units`), rounded for people. The one function every view calls to show shared-core text;
 * with `site`, site-file paths name the fields as the editors do.
 */
export function shownText(text: string, system: UnitSystem, options: { site?: Site; method?: string } = {}): string {
  const worded = options.site ? siteMessage(text, options.site, options.method) : wordsOf(text, options.method);
  return sentenceIn(worded, system);
}

/** An error or warning for people, as `shownText` with the site (SI quantities unless a system is given). */
export function plainMessage(text: string, site: Site, method?: string, system: UnitSystem = 'si'): string {
  return shownText(text, system, { site, method });
}

/** Parameter names inside a sentence as their labels, quantities shown in `system` (SI unless given). */
export function namesAsWords(text: string, method?: string, system: UnitSystem = 'si'): string {
  return shownText(text, system, { method });
}

/** A parameter's description under its field, unless it only repeats the label. */
export function helpText(description: string, label: string, method?: string, system: UnitSystem = 'si'): string {
  const same = description.trim().toLowerCase() === label.trim().toLowerCase();
  return same ? '' : shownText(description, system, { method });
}
