import Papa from 'papaparse';
import { InputError } from '../core/errors';
import { convertToSi } from '../units/units';
import type { EquationOfState } from '../water/density';
import {
  largestFinite,
  makeProfile,
  ProfileError,
  requireProfileRows,
  type Profile,
  type ProfileColumn,
  type ProfileIssue,
} from './profile';

/** Which standard column a header names; anything else is an extra constituent. */
type Role = 'depth' | 'elevation' | 'temperature' | 'salinity' | 'sediment';

const ROLE_PATTERNS: [Role, RegExp][] = [
  ['depth', /^(depth|dep|d|z_?down)$/i],
  ['elevation', /^(elevation|elev|height|z|level|stage)$/i],
  ['temperature', /^(temperature|temp|t|water_?temp(erature)?|wtemp)$/i],
  ['salinity', /^(salinity|sal|s|psal|practical_?salinity)$/i],
  ['sediment', /^(sediment|ssc|tss|suspended_?(sediment|solids)|sed)$/i],
];

const SI_UNIT: Record<Role, string> = {
  depth: 'm',
  elevation: 'm',
  temperature: 'degC',
  salinity: 'PSU',
  sediment: 'kg/m3',
};
const DEFAULT_UNIT: Record<Role, string> = {
  depth: 'm',
  elevation: 'm',
  temperature: 'degC',
  salinity: 'PSU',
  sediment: 'kg/m3',
};

export interface ParsedHeader {
  name: string;
  unit: string;
}

/** Splits "depth (ft)", "Temp [degF]", "Sal (psu)", "DO mg/L" or "depth_m" into a name and a unit. */
export function parseHeader(header: string): ParsedHeader {
  const h = header.trim();
  const bracket = /^(.*?)\s*[([{]\s*([^)\]}]*)\s*[)\]}]\s*$/.exec(h);
  if (bracket) return { name: bracket[1].trim(), unit: bracket[2].trim() };
  const spaced = /^(.*\S)\s+(\S*[/°%]\S*|m|ft|psu|ppt|degC|degF|C|F)$/i.exec(h);
  if (spaced) return { name: spaced[1].trim(), unit: spaced[2].trim() };
  const suffix = /^(.*?)_(m|ft|degc|degf|c|f|psu|ppt|mgl|kgm3)$/i.exec(h);
  if (suffix)
    return {
      name: suffix[1],
      unit: ({ mgl: 'mg/L', kgm3: 'kg/m3' } as Record<string, string>)[suffix[2].toLowerCase()] ?? suffix[2],
    };
  return { name: h, unit: '' };
}

function roleOf(name: string): Role | undefined {
  const key = name.replace(/[\s.-]+/g, '_');
  return ROLE_PATTERNS.find(([, re]) => re.test(key))?.[0];
}

/** Parses one cell (a number, or text in plain decimal notation). Empty or null → NaN. */
function parseCell(cell: string | number | null | undefined): number {
  if (typeof cell === 'number') return Number.isFinite(cell) ? cell : NaN;
  const t = (cell ?? '').trim();
  return /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(t) ? Number(t) : NaN;
}

export interface CsvProfileOptions {
  eos?: EquationOfState;
  /** water-surface elevation [m] for elevation columns; default: the highest sample */
  surfaceElevation?: number;
}

/** A profile as a table: header texts (name and unit, e.g. "depth (ft)") and rows of cells. */
export interface ProfileTable {
  columns: string[];
  rows: (string | number | null)[][];
}

/**
 * Reads CSV text into a table: comma, semicolon, tab or bar separated; blank lines and lines starting
 * with # ignored. With a separator other than a comma, decimal commas are turned into points.
 */
