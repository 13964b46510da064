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
}

interface CheckFile {
  method: string;
  checks: { source: string; tolerance: { rel?: number; abs?: number }; cases: unknown[] }[];
}

// working remarks of the check-value files and the basis each one marks (DEVELOPERS.md, "Check values")
const RECALLED = /\s*[;,(—–]?\s*(?:values?\s+)?(?:recalled\s+)?from memory(?: of [^;)]*)?\)?/gi;
const RULE_OF_THUMB = /[;,(]?\s*common practice, no source\)?/gi;
const REFERENCE_LIBRARY = /python3-gsw|\bgsw\b|scipy|generated with|reference implementation/i;

function basisOf(source: string): VerificationCheck['basis'] {
  if (RULE_OF_THUMB.test(source)) return 'conventional value';
  if (/from memory/i.test(source)) return 'value as commonly quoted';
  if (REFERENCE_LIBRARY.test(source)) return 'independent reference implementation';
  return 'published value';
}

const clean = (source: string) =>
  source
    .replace(RECALLED, '')
    .replace(RULE_OF_THUMB, '')
    .replace(/\s{2,}/g, ' ')
    .replace(/\s+([;,.)])/g, '$1')
    .trim();

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
      ...f.checks.map((c) => {
        RULE_OF_THUMB.lastIndex = 0;
        return { basis: basisOf(c.source), reference: clean(c.source), cases: c.cases.length, tolerance: c.tolerance };
      }),
    ];
  }
  return out;
}
