import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';

/** One external check of a method, as the report's verification appendix states it. */
export interface VerificationCheck {
  /** what the method was compared with, in professional words */
  basis: 'published value' | 'independent reference implementation' | 'value as commonly quoted' | 'conventional value';
  /** the reference, without working remarks */
  reference: string;
  cases: number;
  /** the accepted difference: relative and/or absolute */
  tolerance: { rel?: number; abs?: number };
  /** validation (against published data within its scatter), known-bias (a stated departure) or consistency */
  kind?: 'validation' | 'known-bias' | 'consistency';
  /** known-bias: the method's stated departure from the published values */
  bias?: { rel?: number; abs?: number };
}

interface CheckFile {
  method: string;
  checks: {
    source: string;
    tolerance: { rel?: number; abs?: number };
    cases: unknown[];
    kind?: VerificationCheck['kind'];
    bias?: { rel?: number; abs?: number };
  }[];
}

// working remarks of the check-value files and the basis each one marks (DEVELOPERS.md, "Check values")
const RULE_OF_THUMB = /[;,(]?\s*common practice, no source\)?/gi;
const REFERENCE_LIBRARY = /python3-gsw|\bgsw\b|scipy|generated with|reference implementation/i;
const MEMORY_WORDS = '(?:(?:the\\s+)?(?:coefficient|values?|range|attribution|recalled)\\s+)?';
/** Remarks that a value was recalled rather than read, removed in order (the basis records them instead). */
const RECALLED: readonly [RegExp, string][] = [
  // a bracket that only says so: "(from memory)", "(recalled from memory, not checked against the printed page)"
  [new RegExp(`\\s*\\(${MEMORY_WORDS}from memory(?:,[^()]*)?\\)`, 'gi'), ''],
  // the last item of a bracket or a label: "; range from memory)", ", from memory:"
  [new RegExp(`[,;]\\s*${MEMORY_WORDS}from memory(?=[):])`, 'gi'), ''],
  [/\s*[—–-]\s*from memory/gi, ''],
  [/\s*(?:recalled\s+)?from memory/gi, ''],
];
/** Labels of the working record that the appendix states by its grouping instead. */
const RECORD_LABELS: readonly [RegExp, string][] = [
  [/Consistency check, not an external validation:\s*/g, ''],
  [/Known-bias record(?: between the two published fits)?:\s*/g, 'Stated departure: '],
];

function basisOf(source: string): VerificationCheck['basis'] {
  RULE_OF_THUMB.lastIndex = 0;
  if (RULE_OF_THUMB.test(source)) return 'conventional value';
  if (/from memory/i.test(source)) return 'value as commonly quoted';
  if (REFERENCE_LIBRARY.test(source)) return 'independent reference implementation';
  return 'published value';
}

/** The reference of a check without working remarks: a clean citation and what was compared. */
export function cleanReference(source: string): string {
  let s = source;
  for (const [re, to] of [...RECALLED, ...RECORD_LABELS]) s = s.replace(re, to);
  return s
    .replace(RULE_OF_THUMB, '')
    .replace(/\(\s*\)/g, '')
    .replace(/\s{2,}/g, ' ')
    .replace(/\s+([;,.)])/g, '$1')
    .trim();
}

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((n) => {
    const p = join(dir, n);
    return statSync(p).isDirectory() ? (n === 'generators' ? [] : files(p)) : n.endsWith('.json') ? [p] : [];
  });
}

/**
 * The verification summary of every method, read from the check-value files the tests run
 * (test/check-values/<topic>/<method>.json): per check its basis, reference, number of cases and tolerance.
 */
export function verificationSummary(checkValuesDir: string): Record<string, VerificationCheck[]> {
  const out: Record<string, VerificationCheck[]> = {};
  for (const path of files(checkValuesDir).sort()) {
    const f = JSON.parse(readFileSync(path, 'utf8')) as CheckFile;
    out[f.method] = [
      ...(out[f.method] ?? []),
      ...f.checks.map((c) => ({
        basis: basisOf(c.source),
        reference: cleanReference(c.source),
        cases: c.cases.length,
        tolerance: c.tolerance,
        ...(c.kind ? { kind: c.kind } : {}),
        ...(c.bias ? { bias: c.bias } : {}),
      })),
    ];
  }
  return out;
}
