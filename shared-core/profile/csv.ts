import { qty } from '../core/quantity-text';
import { InputError } from '../core/errors';
import { note, caution, type Warning } from '../core/warning';
import type { EquationOfState } from '../water/density';
import {
  depthFromPressureUnesco1983,
  practicalSalinityFromSpecificConductance,
  practicalSalinityPss78,
} from '../water/salinity';
import { readCell, tableDecimalMark, describeRows, type Cell } from './cells';
import { depthOrder, fillGaps, reportSpikes } from './clean';
import { readCsvTable, type CsvTable, type ProfileTable } from './csv-text';
import {
  columnConversion,
  LABEL_NAME,
  parseHeader,
  roleOf,
  VERTICAL_ROLES,
  type ParsedHeader,
  type Role,
} from './headers';
import {
  largestFinite,
  makeProfile,
  ProfileError,
  requireProfileRows,
  type Profile,
  type ProfileColumn,
  type ProfileIssue,
  type ProfileLabelColumn,
} from './profile';

export { parseHeader, type ParsedHeader } from './headers';
export { readCsvTable, type CsvTable, type ProfileTable } from './csv-text';

export interface CsvProfileOptions {
  eos?: EquationOfState;
  /** water-surface elevation [m] for elevation columns; default: the highest sample */
  surfaceElevation?: number;
  /** latitude [deg] for depth from a pressure column; default 45 */
  latitude?: number;
}

/** Reads a profile CSV (see readCsvTable) into a Profile; headers carry units in any common form. */
export function parseProfileCsv(text: string, options: CsvProfileOptions = {}): Profile {
  return profileFromTable(readCsvTable(text), options);
}

/** The columns a table's headers name. */
interface Layout {
  headers: ParsedHeader[];
  vertical: { col: number; role: Role };
  temperature: number;
  /** where salinity comes from: a salinity, conductivity or specific-conductance column */
  salt?: { col: number; role: Role };
  sediment?: number;
}

function layoutOf(columns: readonly string[]): Layout {
  const headers = columns.map(parseHeader);
  const roles = headers.map(roleOf);
  const find = (r: Role) => roles.indexOf(r);
  const verticalRole = VERTICAL_ROLES.find((r) => find(r) >= 0);
  const saltRole = (['salinity', 'conductivity', 'specific-conductance'] as const).find((r) => find(r) >= 0);
  const issues: ProfileIssue[] = [];
  const names = headers.map((h) => h.name).join(', ');
  if (!verticalRole)
    issues.push({ row: 0, column: '(header)', message: `no depth, elevation or pressure column among: ${names}` });
  if (find('temperature') < 0)
    issues.push({ row: 0, column: '(header)', message: `no temperature column among: ${names}` });
  if (issues.length) throw new ProfileError(issues);
  return {
    headers,
    vertical: { col: find(verticalRole!), role: verticalRole! },
    temperature: find('temperature'),
    salt: saltRole && { col: find(saltRole), role: saltRole },
    sediment: find('sediment') >= 0 ? find('sediment') : undefined,
  };
}

/**
 * Builds a Profile from a table of header texts and cells, converting every unit to SI.
 * - A blank, "NaN" or flagged cell (−9999 …) in an essential column (vertical, temperature, salinity or
 *   conductivity, sediment) skips its row; in another numeric column it is filled from its neighbours.
 *   Either way a warning names the rows.
 * - Text columns (date, time, station…) are carried along as labels; numeric ones as extras.
 * - Pressure [dbar] gives depth by UNESCO 1983 at `latitude`; conductivity gives salinity by PSS-78.
 * - Rows above the surface, repeated depths, rows going back up and spikes are reported by row.
 * Any other problem (text in an essential column, a wrong unit, too few rows) is thrown at once as a
 * ProfileError with row (1-based data row) and column.
 */
