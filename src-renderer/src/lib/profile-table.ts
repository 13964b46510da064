import {
  parseHeader,
  readCsvTable,
  type ConditionOutcome,
  type ProfileIssue,
  type ProfileTable,
} from '../../../shared-core/site';
import { InputError } from '../../../shared-core/core/errors';
import { decimalMarkOf, readNumberCell, type DecimalMark } from '../../../shared-core/units/number';
import type { UnitSystem } from '../../../shared-core/units/units';

export type Cell = string | number | null;

/** The problems of a profile table (from the assessment's reading of it), each placed at its row and column. */
export interface TableCheck {
  issues: ProfileIssue[];
  /** "row:col" (0-based data row, column index) → message */
  cells: Map<string, string>;
  /** column index → message for problems of a whole column */
  columns: Map<number, string>;
  other: string[];
}

// the role names makeProfile uses in its issues, matched to headers the way the CSV reader does
const ROLE_HEADERS: Record<string, RegExp> = {
  depth: /^(depth|dep|d|z_?down|elevation|elev|height|z|level|stage)$/i,
  temperature: /^(temperature|temp|t|water_?temp(erature)?|wtemp)$/i,
  salinity: /^(salinity|sal|s|psal|practical_?salinity)$/i,
  sediment: /^(sediment|ssc|tss|suspended_?(sediment|solids)|sed)$/i,
};

function columnIndex(columns: string[], name: string): number {
  const names = columns.map((c) => parseHeader(c).name);
  const exact = names.findIndex((n) => n === name);
  if (exact >= 0) return exact;
  const re = ROLE_HEADERS[name];
  return re ? names.findIndex((n) => re.test(n.replace(/[\s.-]+/g, '_'))) : -1;
}

export function checkTable(table: ProfileTable, reading: ConditionOutcome | undefined): TableCheck {
  const out: TableCheck = { issues: [], cells: new Map(), columns: new Map(), other: [] };
  if (!reading || reading.status === 'ok') return out;
  if (reading.issues.length === 0) {
    out.other.push(reading.error ?? 'the profile cannot be read');
    return out;
  }
  out.issues = reading.issues;
  for (const i of reading.issues) {
    const c = columnIndex(table.columns, i.column);
    if (i.row > 0 && c >= 0) out.cells.set(`${i.row - 1}:${c}`, i.message);
    else if (c >= 0) out.columns.set(c, i.message);
    else out.other.push(i.row > 0 ? `row ${i.row}: ${i.message}` : i.message);
  }
  return out;
}

/**
 * The decimal mark of a table's typed cells: US customary display means a decimal point ("1,500" is
 * fifteen hundred); otherwise the mark the text cells show, or `either` when they do not tell.
 */
export function tableMark(table: ProfileTable, system: UnitSystem): DecimalMark {
  if (system === 'us') return 'point';
  function* texts(): Generator<string> {
    for (const r of table.rows) for (const c of r) if (typeof c === 'string') yield c;
  }
  return decimalMarkOf(texts(), 'either');
}

/**
 * A typed cell: a number when it reads as one with the table's decimal mark (grouped thousands "1,500",
 * a decimal comma "3,5"), otherwise the text as typed. An ambiguous "1,500" under `either` is kept as text:
 * the profile's reading then names both readings at that cell.
 */
export function cellValue(text: string, mark: DecimalMark = 'either'): Cell {
  const t = text.trim();
  if (t === '') return null;
  try {
    return readNumberCell('profile cell', t, mark) ?? t;
  } catch (e) {
    if (e instanceof InputError) return t;
    throw e;
  }
}

const isNumeric = (s: string, mark: DecimalMark) => typeof cellValue(s, mark) === 'number';

/**
 * Pastes spreadsheet text (tab-separated rows) into the table at a cell. A block whose first line is all
 * text is taken as a new table with its own header; otherwise the cells are written from the cell on,
 * adding rows (and columns) as needed.
 */
export function pasteBlock(
  table: ProfileTable,
  text: string,
  row: number,
  col: number,
  system: UnitSystem,
): ProfileTable {
  const lines = text
    .replace(/\r/g, '')
    .split('\n')
    .filter((l) => l.trim() !== '');
  const grid = lines.map((l) => l.split('\t'));
  if (grid.length === 0) return table;
  const mark = system === 'us' ? 'point' : decimalMarkOf(grid.flat(), tableMark(table, system));
  if (grid[0].every((c) => !isNumeric(c, mark)) && grid.length > 1) {
    const columns = grid[0].map((c) => c.trim());
    return { columns, rows: grid.slice(1).map((r) => columns.map((_, i) => cellValue(r[i] ?? '', mark))) };
  }
  // a loop, not Math.max(...): a pasted logger block can hold more rows than the call stack has room for
  let widest = 0;
  for (const r of grid) widest = Math.max(widest, r.length);
  const width = Math.max(table.columns.length, col + widest);
  const columns = [...table.columns];
  while (columns.length < width) columns.push(`column ${columns.length + 1}`);
  const rows = table.rows.map((r) => [...r, ...new Array<Cell>(width - r.length).fill(null)]);
  grid.forEach((cells, i) => {
    while (rows.length <= row + i) rows.push(new Array<Cell>(width).fill(null));
    cells.forEach((c, j) => {
      rows[row + i][col + j] = cellValue(c, mark);
    });
  });
  return { columns, rows };
}

/** A profile file read into a table, with what the reading skipped or assumed (in words). */
export interface ImportedTable {
  table: ProfileTable;
  /** shared-core sentences (pass them through shownText) */
  notes: string[];
}

/**
 * A CSV (or semicolon, tab or bar separated) file as a table: instrument preamble and comment lines are
 * skipped and said so, cells are read with the decimal mark the file shows (shared-core's reader), blanks
 * become empty cells.
 */
export function importCsv(text: string): ImportedTable {
  const t = readCsvTable(text);
  const rows = t.rows.map((r) => t.columns.map((_, i) => (r[i] === undefined || r[i] === '' ? null : r[i])));
  return { table: { columns: t.columns, rows }, notes: t.warnings.map((w) => w.message) };
}

/** True when the pasted text is a block (several cells), not a single value. */
export function isBlock(text: string): boolean {
  return /[\t\n]/.test(text.trim());
}
