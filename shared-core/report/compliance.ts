import type { ComplianceRow, EstimateOutcome } from '../site/assess';
import { formatValue, prettyUnit } from './format';

/** The compliance table of the calc sheet: one row per constituent, zone and condition. */
export interface ComplianceTable {
  header: string[];
  rows: string[][];
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

export function complianceTable(rows: readonly ComplianceRow[]): ComplianceTable | null {
  if (rows.length === 0) return null;
  const n = (x: number | null) => (x === null ? '—' : formatValue(x));
  return {
    header: [
      'Feature',
      'Condition',
      'Constituent',
      'Unit',
      'Required dilution',
      'Achieved dilution',
      'Margin',
      'Verdict',
      'Note',
    ],
    rows: rows.map((r) => [
      r.feature,
      r.governing ? `${r.condition} (governs)` : r.condition,
      `${r.constituent} (${r.zone})`,
      prettyUnit(r.unit),
      n(r.requiredDilution),
      r.farFieldFactor === null
        ? n(r.achievedDilution)
        : `${n(r.nearFieldDilution)} × ${n(r.farFieldFactor)} = ${n(r.achievedDilution)}`,
      r.margin === null ? '—' : `${formatValue(100 * r.margin, 3)} %`,
      r.verdict,
      [
        r.effluent === null ? '' : `Ce ${n(r.effluent)}, Ca ${n(r.ambient)}, Cc ${n(r.criterion)}`,
        r.boundary === null ? '' : `boundary ${n(r.boundary)} m`,
        r.models,
        r.note,
      ]
        .filter(Boolean)
        .join('; '),
    ]),
  };
}

const pctText = (m: number | null) => (m === null ? '—' : `${formatValue(100 * m, 3)} %`);
const dilutionText = (x: number | null) => (x === null ? '—' : formatValue(x));

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
      required: dilutionText(r.requiredDilution),
      achieved: dilutionText(r.achievedDilution),
      margin: pctText(r.margin),
      verdict: g.some((x) => x.verdict === 'does not meet')
        ? 'does not meet'
        : g.every((x) => x.verdict === 'meets')
          ? 'meets'
          : 'cannot tell',
    };
  });
}

/** How one verdict was reached: Ce, Ca, Cc, S, the runs and their warnings, the margin and the verdict. */
export function derivation(r: ComplianceRow, outcomes: readonly EstimateOutcome[]): string {
  const runs = [r.estimate, r.farFieldEstimate].flatMap((id) => outcomes.filter((o) => o.id === id));
  const warned = runs.flatMap((o) => o.warnings.map((w) => `${o.id}: ${w.message}`));
  const parts = [
    `${r.feature} · ${r.constituent} (${r.zone}) · ${r.condition}:`,
    r.effluent === null
      ? ''
      : `Ce = ${formatValue(r.effluent)}, Ca = ${formatValue(r.ambient!)}, Cc = ${formatValue(r.criterion!)} ${prettyUnit(r.unit)};`,
    r.requiredDilution === null ? '' : `S required = (Ce − Ca)/(Cc − Ca) = ${formatValue(r.requiredDilution)};`,
    r.achievedDilution === null
      ? ''
      : `S achieved = ${r.farFieldFactor === null ? '' : `${formatValue(r.nearFieldDilution!)} × ${formatValue(r.farFieldFactor)} = `}${formatValue(r.achievedDilution)} (${r.models});`,
    `margin ${pctText(r.margin)}; ${r.verdict}. ${r.note.charAt(0).toUpperCase()}${r.note.slice(1)}.`,
    warned.length ? `Warnings of these runs: ${warned.join(' ')}` : 'The runs behind it raised no warnings.',
  ];
  return parts.filter(Boolean).join(' ');
}
