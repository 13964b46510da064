/**
 * Numbers inside sentences (warnings, errors, text results, outcome lines) stay SI with their unit, marked
 * as tokens, so that each edge shows them in the reader's unit system: `qty(4.572, 'm')` → "⟦4.572|m⟧",
 * shown as "4.572 m" or "15 ft". Sentences never carry a number already converted or rounded for people.
 * A temperature difference is in 'K' (a temperature in 'degC'), so that no offset is applied to it.
 */

const OPEN = '\u27e6';
const CLOSE = '\u27e7';
const TOKEN = /\u27e6(-?[0-9.eE+-]+|NaN|-?Infinity)\|([^|\u27e7]*)(?:\|(\d+))?\u27e7/g;

/** A quantity in a sentence: SI value, its SI unit name ('m', 'm3/s', 'degC', 'K', '1' …), optional significant figures. */
export function qty(value: number, siUnit: string, digits?: number): string {
  return `${OPEN}${String(value)}|${siUnit}${digits ? `|${digits}` : ''}${CLOSE}`;
}

/** Shows one quantity token: SI value and unit (and the figures asked for) → text. */
export type QuantityRenderer = (value: number, siUnit: string, digits: number | undefined) => string;

/** The sentence with each quantity token replaced by what `render` makes of it. */
export function renderQuantities(text: string, render: QuantityRenderer): string {
  if (!text.includes(OPEN)) return text;
  return text.replace(TOKEN, (_m, v: string, unit: string, d?: string) =>
    render(Number(v), unit, d ? Number(d) : undefined),
  );
}

/** Whether a text still holds a quantity token (an edge that forgot to render it). */
export function hasQuantityToken(text: string): boolean {
  return text.includes(OPEN) || text.includes(CLOSE);
}
