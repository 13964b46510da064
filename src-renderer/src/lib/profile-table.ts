import {
  parseHeader,
  readCsvTable,
  type ConditionOutcome,
  type ProfileIssue,
  type ProfileTable,
} from '../../../shared-core/site';

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

/** A typed cell: a number when it reads as one, otherwise the text as typed (kept, and marked). */
export function cellValue(text: string): Cell {
  const t = text.trim();
  if (t === '') return null;
  const n = Number(t.replace(/^([-+]?\d+),(\d+)$/, '$1.$2'));
  return /^[-+]?(\d+([.,]\d*)?|[.,]\d+)([eE][-+]?\d+)?$/.test(t) && Number.isFinite(n) ? n : t;
}

const isNumeric = (s: string) => typeof cellValue(s) === 'number';

/**
 * Pastes spreadsheet text (tab-separated rows) into the table at a cell. A block whose first line is all
 * text is taken as a new table with its own header; otherwise the cells are written from the cell on,
 * adding rows (and columns) as needed.
 */
export function pasteBlock(table: ProfileTable, text: string, row: number, col: number): ProfileTable {
  const lines = text
    .replace(/\r/g, '')
    .split('\n')
    .filter((l) => l.trim() !== '');
  const grid = lines.map((l) => l.split('\t'));
  if (grid.length === 0) return table;
  if (grid[0].every((c) => !isNumeric(c)) && grid.length > 1) {
    const columns = grid[0].map((c) => c.trim());
    return { columns, rows: grid.slice(1).map((r) => columns.map((_, i) => cellValue(r[i] ?? ''))) };
  }
  const width = Math.max(table.columns.length, col + Math.max(...grid.map((r) => r.length)));
  const columns = [...table.columns];
  while (columns.length < width) columns.push(`column ${columns.length + 1}`);
  const rows = table.rows.map((r) => [...r, ...new Array<Cell>(width - r.length).fill(null)]);
  grid.forEach((cells, i) => {
    while (rows.length <= row + i) rows.push(new Array<Cell>(width).fill(null));
    cells.forEach((c, j) => {
      rows[row + i][col + j] = cellValue(c);
    });
  });
  return { columns, rows };
}

/** A CSV (or semicolon/tab separated) file as a table, cells typed as in the editor. */
export function importCsv(text: string): ProfileTable {
  const t = readCsvTable(text);
  return { columns: t.columns, rows: t.rows.map((r) => t.columns.map((_, i) => cellValue(String(r[i] ?? '')))) };
}

/** True when the pasted text is a block (several cells), not a single value. */
export function isBlock(text: string): boolean {
  return /[\t\n]/.test(text.trim());
}
