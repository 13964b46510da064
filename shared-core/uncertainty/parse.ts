import { InputError } from '../core/errors';
import { parseQuantity } from '../units/units';

/** The number before a "%": digits with one decimal mark (point or comma), an optional exponent. */
const PERCENT_NUMBER = /^\+?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][-+]?\d+)?$/;

/**
 * Reads a standard uncertainty as typed: "0.004" (SI), "0.5 ft" (any unit of the quantity; temperature
 * units as differences, so "1 degF" is 5/9 K) or "10%" (relative to the nominal value). Returns SI.
 */
export function parseStandardUncertainty(name: string, text: string, siUnit: string, nominal: number): number {
  const field = `uncertainty of ${name}`;
  const trimmed = text.trim();
  if (trimmed.endsWith('%')) {
    const number = trimmed.slice(0, -1).trim();
    // a number must stand before the sign: "%" alone or "ft%" is refused, never read as 0
    const percent = PERCENT_NUMBER.test(number) ? Number(number.replace(',', '.')) : NaN;
    if (!(Number.isFinite(percent) && percent >= 0))
      throw new InputError(field, text, '%', '≥ 0 %', 'a relative uncertainty is a number ≥ 0 followed by %');
    return (Math.abs(nominal) * percent) / 100;
  }
  const unit = /^[-+]?[\d.,]+(?:[eE][-+]?\d+)?\s*(.*)$/.exec(trimmed)?.[1].trim() ?? '';
  // a difference: subtracting the zero of the typed unit removes any offset (°F, °C)
  const u = parseQuantity(field, trimmed, siUnit) - (unit ? parseQuantity(field, `0 ${unit}`, siUnit) : 0);
  if (!(u >= 0)) throw new InputError(field, text, siUnit, '≥ 0', 'a standard uncertainty is ≥ 0');
  return u;
}
