import type { ComplianceRow, EstimateOutcome } from '../site/assess';
import { sentenceIn } from '../units/sentence';
import { toDisplay, type UnitSystem } from '../units/units';
import { formatValue, prettyUnit } from './format';

/**
 * The compliance table of the calc sheet: one row per constituent, zone and condition, in the edition's
 * units. `values` holds the same cells as numbers (display units) for the spreadsheets; `rows` typesets them.
 */
export interface ComplianceTable {
  header: string[];
  rows: string[][];
  values: (number | string | null)[][];
}

/** The verdict of one limit (outfall × constituent × zone) under its governing condition, for the summary. */
export interface VerdictLine {
  outfall: string;
  limit: string;
  condition: string;
  required: string;
  achieved: string;
  margin: string;
  verdict: string;
}

/** A concentration in the edition's units: a temperature criterion in °F in the US edition, others as given. */
function concentration(x: number | null, unit: string, units: UnitSystem): { value: number | null; unit: string } {
  if (x === null) return { value: null, unit: toDisplay(0, unit, units).unit };
  try {
    return toDisplay(x, unit, units);
  } catch {
    return { value: x, unit };
  }
}

const lengthUnit = (units: UnitSystem) => prettyUnit(toDisplay(0, 'm', units).unit);
const n = (x: number | null) => (x === null ? '—' : formatValue(x));
const pctText = (m: number | null) => (m === null ? '—' : `${formatValue(100 * m, 3)} %`);
/** A clause as a sentence: capital first letter, one full stop at the end. */
const sentence = (t: string) => `${t.charAt(0).toUpperCase()}${t.slice(1)}${/[.!?]$/.test(t) ? '' : '.'}`;
const zoneText = (z: ComplianceRow['zone']) => (z === 'acute' ? 'acute' : 'chronic');

export function complianceTable(rows: readonly ComplianceRow[], units: UnitSystem = 'si'): ComplianceTable | null {
  if (rows.length === 0) return null;
  const len = lengthUnit(units);
  const values = rows.map((r) => {
    const c = (x: number | null) => concentration(x, r.unit, units).value;
    return [
      r.feature,
      r.condition,
      r.governing ? 'yes' : 'no',
      r.constituent,
      zoneText(r.zone),
      prettyUnit(concentration(r.effluent, r.unit, units).unit),
      c(r.effluent),
      c(r.ambient),
      c(r.criterion),
      r.boundary === null ? null : toDisplay(r.boundary, 'm', units).value,
      r.requiredDilution,
      r.nearFieldDilution,
      r.farFieldFactor,
      r.achievedDilution,
      r.margin === null ? null : 100 * r.margin,
      r.verdict,
    ];
  });
  return {
    header: [
      'Outfall',
      'Condition',
      'Governs',
      'Constituent',
      'Zone',
      'Concentration unit',
      'Effluent Ce',
      'Ambient Ca',
      'Criterion Cc',
      `Boundary distance (${len})`,
      'Required dilution',
      'Near-field dilution',
      'Far-field factor',
      'Achieved dilution',
      'Margin (%)',
      'Verdict',
    ],
    rows: rows.map((r, i) => {
      const v = values[i];
      return [
        r.feature,
        r.governing ? `${r.condition} (governs)` : r.condition,
        `${r.constituent} (${zoneText(r.zone)})`,
        [v[6], v[7], v[8]].map((x) => n(x as number | null)).join(' / ') + (v[5] ? ` ${v[5] as string}` : ''),
        n(v[9] as number | null),
        n(r.requiredDilution),
        r.farFieldFactor === null
          ? n(r.achievedDilution)
          : `${n(r.nearFieldDilution)} × ${n(r.farFieldFactor)} = ${n(r.achievedDilution)}`,
        pctText(r.margin),
        r.verdict,
      ];
    }),
    values,
  };
}

/** Headers of the typeset compliance table (rows of `ComplianceTable.rows`). */
export function complianceColumns(units: UnitSystem): string[] {
  return [
    'Outfall',
    'Condition',
    'Constituent (zone)',
    'Ce / Ca / Cc',
    `Boundary (${lengthUnit(units)})`,
    'Required S',
    'Achieved S',
    'Margin',
    'Verdict',
  ];
}

