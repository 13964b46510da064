import { InputError } from '../core/errors';

/**
 * Which decimal mark the context implies: `point` (US customary units, or a file whose numbers show
 * decimal points), `comma` (a file whose numbers show decimal commas), `either` (nothing tells).
 * Only a lone comma followed by exactly three digits ("1,500") depends on it: with `either` it is refused.
 */
export type DecimalMark = 'point' | 'comma' | 'either';

/** Spaces used between digit groups: space, no-break space, thin space, narrow no-break space. */
const GROUP_SPACE = '[ \\u00A0\\u2009\\u202F]';

/** A leading number: sign, digits with grouping spaces, commas or points, an optional exponent. */
const LEADING_NUMBER = new RegExp(
  `^([-+\\u2212]?)((?:\\d|[.,](?=\\d))(?:[\\d.,]|${GROUP_SPACE}(?=\\d{3}(?!\\d)))*)([eE][-+]?\\d+)?`,
);

const GROUP_SPLIT = new RegExp(GROUP_SPACE);
const PLAIN_NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

/** "1,500": one comma, a 1–3 digit lead without leading zero and exactly three digits after. */
const COMMA_GROUP_OR_DECIMAL = /^[1-9]\d{0,2},\d{3}$/;

export interface LeadingNumber {
  value: number;
  /** the number as typed */
  text: string;
  /** what follows the number (the unit), trimmed */
  rest: string;
}

/**
 * Reads the number at the start of `text`: "12.5", "12,5" (decimal comma), "1,500.5" and "1.500,5"
 * (grouped thousands), "12 500" and "1 000" (space-grouped), "1,500,000", "1.5e-3".
 * A lone "1,500" is grouped thousands when `mark` is `point`, a decimal comma when `comma`, and refused
 * with an InputError naming the field and both readings when `either`.
 * @returns undefined when the text does not start with a number
 */
export function readLeadingNumber(
  field: string,
  text: string,
  mark: DecimalMark,
  unit = '',
): LeadingNumber | undefined {
  const t = text.trim();
  const m = LEADING_NUMBER.exec(t);
  if (!m) return undefined;
  const [token, sign, body, exponent = ''] = m;
  const digits = digitsOf(field, t, body, mark, unit);
  if (digits === undefined) return undefined;
  const value = Number(`${sign === '\u2212' ? '-' : sign}${digits}${exponent}`);
  if (!Number.isFinite(value)) return undefined;
  return { value, text: token, rest: t.slice(token.length).trim() };
}

/** The body of a number in plain JavaScript notation ("1500.5"), or undefined when it is not one. */
function digitsOf(field: string, text: string, body: string, mark: DecimalMark, unit: string): string | undefined {
  const groups = body.split(GROUP_SPLIT);
  const spaced = groups.length > 1;
  if (spaced && !groups.every((g, i) => (i === 0 ? /^\d{1,3}$/ : /^\d{3}([.,]\d+)?$/).test(g))) return undefined;
  const b = groups.join('');
  const commas = (b.match(/,/g) ?? []).length;
  const points = (b.match(/\./g) ?? []).length;
  if (commas === 0 && points <= 1) return b;
  if (commas === 0) return /^\d{1,3}(\.\d{3})+$/.test(b) ? b.replace(/\./g, '') : undefined;
  if (points === 0 && commas > 1) return /^\d{1,3}(,\d{3})+$/.test(b) ? b.replace(/,/g, '') : undefined;
  if (points === 0) {
    if (spaced || !COMMA_GROUP_OR_DECIMAL.test(b)) return b.replace(',', '.');
    if (mark === 'point') return b.replace(',', '');
    if (mark === 'comma') return b.replace(',', '.');
    const grouped = b.replace(',', '');
    const decimal = String(Number(b.replace(',', '.')));
    throw new InputError(
      field,
      text,
      unit,
      'a number without ambiguous separators',
      `"${b}" reads as ${grouped} (thousands separator) or as ${decimal} (decimal comma); write ${grouped} or ${decimal}`,
    );
  }
  // both marks: the last one is the decimal mark, the other groups thousands
  if (/^\d{1,3}(,\d{3})*\.\d+$/.test(b)) return b.replace(/,/g, '');
  if (/^\d{1,3}(\.\d{3})*,\d+$/.test(b)) return b.replace(/\./g, '').replace(',', '.');
  return undefined;
}

/** Reads a whole cell as a number (no unit); undefined when it is not one. */
export function readNumberCell(field: string, text: string, mark: DecimalMark): number | undefined {
  if (PLAIN_NUMBER.test(text)) return Number(text);
  const r = readLeadingNumber(field, text, mark);
  return r && r.rest === '' ? r.value : undefined;
}

/**
 * The decimal mark a set of cells shows: a comma where some cell has an unambiguous decimal comma ("12,5",
 * "0,500") and none a decimal point or grouping comma; a point in the opposite case; `fallback` otherwise.
 */
export function decimalMarkOf(cells: Iterable<string>, fallback: DecimalMark): DecimalMark {
  let comma = false,
    point = false;
  for (const raw of cells) {
    const c = raw.trim().replace(/^[-+]/, '');
    if (/^\d*,\d+$/.test(c) && !COMMA_GROUP_OR_DECIMAL.test(c)) comma = true;
    else if (/^\d*\.\d+$/.test(c) || /^\d{1,3}(,\d{3})+\.\d+$/.test(c) || /^\d{1,3}(,\d{3}){2,}$/.test(c)) point = true;
    if (comma && point) return fallback;
  }
  return comma ? 'comma' : point ? 'point' : fallback;
}
