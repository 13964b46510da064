import type { MethodInfo } from '../core/method';
import { formatValue } from './format';
import { methodsForSource } from './methods';
import summary from './verification.json';

/** One group of checks of a method: validations, known departures or consistency checks. */
export interface VerificationGroup {
  kind: CheckKind | 'other';
  title: string;
  checks: string[];
}

/** What one method was checked against, and its known departures, for the verification appendix. */
export interface VerificationEntry {
  method: string;
  /** number of the method's source in the reference list */
  reference?: number;
  /** every check, in words (all groups in order) */
  checks: string[];
  groups: VerificationGroup[];
  provenance?: string;
}

type CheckKind = 'validation' | 'known-bias' | 'consistency';

/** One check of verification.json (src-main/verification/summary.ts writes it). */
export interface Check {
  basis: string;
  reference: string;
  cases: number;
  tolerance: { rel?: number; abs?: number };
  kind?: CheckKind;
  bias?: { rel?: number; abs?: number };
}

const SUMMARY = summary as Record<string, Check[]>;

const amount = (t: { rel?: number; abs?: number }, signed = false) =>
  [
    t.rel !== undefined ? `${signed && t.rel > 0 ? '+' : ''}${formatValue(100 * t.rel)} % relative` : '',
    t.abs !== undefined ? `${signed && t.abs > 0 ? '+' : ''}${formatValue(t.abs)} absolute` : '',
  ]
    .filter(Boolean)
    .join(' or ') || 'exact agreement';

const BASIS: Record<string, string> = {
  'published value': 'Published value or closed form',
  'independent reference implementation': 'Independent reference implementation',
  'value as commonly quoted': 'Value as commonly quoted (not compared with the original publication)',
  'conventional value': 'Conventional engineering value (no published source)',
};

/** Group headings in professional words, in the order the appendix presents them. */
export const CHECK_GROUPS: readonly { kind: VerificationGroup['kind']; title: string }[] = [
  { kind: 'validation', title: 'Validation against published values, within their stated scatter' },
  { kind: 'known-bias', title: 'Known departures from published data (stated and tested as such)' },
  { kind: 'consistency', title: 'Consistency checks of the coded formulas (not external validation)' },
  { kind: 'other', title: 'External checks' },
];

function checkText(c: Check): string {
  const cases = `${c.cases} case${c.cases === 1 ? '' : 's'}`;
  const agreement =
    c.kind === 'known-bias' && c.bias
      ? `the stated departure of ${amount(c.bias, true)} reproduced within ${amount(c.tolerance)}`
      : `within ${amount(c.tolerance)}`;
  return `${BASIS[c.basis] ?? c.basis}: ${c.reference} — ${cases}, ${agreement}.`;
}

/** The checks of one method in words, grouped by kind in the order of CHECK_GROUPS; a check without a kind is an external check. */
export function checkGroups(checks: readonly Check[]): VerificationGroup[] {
  return CHECK_GROUPS.map((g) => ({
    ...g,
    checks: checks.filter((c) => (c.kind ?? 'other') === g.kind).map(checkText),
  })).filter((g) => g.checks.length > 0);
}

/**
 * The verification appendix: for each method the assessment used, the external checks its tests pass
 * (from shared-core/report/verification.json, generated from test/check-values) grouped by kind — validation,
 * known departure, consistency — and how its coefficients were obtained where that departs from a check against
 * the original publication. Checks without a kind are listed as external checks.
 */
export function verificationEntries(
  sources: readonly string[],
  referenceOf: (source: string) => number | undefined = () => undefined,
): VerificationEntry[] {
  const infos = new Map<string, MethodInfo>();
  for (const s of sources) for (const m of methodsForSource(s)) infos.set(m.id, m);
  return [...infos.values()].map((m) => {
    const groups = checkGroups(SUMMARY[m.id] ?? []);
    const reference = referenceOf(m.source);
    return {
      method: m.title,
      ...(reference ? { reference } : {}),
      checks: groups.flatMap((g) => g.checks),
      groups,
      ...(m.provenance ? { provenance: m.provenance } : {}),
    };
  });
}
