import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildReportModel } from '../../shared-core/report';
import { assessSite, loadSite } from '../../shared-core/site';
import { cleanReference, verificationSummary } from '../../src-main/verification/summary';
import { CHECK_GROUPS, checkGroups, verificationEntries } from '../../shared-core/report/verification';
import { METHOD_CATALOGUE } from '../../shared-core/report/methods';

const ROOT = resolve(import.meta.dirname, '..', '..');
const FORBIDDEN = /from memory|our reading|this program|was not checked/i;

describe('the verification appendix', () => {
  it('is generated from the check-value files the tests run (npx tsx scripts/write-verification.ts)', () => {
    const committed = JSON.parse(readFileSync(resolve(ROOT, 'shared-core/report/verification.json'), 'utf8'));
    expect(committed).toEqual(JSON.parse(JSON.stringify(verificationSummary(resolve(ROOT, 'test/check-values')))));
  });

  it('states each check in professional words: its basis, reference, cases and tolerance', () => {
    const summary = verificationSummary(resolve(ROOT, 'test/check-values'));
    const all = Object.values(summary).flat();
    expect(all.length).toBeGreaterThan(100);
    for (const c of all) {
      expect(c.reference).not.toMatch(FORBIDDEN);
      expect(c.cases).toBeGreaterThan(0);
    }
    // a value recalled from memory in the tests reads as "as commonly quoted" in the report
    expect(all.some((c) => c.basis === 'value as commonly quoted')).toBe(true);
  });

  it.each(['quillmere-reservoir', 'amsel-estuary'])('%s: lists every method used with its checks', (name) => {
    const site = loadSite(readFileSync(resolve(ROOT, `examples/${name}.gpsite`), 'utf8'));
    const m = buildReportModel(assessSite(site, { gprimeVersion: 't', siteHash: 'h' }), 'si');
    expect(m.verification.length).toBeGreaterThan(5);
    expect(m.verification.filter((v) => v.checks.length > 0).length).toBeGreaterThan(m.verification.length / 2);
    for (const v of m.verification)
      for (const text of [...v.checks, v.provenance ?? '']) expect(text).not.toMatch(FORBIDDEN);
  });

  it('reads the working remarks of a check as a clean citation (DEVELOPERS.md, "Check values")', () => {
    expect(cleanReference('Keulegan (1957) Fr_H ≈ 0.44–0.48 (from memory). Known-bias record: 0.04 above')).toBe(
      'Keulegan (1957) Fr_H ≈ 0.44–0.48. Stated departure: 0.04 above',
    );
    expect(cleanReference('(Keulegan 1957; Shin, Dalziel & Linden 2004; range from memory)')).toBe(
      '(Keulegan 1957; Shin, Dalziel & Linden 2004)',
    );
    expect(
      cleanReference('quoted for the 4/3-law (recalled from memory, not checked against the printed page). b = 8 m'),
    ).toBe('quoted for the 4/3-law. b = 8 m');
    expect(cleanReference('CRC water table — from memory')).toBe('CRC water table');
  });

  it('presents validation, known departures and consistency checks as separate groups, in that order', () => {
    const withAll = METHOD_CATALOGUE.map((m) => verificationEntries([m.source])[0]).find(
      (v) => v && ['validation', 'known-bias'].every((k) => v.groups.some((g) => g.kind === k)),
    )!;
    expect(withAll).toBeDefined();
    const order = withAll.groups.map((g) => CHECK_GROUPS.findIndex((c) => c.kind === g.kind));
    expect(order).toEqual([...order].sort((a, b) => a - b));
    const departures = withAll.groups.find((g) => g.kind === 'known-bias')!;
    for (const c of departures.checks) expect(c).toMatch(/the stated departure of [−+]?[\d.]+ % relative|absolute/);
    expect(withAll.checks).toEqual(withAll.groups.flatMap((g) => g.checks));
  });

  it('lists a check without a kind among the external checks (the field is optional)', () => {
    const groups = checkGroups([
      { basis: 'published value', reference: 'Benjamin (1968) eq. 3.6', cases: 2, tolerance: { rel: 1e-12 } },
      {
        basis: 'value as commonly quoted',
        reference: 'Keulegan (1957)',
        cases: 1,
        tolerance: { abs: 0.02 },
        kind: 'known-bias',
        bias: { abs: 0.04 },
      },
    ]);
    expect(groups.map((g) => g.kind)).toEqual(['known-bias', 'other']);
    expect(groups[0].checks[0]).toBe(
      'Value as commonly quoted (not compared with the original publication): Keulegan (1957) — 1 case, the stated departure of +0.04 absolute reproduced within 0.02 absolute.',
    );
    expect(groups[1]).toMatchObject({
      title: 'External checks',
      checks: ['Published value or closed form: Benjamin (1968) eq. 3.6 — 2 cases, within 1×10⁻¹⁰ % relative.'],
    });
  });
});
