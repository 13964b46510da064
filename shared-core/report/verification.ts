import type { MethodInfo } from '../core/method';
import { formatValue } from './format';
import { methodsForSource } from './methods';
import summary from './verification.json';

/** What one method was checked against, and its known departures, for the verification appendix. */
export interface VerificationEntry {
  method: string;
  checks: string[];
  provenance?: string;
}

interface Check {
  basis: string;
  reference: string;
  cases: number;
  tolerance: { rel?: number; abs?: number };
}

const SUMMARY = summary as Record<string, Check[]>;

const tolerance = (t: Check['tolerance']) =>
  [
    t.rel !== undefined ? `${formatValue(100 * t.rel)} % relative` : '',
    t.abs !== undefined ? `${formatValue(t.abs)} absolute` : '',
  ]
    .filter(Boolean)
    .join(' or ') || 'exact agreement';

const BASIS: Record<string, string> = {
  'published value': 'Compared with a published value or closed form',
  'independent reference implementation': 'Compared with an independent reference implementation',
  'value as commonly quoted': 'Compared with values as commonly quoted (not compared with the original publication)',
  'conventional value': 'Compared with a conventional engineering value (no published source)',
};

/**
 * The verification appendix: for each method the assessment used, the external checks its tests pass
 * (from shared-core/report/verification.json, generated from test/check-values) and how its coefficients
 * were obtained where that departs from a check against the original publication.
 */
export function verificationEntries(sources: readonly string[]): VerificationEntry[] {
  const infos = new Map<string, MethodInfo>();
  for (const s of sources) for (const m of methodsForSource(s)) infos.set(m.id, m);
  return [...infos.values()].map((m) => ({
    method: m.title,
    checks: (SUMMARY[m.id] ?? []).map(
      (c) =>
        `${BASIS[c.basis] ?? c.basis}: ${c.reference} — ${c.cases} case${c.cases === 1 ? '' : 's'}, within ${tolerance(c.tolerance)}.`,
    ),
    ...(m.provenance ? { provenance: m.provenance } : {}),
  }));
}
