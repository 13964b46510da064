/** A bad input: names the field, the value, its unit and the allowed range. */
export class InputError extends Error {
  readonly field: string;
  readonly value: unknown;
  readonly unit: string;
  readonly allowed: string;

  constructor(field: string, value: unknown, unit: string, allowed: string, detail?: string) {
    const shown = typeof value === 'number' ? formatNumber(value) : JSON.stringify(value);
    const unitText = unit && unit !== '1' ? ` ${unit}` : '';
    super(`${field} = ${shown}${unitText} is not allowed: ${detail ?? `allowed range is ${allowed}`}`);
    this.name = 'InputError';
    this.field = field;
    this.value = value;
    this.unit = unit;
    this.allowed = allowed;
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
