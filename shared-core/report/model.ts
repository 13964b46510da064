import type { Assessment, EstimateOutcome } from '../site/assess';
import { VERDICT_RULE } from '../site/compliance';
import {
  complianceColumns,
  complianceTable,
  derivation,
  verdictLines,
  type ComplianceTable,
  type Derivation,
  type VerdictLine,
} from './compliance';
import { keyResultName, type ResultValue } from '../calc/types';
import { findCalcMethod } from '../calc/registry';
import { toDisplay, type UnitSystem } from '../units/units';
import { chartSpecs, type ChartSpec } from './charts';
import { withReferenceLines } from './figures';
import type { ComplianceRow } from '../site/assess';
import type { ConditionOutcome } from '../site/conditions';
import { figuresFor, FIGURES_RULE, formatValue, prettyUnit, readableName } from './format';
import { documentControl, type DocumentControl } from './document';
import { sentenceIn } from '../units/sentence';
import { nameText } from '../core/vocabulary';
import { methodsForSource } from './methods';
import { verificationEntries, type VerificationEntry } from './verification';
import { siteInputs, type InputLine } from './inputs';
import type { Site } from '../site/schema';

/**
 * The one report model: everything a calc sheet, a spreadsheet or a chart export shows, built from an
 * Assessment in a unit system. Pure: the same assessment and units give the same model.
 */

export interface QuantityRow {
  /** the method's parameter or result name ("g_prime") */
  key: string;
  /** the name in words, from the vocabulary ("Reduced gravity g′") */
  name: string;
  description: string;
  /** number in the display unit, or text */
  value: number | string;
  /** display unit name as used by units.ts ("ft", "m3/s"); '' for text */
  unit: string;
  /** the value as typeset: rounded number or the text */
  shown: string;
  /** the unit as typeset ("m³/s", "°C"; '' for dimensionless) */
  shownUnit: string;
}

export interface MethodText {
  /** title of the method descriptor, when the source belongs to one */
  title?: string;
  equation?: string;
  source: string;
  /** number of the source in the reference list */
  reference: number;
}

export interface EstimateSection {
  /** section number in the report ("3") */
  number: string;
  id: string;
  title: string;
  method: string;
  methodTitle: string;
  feature?: string;
  condition?: string;
  status: 'ok' | 'incomplete' | 'error';
  /** why it was not computed (error) or stopped early (incomplete) */
  error?: string;
  inputs: QuantityRow[];
  results: QuantityRow[];
  methods: MethodText[];
  warnings: string[];
  charts: ChartSpec[];
  /** Monte Carlo bands of the results, when the estimate states input uncertainties */
  uncertainty?: UncertaintySection;
}

/** The uncertainty block of a section, in display units. */
export interface UncertaintySection {
  /** e.g. "90 % band from 1000 Monte Carlo draws (1000 computed)" */
  caption: string;
  coverage: number;
  /** each varied input: nominal value and its standard uncertainty */
  inputs: {
    name: string;
    nominal: string;
    standardUncertainty: string;
    unit: string;
    /** the same in display units, as numbers (null when the nominal is not a number) */
    nominalValue: number | null;
    standardUncertaintyValue: number;
  }[];
  /** per numeric result: nominal, low, median and high, typeset, with the numbers in display units */
  rows: {
    name: string;
    unit: string;
    shown: [string, string, string, string];
    values: [number, number, number, number];
  }[];
  warnings: string[];
}

export interface ContentsEntry {
  number: string;
  title: string;
  /** anchor: 'summary', an estimate id, 'compliance', 'references', 'cautions' */
  anchor: string;
}

export interface ReportModel {
  title: string;
  subtitle: string;
  units: UnitSystem;
  titleBlock: { label: string; value: string }[];
  contents: ContentsEntry[];
  /** one line per estimate: id, method, key result, number of warnings */
  summary: {
    id: string;
    title: string;
    where: string;
    keyResult: string;
    /** the key result as a quantity row, when there is one */
    key?: QuantityRow;
    warnings: number;
    status: 'ok' | 'incomplete' | 'error';
  }[];
  estimates: EstimateSection[];
  compliance: ComplianceTable | null;
  /** per limit, the verdict under its governing condition (page 1) */
  verdicts: VerdictLine[];
  /** headers of the typeset compliance table */
  complianceColumns: string[];
  /** per compliance row: how the verdict was reached, with the warnings of the runs behind it */
  complianceDerivations: Derivation[];
  /** the rule every verdict follows, in words */
  verdictRule: string;
  /** every quantity of the site document as entered, in SI and in display units (empty without the site) */
  inputs: InputLine[];
  /** for each method used: the external checks it passes and how its coefficients were obtained */
  verification: VerificationEntry[];
  /** every cited source, once, in order of first citation */
  references: string[];
  cautions: string[];
  documentControl: DocumentControl;
  /** which density unit the edition uses, in words */
  densityNote: string;
  gprimeVersion: string;
  siteHash: string;
}

