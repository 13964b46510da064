import { InputError, valueText } from './errors';

/** A closed or half-open interval in SI units; an open end is marked exclusive. */
export interface Range {
  min?: number;
  max?: number;
  /** the lower bound itself is not allowed (e.g. a density must be > 0) */
  minExclusive?: boolean;
  maxExclusive?: boolean;
}

/** The range in words, each bound a quantity token: "≥ ⟦-3|degC⟧ and ≤ ⟦60|degC⟧" (shown "≥ −3 °C and ≤ 60 °C"). */
export function describeRange(r: Range, unit: string): string {
  const lo = r.min === undefined ? undefined : `${r.minExclusive ? '>' : '≥'} ${valueText(r.min, unit)}`;
  const hi = r.max === undefined ? undefined : `${r.maxExclusive ? '<' : '≤'} ${valueText(r.max, unit)}`;
  if (lo && hi) return `${lo} and ${hi}`;
  return lo ?? hi ?? 'any finite number';
}

export function inRange(x: number, r: Range): boolean {
  if (r.min !== undefined && (r.minExclusive ? x <= r.min : x < r.min)) return false;
  if (r.max !== undefined && (r.maxExclusive ? x >= r.max : x > r.max)) return false;
  return true;
}

/** Throws an InputError unless x is finite and inside r. Returns x for chaining. */
export function requireInRange(field: string, x: number, unit: string, r: Range = {}): number {
  if (typeof x !== 'number' || !Number.isFinite(x)) {
    throw new InputError(field, x, unit, describeRange(r, unit), 'a finite number is required');
  }
  if (!inRange(x, r)) throw new InputError(field, x, unit, describeRange(r, unit));
  return x;
}

export const positive: Range = { min: 0, minExclusive: true };
export const nonNegative: Range = { min: 0 };
