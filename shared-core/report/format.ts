/**
 * Number and unit text for reports: the same strings in the PDF, the charts and the spreadsheets.
 * Pure and deterministic.
 */

export { prettyUnit, formatValue, withUnit } from '../units/format';

/** "late summer" → "late-summer": safe file and sheet names. */
export function slug(text: string, max = 60): string {
  const s = text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return (s || 'item').slice(0, max).replace(/-+$/, '');
}

/** "rho_upper" → "rho upper": a parameter name as a readable label. */
export function readableName(name: string): string {
  return name.replace(/_/g, ' ');
}

/**
 * The one significant-figure rule of the report: four figures, enough to recompute a product or quotient of
 * printed values to about 0.1 %; densities six, so that a density difference (and g′ from it) can be recomputed
 * from the printed densities: 0.01 kg/m³ or finer (0.0001 lb/ft³ ≈ 0.0016 kg/m³ in the US edition).
 */
export function figuresFor(unit: string): number {
  return unit === 'kg/m3' || unit === 'lb/ft3' ? 6 : 4;
}

/** The rule in words, for the cautions. */
export const FIGURES_RULE =
  'Values are rounded to four significant figures and densities to six (0.01 kg/m³ or finer), so that each derived value can be recomputed from the printed ones to within 0.5 %';
