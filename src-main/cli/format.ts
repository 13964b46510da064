import { formatNumber } from '../../shared-core/core/errors';
import { SCREENING_CAUTION } from '../../shared-core/core/caution';
import type { CalcOutput, CalcMethod } from '../../shared-core/calc/types';
import { MONTE_CARLO_JCGM101, type UncertaintyResult } from '../../shared-core/uncertainty';

/** Plain-text rendering of a calc result for a terminal. */
export function formatCalcText(method: CalcMethod, out: CalcOutput, appendix?: string): string {
  const lines = [`${method.title} (${method.id})`];
  const width = Math.max(...Object.keys(out.results).map((k) => k.length));
  for (const [name, r] of Object.entries(out.results)) {
    const v = typeof r.value === 'number' ? formatNumber(r.value) : r.value;
    lines.push(`  ${name.padEnd(width)}  ${v}${r.unit && r.unit !== '1' ? ' ' + r.unit : ''}`);
  }
  if (out.warnings.length) lines.push('Warnings:', ...out.warnings.map((w) => `  ! ${w.message}`));
  lines.push('Sources:', ...out.sources.map((s) => `  - ${s}`));
  if (appendix) lines.push('', appendix);
  lines.push('', SCREENING_CAUTION);
  return lines.join('\n');
}

/** Plain-text rendering of the uncertainty bands of a calc result. */
export function formatUncertaintyText(r: UncertaintyResult): string {
  const pc = Math.round(r.coverage * 100);
  const lines = [
    `Uncertainty: ${pc} % band from ${r.evaluated} of ${r.samples} Monte Carlo draws`,
    `  inputs (one standard deviation): ${r.inputs.map((i) => `${i.name} ± ${formatNumber(i.standardUncertainty)}`).join(', ')}`,
  ];
  const width = Math.max(...r.bands.map((b) => b.name.length));
  for (const b of r.bands) {
    const u = b.unit && b.unit !== '1' ? ' ' + b.unit : '';
    lines.push(
      `  ${b.name.padEnd(width)}  ${formatNumber(b.low)} … ${formatNumber(b.high)}${u}  (median ${formatNumber(b.median)}, s.d. ${formatNumber(b.standardDeviation)})`,
    );
  }
  if (r.warnings.length) lines.push(...r.warnings.map((w) => `  ! ${w.message}`));
  lines.push(
    `  - ${MONTE_CARLO_JCGM101.source}`,
    '  The band covers the stated input uncertainties only, not the error of the method itself.',
  );
  return lines.join('\n');
}

/** The self-description of every method for `gprime calc --list`. */
export function describeMethods(methods: readonly CalcMethod[]) {
  return methods.map((m) => ({
    id: m.id,
    title: m.title,
    topic: m.topic,
    parameters: m.params.map((p) => ({
      name: p.name,
      kind: p.kind,
      description: p.description,
      ...(p.kind === 'number' ? { unit: p.unit, range: p.range ?? {} } : {}),
      ...(p.kind === 'choice' ? { choices: p.choices } : {}),
      ...('default' in p && p.default !== undefined ? { default: p.default } : {}),
      required: !p.optional && !('default' in p && p.default !== undefined),
    })),
    results: m.results.map((r) => ({ name: r.name, unit: r.unit, description: r.description })),
  }));
}
