import { parseQuantity, displayUnit, fromDisplay, type UnitSystem } from '../../../shared-core/units/units';
import { InputError } from '../../../shared-core/core/errors';
import { readNumberCell } from '../../../shared-core/units/number';
import type { QuantityInput } from '../../../shared-core/site/schema';
import { formatNumber, safeDisplay } from './format';

/** What a quantity field shows and knows about its value. */
export interface QuantityState {
  /** SI value, or undefined when empty or invalid */
  si?: number;
  error?: string;
}

const BARE_NUMBER = /^\s*[-+]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][-+]?\d+)?\s*$/;

/** Reads a stored quantity (SI number or typed text) into SI, with the reason when it cannot. */
export function readQuantity(value: QuantityInput | undefined, siUnit: string, label: string): QuantityState {
  if (value === undefined || value === '') return {};
  if (typeof value === 'number') return { si: value };
  try {
    return { si: parseQuantity(label, value, siUnit) };
  } catch (e) {
    return { error: e instanceof InputError ? reason(e) : String(e) };
  }
}

function reason(e: InputError): string {
  // InputError messages start with "field = value is not allowed:"; the field is labelled on screen
  const m = /is not allowed:\s*(.*)$/s.exec(e.message);
  return m ? m[1] : e.message;
}

/** The text a field shows for a stored value: typed text as typed, SI numbers in the display unit. */
export function fieldText(value: QuantityInput | undefined, siUnit: string, system: UnitSystem): string {
  if (value === undefined) return '';
  if (typeof value === 'string') return value;
  return formatNumber(safeDisplay(value, siUnit, system).value, 6);
}

/**
 * What to store for typed text. A bare number means the unit shown beside the field: stored as a
 * number in SI when that is SI, otherwise as the text with the unit ("30 ft"). Text with a unit is kept as
 * typed. The number is read by the one shared parser: under a US unit "1,500" is fifteen hundred; under an
 * SI unit an ambiguous "1,500" is kept as typed, and reading it names both readings.
 */
export function storedValue(text: string, siUnit: string, system: UnitSystem): QuantityInput | undefined {
  const t = text.trim();
  if (t === '') return undefined;
  if (!BARE_NUMBER.test(t)) return t.slice(0, 64);
  const unit = displayUnit(siUnit, system);
  let n: number | undefined;
  try {
    n = readNumberCell(unit, t, unit === siUnit ? 'either' : 'point');
  } catch (e) {
    if (e instanceof InputError) return t;
    throw e;
  }
  if (n === undefined) return t;
  if (unit === siUnit) return n;
  try {
    fromDisplay(n, siUnit, system);
    return `${t} ${unit}`;
  } catch {
    return n;
  }
}

/** The SI value shown in the display system, for the hint beside a field holding typed text. */
export function hintText(si: number | undefined, siUnit: string, system: UnitSystem): string {
  if (si === undefined) return '';
  const d = safeDisplay(si, siUnit, system);
  return `${formatNumber(d.value)}`;
}