export function readCsvTable(text: string): ProfileTable {
  const body = text
    .replace(/^\uFEFF/, '')
    .split(/\r?\n/)
    .filter((l) => !/^\s*#/.test(l))
    .join('\n');
  const parsed = Papa.parse<string[]>(body, { skipEmptyLines: 'greedy', delimitersToGuess: [',', ';', '\t', '|'] });
  const [header = [], ...data] = parsed.data;
  const decimalComma = parsed.meta.delimiter !== ',';
  return {
    columns: header.map((h) => h.trim()),
    rows: data.map((r) => r.map((c) => (decimalComma ? c.replace(',', '.') : c))),
  };
}

/**
 * Reads a profile CSV (see readCsvTable) into a Profile; headers carry units in any common form.
 * Every problem is collected and thrown at once as a ProfileError with row (1-based data row) and column.
 */
export function parseProfileCsv(text: string, options: CsvProfileOptions = {}): Profile {
  return profileFromTable(readCsvTable(text), options);
}

/** Builds a Profile from a table of header texts and cells, converting every unit to SI. */
export function profileFromTable(table: ProfileTable, options: CsvProfileOptions = {}): Profile {
  if (table.rows.length < 2)
    throw new ProfileError([{ row: 0, column: '(file)', message: 'needs a header line and at least 2 data rows' }]);
  requireProfileRows(table.rows.length);
  const headers = table.columns.map(parseHeader);
  const issues: ProfileIssue[] = [];
  const roles = headers.map((h) => roleOf(h.name));
  const find = (r: Role) => roles.indexOf(r);
  const depthCol = find('depth') >= 0 ? find('depth') : find('elevation');
  const tempCol = find('temperature');
  if (depthCol < 0)
    issues.push({
      row: 0,
      column: '(header)',
      message: `no depth or elevation column among: ${headers.map((h) => h.name).join(', ')}`,
    });
  if (tempCol < 0)
    issues.push({
      row: 0,
      column: '(header)',
      message: `no temperature column among: ${headers.map((h) => h.name).join(', ')}`,
    });
  if (issues.length) throw new ProfileError(issues);

  const data = table.rows;
  const column = (c: number): number[] => {
    const h = headers[c];
    const toSi = columnConversion(h, roles[c], issues);
    return data.map((r, i) => {
      if (r.length !== headers.length) {
        issues.push({
          row: i + 1,
          column: h.name,
          message: `has ${r.length} fields, the header has ${headers.length}`,
        });
        return NaN;
      }
      const cell = r[c];
      const v = parseCell(cell);
      if (Number.isNaN(v)) {
        const shown = cell === null || cell === undefined ? '' : String(cell).trim();
        issues.push({ row: i + 1, column: h.name, message: shown ? `"${shown}" is not a number` : 'value is missing' });
        return NaN;
      }
      return toSi(v);
    });
  };
  let depth = column(depthCol);
  if (roles[depthCol] === 'elevation') {
    const surface = options.surfaceElevation ?? largestFinite(depth);
    depth = depth.map((z) => surface - z);
  }
  const col = (r: Role) => (find(r) >= 0 ? column(find(r)) : undefined);
  const temperature = column(tempCol),
    salinity = col('salinity'),
    sediment = col('sediment');
  const extra: ProfileColumn[] = headers.flatMap((h, c) =>
    roles[c] ? [] : [{ name: h.name, unit: h.unit, values: column(c) }],
  );
  if (issues.length) throw new ProfileError(dedupe(issues));
  // sort by depth when the table is ordered bottom-up (elevation tables usually are)
  const order = depth.map((_, i) => i);
  if (depth.length > 1 && depth[0] > depth[depth.length - 1]) order.reverse();
  const pick = (v: number[] | undefined) => v && order.map((i) => v[i]);
  return makeProfile({
    depth: pick(depth)!,
    temperature: pick(temperature)!,
    salinity: pick(salinity),
    sediment: pick(sediment),
    extra: extra.map((e) => ({ ...e, values: pick(e.values)! })),
    eos: options.eos,
  });
}

/**
 * The conversion of a column's values to SI, found once per column: every unit of a standard column is an
 * affine map (a scale, plus an offset for °F and °C), so two conversions give it. An extra column keeps its
 * values; a unit that does not fit the column is one issue on the header.
 */
function columnConversion(h: ParsedHeader, role: Role | undefined, issues: ProfileIssue[]): (v: number) => number {
  if (!role) return (v) => v;
  try {
    const unit = h.unit || DEFAULT_UNIT[role];
    const offset = convertToSi(h.name, 0, unit, SI_UNIT[role]);
    const scale = convertToSi(h.name, 1, unit, SI_UNIT[role]) - offset;
    return (v) => scale * v + offset;
  } catch (e) {
    issues.push({ row: 0, column: h.name, message: e instanceof InputError ? e.message : String(e) });
    return () => NaN;
  }
}

function dedupe(issues: ProfileIssue[]): ProfileIssue[] {
  const seen = new Set<string>();
  return issues.filter((i) => {
    const k = `${i.row}|${i.column}|${i.message}`;
    if (seen.has(k)) return false;
    seen.add(k);
    return true;
  });
}
