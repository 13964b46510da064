import { nameText } from '../../../shared-core/core/vocabulary';
import { displayUnit, toDisplay, type UnitSystem } from '../../../shared-core/units/units';

/** Unit names as people read them (m3/s → m³/s, degC → °C): the one table of shared-core/units/format. */
export { prettyUnit } from '../../../shared-core/units/format';
import { prettyUnit } from '../../../shared-core/units/format';

/** A number with about four significant digits, no trailing zeros, exponent form when very large/small. */
export function formatNumber(v: number, digits = 4): string {
  if (!Number.isFinite(v)) return String(v);
  if (v === 0) return '0';
  const a = Math.abs(v);
  if (a >= 1e6 || a < 1e-3) return v.toExponential(digits - 1).replace(/\.?0+e/, 'e');
  const s = v.toPrecision(digits);
  return s.includes('.') && !s.includes('e') ? s.replace(/\.?0+$/, '') : String(Number(s));
}

/** An SI value shown in the display system: "65.62 ft". */
export function showQuantity(value: number, siUnit: string, system: UnitSystem): { text: string; unit: string } {
  const d = safeDisplay(value, siUnit, system);
  return { text: formatNumber(d.value), unit: prettyUnit(d.unit) };
}

/** toDisplay that never throws (an unknown unit stays SI). */
export function safeDisplay(value: number, siUnit: string, system: UnitSystem): { value: number; unit: string } {
  try {
    return toDisplay(value, siUnit, system);
  } catch {
    return { value, unit: siUnit };
  }
}

export function shownUnit(siUnit: string, system: UnitSystem): string {
  return prettyUnit(displayUnit(siUnit, system));
}

/** A parameter or result name as people read it ("l_q" → "Jet length scale L_Q (Q/√M)"), from the one vocabulary. */
export function words(name: string, method?: string, role?: 'input' | 'result'): string {
  return nameText(name, method, role);
}