export function verdictLines(rows: readonly ComplianceRow[]): VerdictLine[] {
  const groups = new Map<string, ComplianceRow[]>();
  for (const r of rows) {
    const key = `${r.feature}|${r.constituent}|${r.zone}`;
    groups.set(key, [...(groups.get(key) ?? []), r]);
  }
  return [...groups.values()].map((g) => {
    const r = g.find((x) => x.governing) ?? g.find((x) => x.verdict !== 'meets') ?? g[0];
    return {
      outfall: r.feature,
      limit: `${r.constituent}, ${r.zone === 'acute' ? 'acute (zone of initial dilution)' : 'chronic (mixing-zone boundary)'}`,
      condition: r.governing ? `${r.condition} (governs)` : r.condition,
      required: n(r.requiredDilution),
      achieved: n(r.achievedDilution),
      margin: pctText(r.margin),
      verdict: g.some((x) => x.verdict === 'does not meet')
        ? 'does not meet'
        : g.every((x) => x.verdict === 'meets')
          ? 'meets'
          : 'cannot tell',
    };
  });
}

/** How one verdict was reached, in the edition's units: Ce, Ca, Cc, the boundary, S, the runs, the margin. */
export interface Derivation {
  heading: string;
  lines: string[];
  /** the warnings of the runs behind the row, each with the run's id */
  warnings: string[];
}

/**
 * The derivation of one compliance row. `sectionOf` gives the report section of a run (by estimate id), so that
 * the reader finds the run that produced the achieved dilution.
 */
export function derivation(
  r: ComplianceRow,
  outcomes: readonly EstimateOutcome[],
  units: UnitSystem = 'si',
  sectionOf: (id: string) => string | undefined = () => undefined,
): Derivation {
  const say = (t: string) => sentenceIn(t, units);
  const runs = [r.estimate, r.farFieldEstimate].flatMap((id) => outcomes.filter((o) => o.id === id));
  const runText = (id: string | undefined) => {
    if (!id) return '';
    const s = sectionOf(id);
    return s ? `${id}, §${s}` : id;
  };
  const c = (x: number | null) => n(concentration(x, r.unit, units).value);
  const cu = prettyUnit(concentration(r.effluent, r.unit, units).unit);
  const lines = [
    r.effluent === null
      ? ''
      : `Concentrations: effluent Ce = ${c(r.effluent)}, ambient Ca = ${c(r.ambient)}, criterion Cc = ${c(r.criterion)}${cu ? ' ' + cu : ''}.`,
    r.boundary === null
      ? ''
      : `Zone boundary: ${n(toDisplay(r.boundary, 'm', units).value)} ${lengthUnit(units)} from the port (${r.zone === 'acute' ? 'zone of initial dilution' : 'mixing-zone boundary'}).`,
    r.requiredDilution === null ? '' : `Required dilution S_req = (Ce − Ca)/(Cc − Ca) = ${n(r.requiredDilution)}.`,
    r.achievedDilution === null
      ? ''
      : `Achieved dilution S = ${r.farFieldFactor === null ? '' : `${n(r.nearFieldDilution)} (near field, run ${runText(r.estimate)}) × ${n(r.farFieldFactor)} (far field, run ${runText(r.farFieldEstimate)}) = `}${n(r.achievedDilution)}${r.farFieldFactor === null ? ` (run ${runText(r.estimate)})` : ''}; models: ${say(r.models)}.`,
    `Margin S/S_req − 1 = ${pctText(r.margin)}: ${r.verdict}.`,
    r.note ? sentence(say(r.note)) : '',
  ].filter(Boolean);
  return {
    heading: `${r.feature} · ${r.constituent} (${zoneText(r.zone)}) · ${r.condition}${r.governing ? ' (governs)' : ''}`,
    lines,
    warnings: runs.flatMap((o) => o.warnings.map((w) => `${o.id}: ${say(w.message)}`)),
  };
}
