import { renderQuantities } from '../core/quantity-text';
import { withUnit } from './format';
import { toDisplay, type UnitSystem } from './units';

/**
 * A sentence from shared-core (warning, error, text result) with its quantity tokens shown in the
 * reader's unit system, rounded for people: "port flows ⟦4.572|m⟧" → "port flows 15 ft" (US).
 * Every edge (workspace, CLI, report) shows shared-core text through this one function.
 */
export function sentenceIn(text: string, system: UnitSystem, digits = 4): string {
  return renderQuantities(text, (value, siUnit, d) => {
    const shown = safeToDisplay(value, siUnit, system);
    return withUnit(shown.value, shown.unit, d ?? digits);
  });
}

function safeToDisplay(value: number, siUnit: string, system: UnitSystem): { value: number; unit: string } {
  if (!Number.isFinite(value)) return { value, unit: siUnit };
  // a temperature difference: 1 K = 1.8 °F, with no offset
  if (siUnit === 'K' && system === 'us') return { value: value * 1.8, unit: 'degF' };
  try {
    return toDisplay(value, siUnit, system);
  } catch {
    return { value, unit: siUnit };
  }
}
