import { qty } from './quantity-text';

/** A number with its unit for a message: a quantity token (shown in the reader's units), a plain number without a unit. */
export function valueText(x: number, unit: string, digits = 6): string {
  if (!Number.isFinite(x)) return Number.isNaN(x) ? 'not a number' : x > 0 ? 'infinite' : 'minus infinite';
  return unit && unit !== '1' ? qty(x, unit, digits) : formatNumber(Number(x.toPrecision(digits)));
}

/**
 * A bad input: names the field, the value, its unit and the allowed range. A numeric value is a quantity
 * token (the edges show it in the reader's units); a text value is quoted as typed, without a unit after it.
 */
export class InputError extends Error {
  readonly field: string;
  readonly value: unknown;
  readonly unit: string;
  readonly allowed: string;
  /** why the value is refused, when it is not only outside the range ("it is not a number") */
  readonly detail?: string;

  constructor(field: string, value: unknown, unit: string, allowed: string, detail?: string) {
    const shown = typeof value === 'number' ? valueText(value, unit) : JSON.stringify(value);
    super(`${field} = ${shown} is not allowed: ${detail ?? `allowed range is ${allowed}`}`);
    this.name = 'InputError';
    this.field = field;
    this.value = value;
    this.unit = unit;
    this.allowed = allowed;
    if (detail !== undefined) this.detail = detail;
  }
}

export function formatNumber(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  const a = Math.abs(x);
  if (a >= 1e6 || a < 1e-3) return x.toExponential(3).replace(/\.?0+e/, 'e');
  return String(Number(x.toPrecision(6)));
}

/** A length or flow in running text: four significant figures ("29.87", not "29.8704"). */
export function formatShort(x: number): string {
  return Number.isFinite(x) ? formatNumber(Number(x.toPrecision(4))) : String(x);
}

/**
 * A computation that failed inside a method although its inputs were valid (a root not bracketed, a
 * non-finite result, an eigen-solver that did not converge): an internal error, never reported as bad input.
 */
export class ComputationError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ComputationError';
  }
}