export function profileFromTable(table: ProfileTable | CsvTable, options: CsvProfileOptions = {}): Profile {
  if (table.rows.length < 2)
    throw new ProfileError([{ row: 0, column: '(file)', message: 'needs a header line and at least 2 data rows' }]);
  requireProfileRows(table.rows.length);
  const layout = layoutOf(table.columns);
  const { headers } = layout;
  const issues: ProfileIssue[] = [];
  const warnings: Warning[] = [...('warnings' in table ? table.warnings : [])];
  const mark = tableDecimalMark(table.rows, 'either');
  const width = headers.length;
  table.rows.forEach((r, i) => {
    if (r.length > width)
      issues.push({ row: i + 1, column: '(row)', message: `has ${r.length} fields, the header has ${width}` });
  });

  const essential = [layout.vertical.col, layout.temperature, layout.salt?.col, layout.sediment].filter(
    (c): c is number => c !== undefined,
  );
  const si = new Map<number, number[]>();
  const gapsByRow = new Map<number, string[]>();
  for (const c of essential) {
    const toSi = columnConversion(headers[c], roleOf(headers[c])!, issues);
    si.set(
      c,
      table.rows.map((r, i) => {
        const read = readCell(r[c] as Cell, mark, headers[c].name);
        if (read.kind === 'value') return toSi(read.value);
        if (read.kind === 'gap') gapsByRow.set(i, [...(gapsByRow.get(i) ?? []), `${headers[c].name} "${read.shown}"`]);
        else issues.push({ row: i + 1, column: headers[c].name, message: read.shown });
        return NaN;
      }),
    );
  }
  if (issues.length) throw new ProfileError(issues);
  if (gapsByRow.size) warnings.push(skippedRowsWarning(gapsByRow));

  const candidates = table.rows.flatMap((_, i) => (gapsByRow.has(i) ? [] : [i]));
  const vertical = candidates.map((i) => si.get(layout.vertical.col)![i]);
  const depthAll = verticalToDepth(layout.vertical.role, vertical, options, warnings);
  const order = depthOrder(
    depthAll,
    candidates.map((i) => i + 1),
    warnings,
  ).map((k) => candidates[k]);
  const rowNumber = order.map((i) => i + 1);
  const at = (c: number) => order.map((i) => si.get(c)![i]);
  const depthOf = new Map(candidates.map((i, k) => [i, depthAll[k]]));
  const depth = order.map((i) => depthOf.get(i)!);
  const temperature = at(layout.temperature);
  const pressure = layout.vertical.role === 'pressure' ? at(layout.vertical.col) : depth;
  const salt = layout.salt;
  const salinity =
    salt && salinityColumn(salt.role, headers[salt.col].name, at(salt.col), temperature, pressure, rowNumber, warnings);
  reportSpikes('temperature', depth, temperature, rowNumber, warnings);
  if (salinity) reportSpikes('salinity', depth, salinity, rowNumber, warnings);

  const { extra, labels } = carriedColumns(table, layout, mark, order, depth, warnings);
  const profile = makeProfile({
    depth,
    temperature,
    salinity,
    sediment: layout.sediment === undefined ? undefined : at(layout.sediment),
    extra,
    labels,
    eos: options.eos,
    warnings,
  });
  if (layout.vertical.role === 'pressure') return withFreshWaterDepthCaution(profile);
  return profile;
}

function skippedRowsWarning(gapsByRow: Map<number, string[]>): Warning {
  const rows = [...gapsByRow.keys()].sort((a, b) => a - b);
  const examples = rows
    .slice(0, 3)
    .map(
      (i) =>
        `row ${i + 1}: ${gapsByRow
          .get(i)!
          .map((g) => g.replace(/ ""$/, ' blank'))
          .join(', ')}`,
    )
    .join('; ');
  return caution(
    'rows-skipped',
    `Skipped ${describeRows(rows.map((i) => i + 1))}: a blank, "NaN" or flagged value in an essential column (${examples}${rows.length > 3 ? '; …' : ''}).`,
    'file',
  );
}

/** Depth [m] from the vertical column: depth as is, elevation below the surface, pressure by UNESCO 1983. */
function verticalToDepth(role: Role, v: number[], options: CsvProfileOptions, warnings: Warning[]): number[] {
  if (role === 'elevation') {
    const surface = options.surfaceElevation ?? largestFinite(v);
    return v.map((z) => surface - z);
  }
  if (role !== 'pressure') return v;
  const latitude = options.latitude ?? 45;
  warnings.push(
    note(
      'depth-from-pressure',
      `Depth from sea pressure by UNESCO 1983 (Saunders & Fofonoff 1976) at latitude ${latitude}°` +
        (options.latitude === undefined ? ' (the default; give the site latitude to change it)' : '') +
        '.',
      'file',
    ),
  );
  return v.map((p) => (p < 0 ? p : depthFromPressureUnesco1983(p, latitude).value));
}

