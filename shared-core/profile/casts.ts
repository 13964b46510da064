import type { ProfileTable } from './csv-text';
import { parseHeader } from './headers';

/** One cast of a file that holds several: its name (from the station and date columns) and its rows. */
export interface ProfileCast {
  name: string;
  table: ProfileTable;
}

const STATION = /^(station|stn|cast|profile|site|location)(_?(id|name|no|number))?$/i;
const DATE = /^(date|day|sample_?date|cast_?date)$/i;
const DATE_TIME = /^(date_?time|timestamp|time_?stamp)$/i;

const keyName = (column: string) => parseHeader(column).name.replace(/[\s.-]+/g, '_');
const text = (cell: string | number | null | undefined) =>
  cell === null || cell === undefined ? '' : String(cell).trim();

/**
 * Splits a table holding several casts into one table per cast. A cast is the rows sharing a station
 * (station, cast, profile, site or location column) and a date (a date column, or the date part of a
 * date-time column), in the order the casts first appear; its name joins those values ("S2, 2024-06-01").
 * A table without such columns, or with one cast only, comes back whole as one cast.
 */
export function splitCasts(table: ProfileTable): ProfileCast[] {
  const names = table.columns.map(keyName);
  const station = names.findIndex((n) => STATION.test(n));
  const date = names.findIndex((n) => DATE.test(n));
  const dateTime = date < 0 ? names.findIndex((n) => DATE_TIME.test(n)) : -1;
  const keyOf = (row: (string | number | null)[]): string[] => [
    ...(station >= 0 ? [text(row[station])] : []),
    ...(date >= 0 ? [text(row[date])] : []),
    ...(dateTime >= 0 ? [text(row[dateTime]).split(/[T\s]/)[0]] : []),
  ];
  const casts = new Map<string, { name: string; rows: (string | number | null)[][] }>();
  for (const row of table.rows) {
    const key = keyOf(row);
    const id = JSON.stringify(key);
    let cast = casts.get(id);
    if (!cast) {
      cast = { name: key.filter((k) => k !== '').join(', ') || (key.length ? 'unnamed cast' : 'cast'), rows: [] };
      casts.set(id, cast);
    }
    cast.rows.push(row);
  }
  if (casts.size <= 1) return [{ name: [...casts.values()][0]?.name ?? 'cast', table }];
  return [...casts.values()].map((c) => ({ name: c.name, table: { columns: [...table.columns], rows: c.rows } }));
}
