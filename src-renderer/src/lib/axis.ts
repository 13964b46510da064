import type { UnitSystem } from '../../../shared-core/units/units';
import { safeDisplay, prettyUnit } from './format';

/** A linear map SI → display unit (affine, so temperatures work) and the unit's display name. */
export function displayMap(siUnit: string, system: UnitSystem): { map: (v: number) => number; unit: string } {
  const a = safeDisplay(0, siUnit, system),
    b = safeDisplay(1, siUnit, system);
  const scale = b.value - a.value,
    offset = a.value;
  return { map: (v) => offset + scale * v, unit: prettyUnit(a.unit) };
}

export function axisTitle(label: string, unit: string): string {
  return unit ? `${label} (${unit})` : label;
}