/** The UNESCO formula assumes ocean water: say how much deeper the true depths of a lighter profile are. */
function withFreshWaterDepthCaution(p: Profile): Profile {
  const mean = p.density.reduce((a, b) => a + b, 0) / p.density.length;
  const percent = (1028.1 / mean - 1) * 100; // 1028.1 kg/m³: the standard ocean, S = 35, 0 °C
  if (percent < 0.5) return p;
  const w = caution(
    'depth-from-pressure-fresh',
    `The depth-from-pressure formula assumes ocean water (${qty(1028, 'kg/m3')}); at this profile's mean density (${qty(mean, 'kg/m3', 5)}) the true depths are about ${percent.toFixed(1)} % greater.`,
    'file',
  );
  return { ...p, warnings: [...p.warnings, w] };
}

/** Salinity [PSU] from a salinity column as is, or from conductivity by PSS-78 (specific conductance at 25 °C). */
function salinityColumn(
  role: Role,
  column: string,
  values: number[],
  temperature: number[],
  pressure: number[],
  rowNumber: number[],
  warnings: Warning[],
): number[] {
  if (role === 'salinity') return values;
  const issues: ProfileIssue[] = [];
  const out = values.map((c, i) => {
    try {
      return role === 'conductivity'
        ? practicalSalinityPss78(c, temperature[i], Math.max(0, pressure[i])).value
        : practicalSalinityFromSpecificConductance(c).value;
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      issues.push({ row: rowNumber[i], column, message: e.message });
      return NaN;
    }
  });
  if (issues.length) throw new ProfileError(issues);
  warnings.push(
    role === 'conductivity'
      ? note(
          'salinity-from-conductivity',
          'Salinity from in-situ conductivity, temperature and pressure by PSS-78 (UNESCO 1983; Hill et al. 1986 below 2).',
          'file',
        )
      : note(
          'salinity-from-specific-conductance',
          'Salinity from specific conductance (conductivity at 25 °C) by PSS-78 at 25 °C (UNESCO 1983; Hill et al. 1986 below 2).',
          'file',
        ),
  );
  return out;
}

/** The other columns at the kept rows: numeric ones (and a conductivity column) as extras, text ones as labels. */
function carriedColumns(
  table: ProfileTable,
  layout: Layout,
  mark: ReturnType<typeof tableDecimalMark>,
  order: number[],
  depth: number[],
  warnings: Warning[],
): { extra: ProfileColumn[]; labels: ProfileLabelColumn[] } {
  const extra: ProfileColumn[] = [];
  const labels: ProfileLabelColumn[] = [];
  const rowNumber = order.map((i) => i + 1);
  layout.headers.forEach((h, c) => {
    const role = roleOf(h);
    const conductivityKept = (role === 'conductivity' || role === 'specific-conductance') && layout.salt?.col !== c;
    const asSalt = layout.salt?.col === c && layout.salt.role !== 'salinity';
    if (role && !conductivityKept && !asSalt) return;
    const cells = order.map((i) => table.rows[i][c] as Cell);
    const reads = cells.map((cell) => readCell(cell, mark, h.name));
    const numbers = reads.filter((r) => r.kind === 'value').length;
    const texts = reads.filter((r) => r.kind === 'text').length;
    if (!role && (LABEL_NAME.test(h.name.replace(/[\s.-]+/g, '_')) || numbers < 2 || texts > numbers)) {
      labels.push({
        name: h.name,
        values: cells.map((cell) => (cell === null || cell === undefined ? '' : String(cell).trim())),
      });
      return;
    }
    const values = reads.map((r) => (r.kind === 'value' ? r.value : NaN));
    const filled = fillGaps(h.name, depth, values, rowNumber, warnings);
    if (filled) extra.push({ name: h.name, unit: h.unit, values: filled });
  });
  return { extra, labels };
}
