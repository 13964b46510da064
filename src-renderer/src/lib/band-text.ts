import type { ResultBand, UncertaintyResult } from '../../../shared-core/uncertainty';
import type { UnitSystem } from '../../../shared-core/units/units';
import { namesAsWords } from './messages';
import { formatNumber, prettyUnit, safeDisplay, showQuantity, words } from './format';

/** A spread (a difference, e.g. a standard uncertainty) in display units: °F converts without its offset. */
export function showSpread(u: number, siUnit: string, system: UnitSystem): { text: string; unit: string } {
  const d = safeDisplay(u, siUnit, system);
  return { text: formatNumber(d.value - safeDisplay(0, siUnit, system).value), unit: prettyUnit(d.unit) };
}

export const coverageText = (r: UncertaintyResult): string => `${formatNumber(Math.round(r.coverage * 1000) / 10)} %`;

/** low, median and high of a band in display units, with the unit. */
export function bandValues(
  b: ResultBand,
  system: UnitSystem,
): { low: string; median: string; high: string; unit: string } {
  const [low, median, high] = [b.low, b.median, b.high].map((v) => showQuantity(v, b.unit, system));
  return { low: low.text, median: median.text, high: high.text, unit: low.unit };
}

/** "90 % band 8.3 – 54 km": the band of one result in one line. */
export function bandLine(r: UncertaintyResult, b: ResultBand, system: UnitSystem): string {
  const v = bandValues(b, system);
  return `${coverageText(r)} band ${v.low} – ${v.high}${v.unit ? `\u202f${v.unit}` : ''}`;
}

/** Tab-separated rows of a band for the "Copy table" text. */
export function bandTableRows(
  r: UncertaintyResult,
  system: UnitSystem,
  inputUnit: (name: string) => string,
  method?: string,
): string[] {
  const head = [`${coverageText(r)} band`, 'low', 'median', 'high', 'unit'].join('\t');
  const rows = r.bands.map((b) => {
    const v = bandValues(b, system);
    return [words(b.name, method, 'result'), v.low, v.median, v.high, v.unit].join('\t');
  });
  const inputs = r.inputs.map((i) => {
    const s = showSpread(i.standardUncertainty, inputUnit(i.name), system);
    return [`± ${words(i.name, method, 'input')} (one standard deviation)`, s.text, s.unit].join('\t');
  });
  return [
    head,
    ...rows,
    ...inputs,
    ...r.warnings.map((w) =>
      ['band warning', namesAsWords(w.message, method, system).replace(/[\t\r\n]+/g, ' ')].join('\t'),
    ),
  ];
}

export const BAND_NOTE = 'The band covers the stated input uncertainties only, not the error of the method itself.';
