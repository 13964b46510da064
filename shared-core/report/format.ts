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