function quantity(key: string, name: string, description: string, v: ResultValue, units: UnitSystem): QuantityRow {
  if (typeof v.value !== 'number') {
    const text = sentenceIn(v.value, units);
    return { key, name, description, value: text, unit: '', shown: text, shownUnit: '' };
  }
  const d = toDisplay(v.value, v.unit, units);
  return {
    key,
    name,
    description,
    value: d.value,
    unit: d.unit,
    shown: formatValue(d.value, figuresFor(d.unit)),
    shownUnit: prettyUnit(d.unit),
  };
}

function quantities(
  values: Record<string, ResultValue>,
  label: (key: string) => string,
  describe: (key: string) => string,
  units: UnitSystem,
): QuantityRow[] {
  return Object.entries(values).map(([key, v]) => quantity(key, label(key), describe(key), v, units));
}

/** A spread (difference) in display units: an offset unit such as °F converts without its offset. */
function spreadToDisplay(u: number, siUnit: string, units: UnitSystem): number {
  return toDisplay(u, siUnit, units).value - toDisplay(0, siUnit, units).value;
}

function uncertaintySection(e: EstimateOutcome, units: UnitSystem): UncertaintySection | undefined {
  const r = e.uncertainty;
  if (!r) return undefined;
  const pc = Math.round(r.coverage * 100);
  return {
    caption: `${pc} % band (probabilistically symmetric) from ${r.evaluated} of ${r.samples} Monte Carlo draws; inputs vary as normal distributions with the standard uncertainties below`,
    coverage: r.coverage,
    inputs: r.inputs.map((i) => {
      const nominal = e.inputs[i.name];
      const siUnit = nominal?.unit ?? '1';
      const d = typeof nominal?.value === 'number' ? toDisplay(nominal.value, siUnit, units) : undefined;
      return {
        name: nameText(i.name, e.method, 'input'),
        nominal: d ? formatValue(d.value, figuresFor(d.unit)) : '',
        standardUncertainty: formatValue(spreadToDisplay(i.standardUncertainty, siUnit, units)),
        nominalValue: d ? d.value : null,
        standardUncertaintyValue: spreadToDisplay(i.standardUncertainty, siUnit, units),
        unit: prettyUnit(d?.unit ?? siUnit),
      };
    }),
    rows: r.bands.map((b) => {
      const values = [b.nominal, b.low, b.median, b.high].map((v) => toDisplay(v, b.unit, units).value) as [
        number,
        number,
        number,
        number,
      ];
      const unit = toDisplay(0, b.unit, units).unit;
      return {
        name: nameText(b.name, e.method, 'result'),
        unit: prettyUnit(unit),
        shown: values.map((v) => formatValue(v, figuresFor(unit))) as [string, string, string, string],
        values,
      };
    }),
    warnings: r.warnings.map((w) => sentenceIn(w.message, units)),
  };
}

function methodTexts(sources: readonly string[], referenceOf: (source: string) => number): MethodText[] {
  return sources.flatMap((source): MethodText[] => {
    const reference = referenceOf(source);
    const infos = methodsForSource(source);
    if (infos.length === 0) return [{ source, reference }];
    return infos.map((m) => ({ title: m.title, equation: m.equation, source, reference }));
  });
}

/** Where an input came from, in words for the calc sheet. */
function originText(e: EstimateOutcome, name: string): string {
  const origin = e.origins?.[name];
  if (origin === 'typed') return e.added ? 'derived from the near-field run it continues' : 'typed on this estimate';
  if (origin === 'default') return "the method's default";
  const from = [e.feature?.name, e.condition && `condition “${e.condition.name}”`].filter(Boolean).join(', ');
  return e.added
    ? `from the site${from ? `: ${from}` : ''}, run added for compliance`
    : `from the site${from ? `: ${from}` : ''}`;
}

function section(
  e: EstimateOutcome,
  number: string,
  units: UnitSystem,
  referenceOf: (source: string) => number,
  compliance: readonly ComplianceRow[],
  conditions: readonly ConditionOutcome[],
): EstimateSection {
  const say = (t: string) => sentenceIn(t, units);
  const method = findCalcMethod(e.method);
  const paramText = (n: string) => method?.params.find((p) => p.name === n)?.description ?? readableName(n);
  const resultText = (n: string) => method?.results.find((r) => r.name === n)?.description ?? readableName(n);
  return {
    number,
    id: e.id,
    title: e.title,
    method: e.method,
    methodTitle: method?.title ?? e.method,
    feature: e.feature?.name,
    condition: e.condition?.name,
    status: e.status,
    error: e.error !== undefined || e.incomplete !== undefined ? say((e.error ?? e.incomplete)!) : undefined,
    inputs: quantities(
      e.inputs,
      (n) => nameText(n, e.method, 'input'),
      (n) => say(`${paramText(n)} (${originText(e, n)})`),
      units,
    ),
    results: quantities(
      e.results,
      (n) => nameText(n, e.method, 'result'),
      (n) => say(resultText(n)),
      units,
    ),
    methods: methodTexts(e.sources, referenceOf),
    warnings: e.warnings.map((w) => say(w.message)),
    charts: withReferenceLines(chartSpecs(e.series, units, e.id), e, compliance, conditions, units),
    ...(e.uncertainty ? { uncertainty: uncertaintySection(e, units) } : {}),
  };
}

