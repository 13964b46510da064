import Papa from 'papaparse';
import { note, type Warning } from '../core/warning';
import { isKnownUnit } from '../units/units';
import { readCell, tableDecimalMark, describeRows, type Cell } from './cells';
import { LABEL_NAME, parseHeader, roleOf, VERTICAL_ROLES } from './headers';

/** A profile as a table: header texts (name and unit, e.g. "depth (ft)") and rows of cells. */
export interface ProfileTable {
  columns: string[];
  rows: (string | number | null)[][];
}

/** A table read from text, with what was skipped on the way (preamble, comments, a units line). */
export interface CsvTable extends ProfileTable {
  warnings: Warning[];
}

const DELIMITERS = [',', ';', '\t', '|'] as const;
/** Comment and metadata lines of instrument exports. */
const COMMENT = /^\s*(#|%|\*|\/\/)/;
/** Lines searched for the header. */
const HEAD_LINES = 200;

interface Line {
  number: number;
  text: string;
}

const split = (text: string, delimiter: string): string[][] =>
  Papa.parse<string[]>(text, { delimiter, skipEmptyLines: false }).data;

interface HeaderGuess {
  index: number;
  width: number;
  /** the header names a vertical coordinate */
  named: boolean;
  /** rows of the header's width from it on (for a header found by width alone) */
  run: number;
}

/** The header among the lines for one delimiter: the first row naming a vertical coordinate, else the longest block. */
function findHeader(lines: readonly Line[], delimiter: string): HeaderGuess {
  const rows = split(lines.map((l) => l.text).join('\n'), delimiter);
  for (let i = 0; i + 1 < rows.length; i++) {
    const r = rows[i];
    const vertical = r.some((h) => VERTICAL_ROLES.includes(roleOf(parseHeader(h)) as never));
    if (r.length >= 2 && vertical && rows[i + 1].length >= r.length - 1)
      return { index: i, width: r.length, named: true, run: 0 };
  }
  let best: HeaderGuess = { index: 0, width: 0, named: false, run: 0 };
  let start = 0;
  for (let i = 0; i < rows.length; i++) {
    if (i > 0 && rows[i].length !== rows[i - 1].length) start = i;
    const run = i - start + 1;
    if (rows[start].length >= 2 && run > best.run)
      best = { index: start, width: rows[start].length, named: false, run };
  }
  return best;
}

/** Quotes a few skipped lines for a warning. */
function quote(lines: readonly Line[]): string {
  const shown = lines.slice(0, 3).map((l) => `"${l.text.length > 60 ? `${l.text.slice(0, 57)}…` : l.text}"`);
  return shown.join(', ') + (lines.length > 3 ? ', …' : '');
}

/**
 * Reads CSV text into a table: comma, semicolon, tab or bar separated. Instrument preamble and metadata lines
 * before the header, comment lines (#, %, *, //) and blank lines are skipped and reported as a note; the
 * header is the first line naming a depth, elevation or pressure column (else the first line of the longest
 * block of equally wide lines). A line of units under the header is merged into it. Numeric cells become
 * numbers, read with the decimal mark the file shows (a semicolon file defaults to decimal commas); other
 * cells stay text.
 */
export function readCsvTable(text: string): CsvTable {
  const all = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  const kept: Line[] = [];
  const comments: Line[] = [];
  all.forEach((t, i) => {
    if (t.trim() === '') return;
    (COMMENT.test(t) ? comments : kept).push({ number: i + 1, text: t });
  });
  const head = kept.slice(0, HEAD_LINES);
  const found = DELIMITERS.map((d) => ({ d, ...findHeader(head, d) }));
  const pick =
    found.filter((f) => f.named).sort((a, b) => b.width - a.width)[0] ??
    found.filter((f) => f.run > 0).sort((a, b) => b.run - a.run || b.width - a.width)[0] ??
    found[0];
  const preamble = kept.slice(0, pick.index);
  const [header = [], ...data] = split(
    kept
      .slice(pick.index)
      .map((l) => l.text)
      .join('\n'),
    pick.d,
  );
  const warnings: Warning[] = [];
  const skipped = [...comments, ...preamble].sort((a, b) => a.number - b.number);
  if (skipped.length)
    warnings.push(
      note(
        'preamble-skipped',
        `Skipped ${skipped.length} line(s) of metadata, comments or preamble (file ${describeRows(skipped.map((l) => l.number)).replace(/^rows?/, 'line(s)')}): ${quote(skipped)}.`,
        'file',
      ),
    );
  const columns = header.map((h) => h.trim());
  if (data.length && data[0].every((c) => c.trim() === '' || isKnownUnit(c.trim())) && data[0].some((c) => c.trim())) {
    const units = data.shift()!;
    columns.forEach((c, i) => {
      const u = (units[i] ?? '').trim();
      if (u && !parseHeader(c).unit) columns[i] = `${c} (${u})`;
    });
    warnings.push(note('units-line', `Read the units from the line under the header: ${units.join(', ')}.`, 'file'));
  }
  const mark = tableDecimalMark(data, pick.d === ';' ? 'comma' : 'either');
  const labels = columns.map((c) => LABEL_NAME.test(parseHeader(c).name.replace(/[\s.-]+/g, '_')));
  const rows = data.map((r) =>
    r.map((c, i): string | number | null => {
      if (labels[i]) return c;
      const read = readCell(c as Cell, mark, '');
      return read.kind === 'value' ? read.value : c;
    }),
  );
  return { columns, rows, warnings };
}
