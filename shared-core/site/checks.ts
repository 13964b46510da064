import { caution, type Warning } from '../core/warning';
import { qty } from '../core/quantity-text';
import { parseQuantity } from '../units/units';
import type { QuantityInput, Site } from './schema';

/**
 * Checks of a site as a whole, beyond what each field's schema can say: ids that must be unique, and the
 * geometry of ports against the water column. Depths are below the surface, positive down [m].
 */

/** One id used twice within a group: the place of the second use, and of the first. */
export interface DuplicateId {
  group: 'conditions' | 'features' | 'estimates';
  id: string;
  /** the repeated one, e.g. "features[3].id" */
  place: string;
  /** where the id was first used, e.g. "features[0].id" */
  first: string;
}

/**
 * Ids used more than once among the conditions, among the features or among the estimates. Estimates name
 * their feature and condition by id, so a repeated id would make that reference ambiguous.
 */
export function duplicateIds(site: Pick<Site, 'conditions' | 'features' | 'estimates'>): DuplicateId[] {
  const out: DuplicateId[] = [];
  for (const group of ['conditions', 'features', 'estimates'] as const) {
    const seen = new Map<string, number>();
    (site[group] ?? []).forEach((item: { id: string }, i: number) => {
      const first = seen.get(item.id);
      if (first === undefined) seen.set(item.id, i);
      else out.push({ group, id: item.id, place: `${group}[${i}].id`, first: `${group}[${first}].id` });
    });
  }
  return out;
}

/** A quantity in SI, or undefined when it is absent or does not read (its own field reports that). */
function depthOf(field: string, q: QuantityInput | undefined): number | undefined {
  if (q === undefined) return undefined;
  if (typeof q === 'number') return Number.isFinite(q) ? q : undefined;
  try {
    return parseQuantity(field, q, 'm');
  } catch {
    return undefined;
  }
}

/** Every port of the site with its depth below the surface [m] and its place in the file. */
function portsOf(site: Site): { place: string; depth: number | undefined }[] {
  return site.features.flatMap((f, i) => {
    if (f.kind === 'outfall')
      return [{ place: `features[${i}].portDepth`, depth: depthOf(`features[${i}].portDepth`, f.portDepth) }];
    if (f.kind === 'intake')
      return f.ports.map((p, k) => ({
        place: `features[${i}].ports[${k}].depth`,
        depth: depthOf(`features[${i}].ports[${k}].depth`, p.depth),
      }));
    return [];
  });
}

/**
 * The geometry of the site against its water column, as cautions naming the field (a site-file path, which
 * the edges show in words): a port above the surface (negative depth) or below the bed (deeper than the
 * greatest depth), and a greatest depth shallower than a condition's deepest profile sample.
 * @param deepestSample deepest sample of each condition's profile [m], by condition index (undefined when
 *   the profile does not read)
 */
export function siteGeometryChecks(site: Site, deepestSample: readonly (number | undefined)[] = []): Warning[] {
  const out: Warning[] = [];
  const bed = depthOf('waterBody.depth', site.waterBody.depth);
  for (const p of portsOf(site)) {
    if (p.depth === undefined) continue;
    if (p.depth < 0)
      out.push(
        caution(
          'port-above-surface',
          `${p.place} = ${qty(p.depth, 'm')} puts the port above the water surface (depths are measured down from it).`,
          p.place,
        ),
      );
    else if (bed !== undefined && p.depth > bed)
      out.push(
        caution(
          'port-below-bed',
          `${p.place} = ${qty(p.depth, 'm')} puts the port below the bed: waterBody.depth is ${qty(bed, 'm')}. Correct the port depth or the greatest depth.`,
          p.place,
        ),
      );
  }
  if (bed !== undefined)
    deepestSample.forEach((d, i) => {
      if (d === undefined || d <= bed) return;
      out.push(
        caution(
          'profile-below-bed',
          `waterBody.depth = ${qty(bed, 'm')} is shallower than the deepest sample of conditions[${i}] (${qty(d, 'm')}).`,
          'waterBody.depth',
        ),
      );
    });
  return out;
}