function keyResult(s: EstimateSection, results: Record<string, ResultValue>): string {
  if (s.status === 'error') return `not computed: ${s.error ?? 'error'}`;
  if (s.status === 'incomplete') return `incomplete: ${s.error ?? ''}`;
  const key = keyResultName(results);
  const r = s.results.find((q) => q.key === key);
  if (!r) return '';
  return `${r.name} = ${r.shown}${r.shownUnit ? ' ' + r.shownUnit : ''}`;
}

/** Builds the report model of an assessment in the given unit system. */
export function buildReportModel(
  a: Assessment,
  units: UnitSystem,
  site?: Site,
  options: { issueDate?: string } = {},
): ReportModel {
  const references = [...new Set(a.estimates.flatMap((e) => e.sources))];
  const referenceOf = (source: string) => references.indexOf(source) + 1;
  const estimates = a.estimates.map((e, i) =>
    section(e, String(i + 2), units, referenceOf, a.compliance, a.conditions),
  );
  const sectionOf = (id: string) => estimates.find((s) => s.id === id)?.number;
  const compliance = complianceTable(a.compliance, units);
  let next = estimates.length + 2;
  const contents: ContentsEntry[] = [
    { number: '1', title: 'Summary of estimates', anchor: 'summary' },
    ...estimates.map((s) => ({ number: s.number, title: `${s.title} (${s.id})`, anchor: s.id })),
    ...(compliance ? [{ number: String(next++), title: 'Mixing-zone compliance', anchor: 'compliance' }] : []),
    ...(site ? [{ number: String(next++), title: 'Site inputs as entered', anchor: 'inputs' }] : []),
    { number: String(next++), title: 'Verification of the methods', anchor: 'verification' },
    { number: String(next++), title: 'References', anchor: 'references' },
    { number: String(next), title: 'Cautions', anchor: 'cautions' },
  ];
  const p = a.project;
  const densityNote =
    units === 'us'
      ? 'This US edition gives densities in pounds per cubic foot (lb/ft³; 1 lb/ft³ = 16.01846 kg/m³), to six significant figures.'
      : 'Densities are in kilograms per cubic metre (kg/m³), to six significant figures.';
  const unitsLabel =
    units === 'us'
      ? 'US customary (ft, ft/s, cfs, ft²/s, °F); densities in lb/ft³'
      : 'SI (m, m/s, m³/s, m²/s, °C); densities in kg/m³';
  const control = documentControl(a, options.issueDate);
  return {
    title: p.name,
    subtitle: `Screening calculation sheet — ${a.waterBody}`,
    units,
    titleBlock: [
      { label: 'Document number', value: control.number },
      { label: 'Project', value: p.name },
      { label: 'Site', value: p.site },
      { label: 'Water body', value: a.waterBody },
      { label: 'Prepared by', value: p.preparedBy || '—' },
      { label: 'Checked by', value: p.checkedBy || '—' },
      { label: 'Revision', value: control.revision },
      { label: 'Issue date', value: control.issueDate || 'not issued (draft for checking)' },
      { label: 'Date of the site data', value: p.date || '—' },
      { label: 'gprime version', value: a.gprimeVersion },
      { label: 'Site file SHA-256', value: a.siteHash },
      { label: 'Display units', value: unitsLabel },
    ],
    contents,
    summary: estimates.map((s, i) => {
      const key =
        s.status === 'error' ? undefined : s.results.find((q) => q.key === keyResultName(a.estimates[i].results));
      return {
        id: s.id,
        title: s.title,
        where: [s.feature, s.condition].filter(Boolean).join(' · '),
        keyResult: keyResult(s, a.estimates[i].results),
        ...(key ? { key } : {}),
        warnings: s.warnings.length,
        status: s.status,
      };
    }),
    estimates,
    compliance,
    verdicts: verdictLines(a.compliance),
    complianceColumns: complianceColumns(units),
    complianceDerivations: a.compliance.map((r) => derivation(r, a.estimates, units, sectionOf)),
    verdictRule: VERDICT_RULE,
    verification: verificationEntries(references, referenceOf),
    inputs: site ? siteInputs(site, units) : [],
    references,
    cautions: [
      sentenceIn(a.caution, units),
      'Every result is computed with the published method named beside it; a warning marks an input outside the range the method was calibrated or validated for, where the result is an extrapolation.',
      `${FIGURES_RULE}; they are shown in ${units === 'us' ? 'US customary' : 'SI'} units, and the spreadsheet and CSV files hold them at full precision.`,
      densityNote,
      'The same site file (identified by its SHA-256 above) and gprime version give the same numbers and charts.',
      ...a.checks.map((w) => `Site check: ${sentenceIn(w.message, units)}`),
    ],
    documentControl: control,
    densityNote,
    gprimeVersion: a.gprimeVersion,
    siteHash: a.siteHash,
  };
}
