import { readCsvTable } from '../profile/csv';
import { splitCasts } from '../profile/casts';
import type { Condition, Site } from './schema';

/** An id made of letters, digits and hyphens from a name, unique among `taken`. */
function freeId(name: string, taken: ReadonlySet<string>): string {
  const base =
    name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 48) || 'cast';
  let id = base;
  for (let k = 2; taken.has(id); k++) id = `${base}-${k}`;
  return id;
}

/**
 * The ambient conditions of a profile file: one per cast when the file holds several (a station or date
 * column tells them apart), named from it; one condition for a single cast. The tables are kept as read,
 * so every column (date, time, flags) travels with them. Ids avoid those already in the site.
 */
export function conditionsFromCsv(site: Site, text: string, fallbackName: string): Condition[] {
  const table = readCsvTable(text);
  const taken = new Set(site.conditions.map((c) => c.id));
  const casts = splitCasts({ columns: table.columns, rows: table.rows });
  return casts.map((cast) => {
    const name = casts.length === 1 ? fallbackName : cast.name;
    const id = freeId(name, taken);
    taken.add(id);
    return { id, name, profile: { columns: cast.table.columns, rows: cast.table.rows } } as Condition;
  });
}
