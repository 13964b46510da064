import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

/** An accepted difference: relative to the expected value and/or absolute (SI). */
export interface Tolerance {
  abs?: number;
  rel?: number;
}

/**
 * What a check claims (DEVELOPERS.md, "Check values"):
 * - `validation`: the method against published values, an experiment or an independent reference
 *   implementation; the tolerance may not exceed the stated `scatter` of that reference.
 * - `known-bias`: the method departs from a published value by a measured, stated `bias`; the check tests
 *   that departure (expected × (1 + bias.rel), or expected + bias.abs) within the tolerance, so a change of
 *   the miss in either direction fails.
 * - `consistency`: the expected value is the formula the code implements, or one law against another; not
 *   an external check, and held to a close tolerance.
 */
export type CheckKind = 'validation' | 'known-bias' | 'consistency';

export interface Check {
  kind: CheckKind;
  /** author, year, table/equation — or "from memory" / "common practice, no source" */
  source: string;
  tolerance: Tolerance;
  /** validation: the published scatter (or printed rounding, or the precision of the reference) and what it is */
  scatter?: Tolerance & { basis: string };
  /** known-bias: the model's departure from the expected values, (computed − expected)/expected or absolute */
  bias?: Tolerance;
  cases: { inputs: Record<string, number | string>; expected: number; note?: string }[];
}

/**
 * A check-values file (test/check-values/<topic>/<method-id>.json) pairs one method with published
 * reference values. Each check names its source and its kind; each case quotes where it comes from.
 */
export interface CheckValuesFile {
  /** MethodInfo id of the method under test */
  method: string;
  checks: Check[];
}

/** The widest relative tolerance a consistency check may have (it compares the code with its own formula). */
export const CONSISTENCY_MAX_REL = 0.05;

const limitOf = (t: Tolerance, expected: number) => Math.max(t.abs ?? 0, (t.rel ?? 0) * Math.abs(expected));

/** The reasons a check record is malformed or claims more than it shows; empty when it is sound. */
export function checkRecordProblems(check: Check): string[] {
  const out: string[] = [];
  const t = check.tolerance ?? {};
  if (!['validation', 'known-bias', 'consistency'].includes(check.kind))
    out.push(`kind must be validation, known-bias or consistency (got ${JSON.stringify(check.kind)})`);
  if (typeof check.source !== 'string' || check.source.length <= 10) out.push('the source is missing');
  if (!Array.isArray(check.cases) || check.cases.length === 0) out.push('no cases');
  if (check.kind === 'validation') {
    const s = check.scatter;
    if (!s || !s.basis) out.push('a validation states the published scatter it allows (scatter with a basis)');
    else {
      if ((t.rel ?? 0) > (s.rel ?? 0))
        out.push(`relative tolerance ${t.rel} exceeds the stated scatter ${s.rel ?? 0} (${s.basis})`);
      if ((t.abs ?? 0) > (s.abs ?? 0))
        out.push(`absolute tolerance ${t.abs} exceeds the stated scatter ${s.abs ?? 0} (${s.basis})`);
    }
    if (check.bias) out.push('a validation states no bias; a check with a stated bias is a known-bias record');
  }
  if (check.kind === 'known-bias') {
    const b = check.bias;
    if (!b || (b.rel === undefined) === (b.abs === undefined))
      out.push('a known-bias record states its bias, either relative or absolute');
    else
      for (const c of check.cases ?? []) {
        const departure = b.rel !== undefined ? Math.abs(b.rel * c.expected) : Math.abs(b.abs!);
        if (limitOf(t, c.expected) >= departure)
          out.push(`the tolerance covers the stated bias itself at ${JSON.stringify(c.inputs)}: that is a validation`);
      }
  }
  if (check.kind === 'consistency') {
    if ((t.rel ?? 0) > CONSISTENCY_MAX_REL) out.push(`a consistency check is held within ${CONSISTENCY_MAX_REL}`);
    for (const c of check.cases ?? [])
      if (c.expected !== 0 && limitOf(t, c.expected) > CONSISTENCY_MAX_REL * Math.abs(c.expected))
        out.push(`the tolerance at ${JSON.stringify(c.inputs)} is wider than ${CONSISTENCY_MAX_REL} of the value`);
  }
  return out;
}

/** The value a case must reproduce: the published one, shifted by the stated bias of a known-bias record. */
export function targetOf(check: Check, expected: number): number {
  if (check.kind !== 'known-bias' || !check.bias) return expected;
  return check.bias.rel !== undefined ? expected * (1 + check.bias.rel) : expected + (check.bias.abs ?? 0);
}

export function loadCheckValues(topic: string, methodId: string): CheckValuesFile {
  const path = resolve(import.meta.dirname, '..', 'check-values', topic, `${methodId}.json`);
  return JSON.parse(readFileSync(path, 'utf8')) as CheckValuesFile;
}

const describeBias = (check: Check) =>
  check.bias?.rel !== undefined
    ? `stated bias ${(100 * check.bias.rel).toFixed(1)} %`
    : `stated bias ${check.bias?.abs ?? 0} absolute`;

/**
 * Registers one test per case; a failure prints case, computed, reference, difference and limit. A check
 * record that is malformed or claims more than it shows (see checkRecordProblems) fails on its own.
 */
export function runCheckValues(
  topic: string,
  methodId: string,
  compute: (inputs: Record<string, number | string>) => number,
): void {
  const file = loadCheckValues(topic, methodId);
  describe(`${methodId} against published values`, () => {
    for (const check of file.checks) {
      it(`record is sound (${check.kind}) — ${check.source.slice(0, 60)}`, () =>
        expect(checkRecordProblems(check), check.source).toEqual([]));
      for (const c of check.cases) {
        it(`${JSON.stringify(c.inputs)} — ${check.kind} — ${check.source}`, () => {
          const computed = compute(c.inputs);
          const target = targetOf(check, c.expected);
          const diff = Math.abs(computed - target);
          const limit = limitOf(check.tolerance, c.expected);
          const against =
            check.kind === 'known-bias'
              ? `reference ${c.expected} with ${describeBias(check)} → ${target}, measured departure ${(100 * (computed / c.expected - 1)).toFixed(2)} %`
              : `reference ${c.expected}`;
          const detail = `case ${JSON.stringify(c.inputs)}${c.note ? ` (${c.note})` : ''}: computed ${computed}, ${against}, difference ${diff.toExponential(3)}, limit ${limit.toExponential(3)} [${check.source}]`;
          expect(diff <= limit, detail).toBe(true);
        });
      }
    }
  });
}
