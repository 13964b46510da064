import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildReportModel } from '../../shared-core/report';
import { assessSite, loadSite } from '../../shared-core/site';
import { verificationSummary } from '../../src-main/verification/summary';

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
});
