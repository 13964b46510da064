import type { EstimateOutcome } from '../../../shared-core/site/assess';
import type { ResultValue } from '../../../shared-core/calc/types';
import type { UnitSystem } from '../../../shared-core/units/units';
import { SCREENING_CAUTION } from '../../../shared-core/core/caution';
import type { UncertaintyResult } from '../../../shared-core/uncertainty';
import { showQuantity, words } from './format';
import { BAND_NOTE, bandTableRows } from './band-text';
import { shownText } from './messages';

/** Tabs and line breaks would split a spreadsheet cell: they become spaces. */
const cell = (s: string): string => s.replace(/[\t\r\n]+/g, ' ').trim();

function rows(
  values: Record<string, ResultValue>,
  system: UnitSystem,
  method: string,
  role: 'input' | 'result',
): string[] {
  return Object.entries(values).map(([name, v]) => {
    const label = words(name, method, role);
    if (typeof v.value !== 'number') return [label, cell(shownText(v.value, system, { method })), ''].join('\t');
    const shown = showQuantity(v.value, v.unit, system);
    return [label, shown.text, shown.unit].map(cell).join('\t');
  });
}

/**
 * An estimate's results and inputs as tab-separated text that pastes into a spreadsheet: one
 * name / value / unit row per quantity, in the display units and digits the workspace shows, then its
 * warnings, method, sources and the screening caution, so a pasted table never loses them. A computed
 * uncertainty band adds its low / median / high rows, the input uncertainties and its warnings.
 */
export function resultsTableText(
  o: EstimateOutcome,
  system: UnitSystem,
  methodTitle = '',
  band?: UncertaintyResult,
): string {
  const plain = (text: string) => cell(shownText(text, system, { method: o.method }));
  const where = [o.feature?.name, o.condition?.name].filter(Boolean).join(' · ');
  const lines = [
    [cell(o.title), cell(where)].join('\t'),
    ['result', 'value', 'unit'].join('\t'),
    ...rows(o.results, system, o.method, 'result'),
  ];
  if (o.status === 'error') lines.push(['cannot compute', plain(o.error ?? '')].join('\t'));
  if (o.status === 'incomplete') lines.push(['incomplete', plain(o.incomplete ?? '')].join('\t'));
  lines.push('', ['input', 'value', 'unit'].join('\t'), ...rows(o.inputs, system, o.method, 'input'), '');
  if (band)
    lines.push(
      ...bandTableRows(band, system, (name) => o.inputs[name]?.unit ?? '1', o.method),
      ['band note', BAND_NOTE].join('\t'),
      '',
    );
  lines.push(...o.warnings.map((w) => ['warning', plain(w.message)].join('\t')));
  lines.push(['method', cell(methodTitle || o.method)].join('\t'));
  lines.push(...o.sources.map((s) => ['source', plain(s)].join('\t')));
  lines.push(['caution', SCREENING_CAUTION].join('\t'));
  return `${lines.join('\n')}\n`;
}
