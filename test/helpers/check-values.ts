import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * A check-values file (test/check-values/<topic>/<method-id>.json) pairs one method with published
 * reference values. Each check names its source; each case quotes where it comes from.
 */
export interface CheckValuesFile {
  /** MethodInfo id of the method under test */
  method: string;
  checks: {
    /** author, year, table/equation — or "from memory" / "common practice, no source" */
    source: string;
    tolerance: { abs?: number; rel?: number };
    cases: { inputs: Record<string, number | string>; expected: number; note?: string }[];
  }[];
}

export function loadCheckValues(topic: string, methodId: string): CheckValuesFile {
  const path = resolve(import.meta.dirname, '..', 'check-values', topic, `${methodId}.json`);
  return JSON.parse(readFileSync(path, 'utf8')) as CheckValuesFile;
}

/** Registers one test per case; a failure prints case, computed, reference, difference and limit. */
export function runCheckValues(
  topic: string,
  methodId: string,
  compute: (inputs: Record<string, number | string>) => number,
): void {
  const file = loadCheckValues(topic, methodId);
  describe(`${methodId} against published values`, () => {
    for (const check of file.checks) {
      for (const c of check.cases) {
        it(`${JSON.stringify(c.inputs)} — ${check.source}`, () => {
          const computed = compute(c.inputs);
          const diff = Math.abs(computed - c.expected);
          const limit = Math.max(check.tolerance.abs ?? 0, (check.tolerance.rel ?? 0) * Math.abs(c.expected));
          const detail = `case ${JSON.stringify(c.inputs)}${c.note ? ` (${c.note})` : ''}: computed ${computed}, reference ${c.expected}, difference ${diff.toExponential(3)}, limit ${limit.toExponential(3)} [${check.source}]`;
          expect(diff <= limit, detail).toBe(true);
        });
      }
    }
  });
}
