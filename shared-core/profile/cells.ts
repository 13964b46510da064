import { InputError } from '../core/errors';
import { decimalMarkOf, readNumberCell, type DecimalMark } from '../units/number';

/** A table cell as typed or read: a number, text, or nothing. */
export type Cell = string | number | null | undefined;

/** Text that means "no value": blank, NaN, NA, null, dashes, asterisks, spreadsheet errors. */
const MISSING_TEXT = /^(|nan|na|n\/a|null|none|missing|nd|-+|—|–|\*+|#n\/a|#value!|#div\/0!)$/i;

/** Numbers instruments and databases write for "no value" (the −9.99e-29 of CTD software among them). */
const FLAG_VALUES = new Set([-9999, -999, 9999, 99999, -99999, -9.99e-29]);

/** What one cell holds: a value, a gap (blank, NaN or a flag value) or text that is not a number. */
export type CellReading =
  { kind: 'value'; value: number } | { kind: 'gap'; shown: string } | { kind: 'text'; shown: string };

/**
 * Reads one cell. `mark` is the decimal mark the table shows (see tableDecimalMark); an ambiguous "1,500"
 * under `either` is text with the reason (both readings).
 */
export function readCell(cell: Cell, mark: DecimalMark, column: string): CellReading {
  if (typeof cell === 'number')
    return Number.isFinite(cell) && !FLAG_VALUES.has(cell)
      ? { kind: 'value', value: cell }
      : { kind: 'gap', shown: String(cell) };
  const t = (cell ?? '').trim();
  if (MISSING_TEXT.test(t)) return { kind: 'gap', shown: t };
  try {
    const v = readNumberCell(column, t, mark);
    if (v === undefined) return { kind: 'text', shown: `"${t}" is not a number` };
    return FLAG_VALUES.has(v) ? { kind: 'gap', shown: t } : { kind: 'value', value: v };
  } catch (e) {
    if (e instanceof InputError) return { kind: 'text', shown: e.message };
    throw e;
  }
}

/** The decimal mark the text cells of a table show; `fallback` when they do not tell. */
export function tableDecimalMark(rows: readonly (readonly Cell[])[], fallback: DecimalMark): DecimalMark {
  function* texts(): Generator<string> {
    for (const r of rows) for (const c of r) if (typeof c === 'string') yield c;
  }
  return decimalMarkOf(texts(), fallback);
}

/** "4, 7–9, 12" from sorted 1-based row numbers; long lists end in "… (N rows)". */
export function describeRows(rows: readonly number[], max = 12): string {
  const parts: string[] = [];
  for (let i = 0; i < rows.length;) {
    let j = i;
    while (j + 1 < rows.length && rows[j + 1] === rows[j] + 1) j++;
    parts.push(j > i ? `${rows[i]}–${rows[j]}` : `${rows[i]}`);
    i = j + 1;
  }
  const shown = parts.length > max ? `${parts.slice(0, max).join(', ')}, …` : parts.join(', ');
  return `${rows.length === 1 ? 'row' : 'rows'} ${shown}${parts.length > max ? ` (${rows.length} rows)` : ''}`;
}
