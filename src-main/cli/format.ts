import { formatNumber } from '../../shared-core/core/errors';
import { sentenceIn } from '../../shared-core/units/sentence';
import { toDisplay, type UnitSystem } from '../../shared-core/units/units';
import { SCREENING_CAUTION } from '../../shared-core/core/caution';
import type { CalcOutput, CalcMethod } from '../../shared-core/calc/types';
import { MONTE_CARLO_JCGM101, type UncertaintyResult } from '../../shared-core/uncertainty';

/** An SI value in the unit system's display unit (an unknown unit stays SI). */
function shown(value: number, siUnit: string, system: UnitSystem): { value: number; unit: string } {
  try {
    return toDisplay(value, siUnit, system);
  } catch {
    return { value, unit: siUnit };
  }
}

/** "12.5 ft": a value and unit name as the terminal shows them, in the chosen system. */
export function quantityText(value: number, siUnit: string, system: UnitSystem): string {
  const d = shown(value, siUnit, system);
  return `${formatNumber(d.value)}${d.unit && d.unit !== '1' ? ' ' + d.unit : ''}`;
}

/** A spread (standard deviation, standard uncertainty) in the chosen system: a temperature converts without its offset. */
function spreadText(u: number, siUnit: string, system: UnitSystem): string {
  const d = shown(u, siUnit, system);
  const zero = shown(0, siUnit, system).value;
  return `${formatNumber(d.value - zero)}${d.unit && d.unit !== '1' ? ' ' + d.unit : ''}`;
}

/** Plain-text rendering of a calc result for a terminal, numbers and sentences in the chosen unit system. */
export function formatCalcText(
  method: CalcMethod,
  out: CalcOutput,
  appendix?: string,
  system: UnitSystem = 'si',
): string {
  const lines = [`${method.title} (${method.id})`];
  const width = Math.max(...Object.keys(out.results).map((k) => k.length));
  for (const [name, r] of Object.entries(out.results)) {
    const v = typeof r.value === 'number' ? quantityText(r.value, r.unit, system) : sentenceIn(r.value, system);
    lines.push(`  ${name.padEnd(width)}  ${v}`);
  }
  if (out.warnings.length) lines.push('Warnings:', ...out.warnings.map((w) => `  ! ${sentenceIn(w.message, system)}`));
  lines.push('Sources:', ...out.sources.map((s) => `  - ${s}`));
  if (appendix) lines.push('', appendix);
  lines.push('', SCREENING_CAUTION);
  return lines.join('\n');
}

/**
 * Plain-text rendering of the uncertainty bands of a calc result, in the chosen unit system; `inputUnit` gives
 * the SI unit of an input (its standard uncertainty is shown as a difference in that quantity).
 */
export function formatUncertaintyText(
  r: UncertaintyResult,
  system: UnitSystem = 'si',
  inputUnit: (name: string) => string = () => '1',
): string {
  const pc = Math.round(r.coverage * 100);
  const lines = [
    `Uncertainty: ${pc} % band from ${r.evaluated} of ${r.samples} Monte Carlo draws`,
    `  inputs (one standard deviation): ${r.inputs.map((i) => `${i.name} ± ${spreadText(i.standardUncertainty, inputUnit(i.name), system)}`).join(', ')}`,
  ];
  const width = Math.max(...r.bands.map((b) => b.name.length));
  for (const b of r.bands) {
    const at = (x: number) => shown(x, b.unit, system).value;
    const unit = shown(b.low, b.unit, system).unit;
    const u = unit && unit !== '1' ? ' ' + unit : '';
    lines.push(
      `  ${b.name.padEnd(width)}  ${formatNumber(at(b.low))} … ${formatNumber(at(b.high))}${u}  (median ${formatNumber(at(b.median))}, s.d. ${spreadText(b.standardDeviation, b.unit, system)})`,
    );
  }
  if (r.warnings.length) lines.push(...r.warnings.map((w) => `  ! ${sentenceIn(w.message, system)}`));
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
