import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { assessSite, loadSite, SiteAssessor, type Site } from '../../../shared-core/site';

// The single assessment (DEVELOPERS.md, "From site file to report"): every view reads these outcomes, so
// these tests pin down what the outcomes promise. The demo site is invented; no value here is a reference
// of a method (those are in test/check-values), only agreements between paths through the same code.
const ROOT = resolve(import.meta.dirname, '../../..');
const demo = (): Site => loadSite(readFileSync(resolve(ROOT, 'examples/quillmere-reservoir.gpsite'), 'utf8'));
const META = { gprimeVersion: 't', siteHash: 'h' };
const assess = (site: Site) => assessSite(site, META, { bands: false });
const row = (a: ReturnType<typeof assess>, condition: string, constituent: string, zone = 'chronic') =>
  a.compliance.find((r) => r.condition === condition && r.constituent === constituent && r.zone === zone)!;

describe('one assessment', () => {
  it('compliance reads the near-field estimate the user sees, with its own parameter overrides', () => {
    const site = demo();
    const before = row(assess(site), 'Late summer', 'Ammonia-N');
    expect(before.estimate).toBe('plume-summer');
    const jet = assess(site).estimates.find((o) => o.id === 'plume-summer')!;
    expect(jet.model?.kind).toBe('jet');
    // a wider port (lower exit velocity) set on the estimate itself changes the verdict's dilution
    site.estimates.find((e) => e.id === 'plume-summer')!.params = { angle: '0 deg' };
    const after = row(assess(site), 'Late summer', 'Ammonia-N');
    expect(after.achievedDilution).not.toBeCloseTo(before.achievedDilution!, 3);
  });

  it('adds the near-field run a compliance row needs when the site has none, and shows it among the outcomes', () => {
    const site = demo();
    site.estimates = site.estimates.filter((e) => e.id !== 'plume-winter');
    const a = assess(site);
    const added = a.estimates.filter((o) => o.added && o.method !== 'far-field');
    expect(added.map((o) => [o.method, o.feature?.id, o.condition?.id])).toEqual([
      ['buoyant-jet', 'works', 'early-winter'],
    ]);
    expect(row(a, 'Early winter', 'Ammonia-N').estimate).toBe(added[0].id);
    expect(row(a, 'Early winter', 'Ammonia-N').nearFieldDilution).toBeGreaterThan(1);
  });

  it('a profile that cannot be read marks only the estimates of its condition, naming the condition', () => {
    const site = demo();
    site.conditions[1].profile.rows[2][0] = 'deep';
    const a = assess(site);
    const winter = a.estimates.filter((o) => o.condition?.id === 'early-winter');
    expect(winter.length).toBeGreaterThan(0);
    for (const o of winter) {
      expect(o.status).toBe('error');
      // the condition is named as the user sees it, not by its place in the file
      expect(o.error).toMatch(/^Early winter profile: /);
      expect(o.error).not.toMatch(/conditions\[|ProfileError/);
    }
    expect(a.estimates.filter((o) => o.condition?.id === 'late-summer').every((o) => o.status !== 'error')).toBe(true);
    expect(a.conditions.map((c) => c.status)).toEqual(['ok', 'error']);
    expect(a.conditions[1].issues[0]).toMatchObject({ row: 3 });
    expect(row(a, 'Early winter', 'Ammonia-N').verdict).toBe('cannot tell');
  });

  it('warnings are structured: a code, a severity and a message', () => {
    for (const o of assess(demo()).estimates)
      for (const w of o.warnings) {
        expect(w.code).toMatch(/^[a-z0-9-]+$/);
        expect(['note', 'caution', 'outside-validity']).toContain(w.severity);
        expect(typeof w.message).toBe('string');
      }
  });

  it('outcomes are plain data: a structured clone (the worker boundary) keeps them equal', () => {
    const a = assess(demo());
    expect(structuredClone(a)).toEqual(a);
  });
});

describe('the incremental assessor', () => {
  it('gives the same assessment as a full one, and after one edit recomputes only what that edit touches', () => {
    const assessor = new SiteAssessor();
    const site = demo();
    const full = assess(site);
    expect(assessor.assess(site, META, { bands: false })).toEqual(full);
    expect(assessor.computed).toBe(full.estimates.length);

    const edited = structuredClone(site);
    const works = edited.features.find((f) => f.id === 'works')!;
    if (works.kind !== 'outfall') throw new Error('the demo outfall');
    works.discharge = '0.5 m3/s';
    const again = assess(edited);
    expect(assessor.assess(edited, META, { bands: false })).toEqual(again);
    // the outfall's two plumes, its length scales and the far-field runs that start where the plumes end
    const touched = again.estimates.filter(
      (o) => ['plume-summer', 'plume-winter', 'jet-scales'].includes(o.id) || o.method === 'far-field',
    );
    expect(assessor.computed).toBe(touched.length);

    expect(assessor.assess(structuredClone(edited), META, { bands: false })).toEqual(again);
    expect(assessor.computed).toBe(0);
  });

  it('an edited profile recomputes the estimates of its condition only', () => {
    const assessor = new SiteAssessor();
    const site = demo();
    assessor.assess(site, META, { bands: false });
    const edited = structuredClone(site);
    edited.conditions[1].profile.rows[0][1] = Number(edited.conditions[1].profile.rows[0][1]) + 0.5;
    expect(assessor.assess(edited, META, { bands: false })).toEqual(assess(edited));
    const winter = assess(edited).estimates.filter((o) => o.condition?.id === 'early-winter').length;
    expect(assessor.computed).toBe(winter);
  });
});

describe('compliance by zone', () => {
  it('acute rows at the zone of initial dilution and chronic rows at the mixing-zone boundary, one governing each', () => {
    const a = assess(demo());
    const acute = a.compliance.filter((r) => r.zone === 'acute');
    expect(acute.map((r) => [r.constituent, r.boundary])).toEqual([
      ['Ammonia-N', 10],
      ['Ammonia-N', 10],
    ]);
    for (const zone of ['acute', 'chronic'] as const)
      for (const name of ['Ammonia-N', 'Temperature']) {
        const rows = a.compliance.filter((r) => r.zone === zone && r.constituent === name);
        if (!rows.length) continue;
        expect(rows.filter((r) => r.governing)).toHaveLength(1);
        // the governing condition is the one with the smallest margin
        const least = Math.min(...rows.map((r) => r.margin!));
        expect(rows.find((r) => r.governing)!.margin).toBe(least);
      }
  });

  it('required dilution from the constituent table: S = (Ce − Ca)/(Cc − Ca) (U.S. EPA 1991, TSD §4.3, worked by hand)', () => {
    const a = assess(demo());
    const r = row(a, 'Late summer', 'Ammonia-N', 'acute');
    expect([r.effluent, r.ambient, r.criterion]).toEqual([12, 0.05, 6]);
    expect(r.requiredDilution).toBeCloseTo((12 - 0.05) / (6 - 0.05), 12);
    // the required-dilution estimate reads the same row (chronic limit 1.2 mg/L) unless its params override it
    const estimate = a.estimates.find((o) => o.id === 'ammonia-dilution')!;
    expect(estimate.results.dilution.value).toBeCloseTo((12 - 0.05) / (1.2 - 0.05), 12);
  });

  it('the temperature row reads the outfall effluent temperature: one place to type it', () => {
    const site = demo();
    const works = site.features.find((f) => f.id === 'works')!;
    if (works.kind !== 'outfall') throw new Error('the demo outfall');
    works.effluent.temperature = '24 degC';
    const r = row(assess(site), 'Late summer', 'Temperature');
    expect(r.effluent).toBeCloseTo(24, 12);
    expect(r.requiredDilution).toBeCloseTo((24 - 10.5) / (12.5 - 10.5), 12);
  });

  it('beyond the near field, the far-field run multiplies the dilution and is listed among the outcomes', () => {
    const a = assess(demo());
    const r = row(a, 'Early winter', 'Ammonia-N');
    const far = a.estimates.find((o) => o.id === r.farFieldEstimate)!;
    expect(far.method).toBe('far-field');
    expect(far.added).toBe(true);
    expect(r.achievedDilution).toBeCloseTo(r.nearFieldDilution! * (far.results.dilution.value as number), 12);
    expect(r.models).toContain('far-field');
  });

  it('"meets" resting on an extrapolated far field cannot tell, unless the near field meets on its own', () => {
    const a = assess(demo());
    // late summer: the current (0.02 m/s) is below the far field's steady-current range
    const summer = row(a, 'Late summer', 'Ammonia-N');
    expect(a.estimates.find((o) => o.id === summer.farFieldEstimate)!.warnings.map((w) => w.severity)).toContain(
      'outside-validity',
    );
    expect(summer.nearFieldDilution!).toBeLessThan(summer.requiredDilution! * 1.2);
    expect(summer.verdict).toBe('cannot tell');
    const winter = row(a, 'Early winter', 'Ammonia-N');
    expect(winter.nearFieldDilution!).toBeGreaterThan(winter.requiredDilution! * 1.2);
    expect(winter.verdict).toBe('meets');
  });
});
