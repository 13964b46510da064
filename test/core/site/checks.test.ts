// Site-level checks: unique ids (refused on load, with the place named) and the geometry of ports and
// profiles against the water column. Depths are below the surface, positive down; the checks are plain
// geometry (common practice, no source): a port must lie between the surface (depth 0) and the bed.
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { assessSite, loadSite, SiteFileError, type Site } from '../../../shared-core/site';
import { duplicateIds, siteGeometryChecks } from '../../../shared-core/site/checks';
import { sentenceIn } from '../../../shared-core/units/sentence';

const DEMO_TEXT = readFileSync(resolve(import.meta.dirname, '../../../examples/quillmere-reservoir.gpsite'), 'utf8');
const demo = (): Site => loadSite(DEMO_TEXT);
const codes = (site: Site, deepest: (number | undefined)[] = []) =>
  siteGeometryChecks(site, deepest).map((w) => w.code);

describe('duplicate ids', () => {
  it('finds none in the demo site', () => {
    expect(duplicateIds(demo())).toEqual([]);
  });

  it('names the repeated place and the first use, per group', () => {
    const s = demo();
    s.conditions.push({ ...s.conditions[0] });
    s.estimates.push({ ...s.estimates[1] });
    expect(duplicateIds(s)).toEqual([
      {
        group: 'conditions',
        id: s.conditions[0].id,
        place: `conditions[${s.conditions.length - 1}].id`,
        first: 'conditions[0].id',
      },
      {
        group: 'estimates',
        id: s.estimates[1].id,
        place: `estimates[${s.estimates.length - 1}].id`,
        first: 'estimates[1].id',
      },
    ]);
  });

  it('are refused on load with the place of the repeat named', () => {
    const doc = JSON.parse(DEMO_TEXT);
    doc.features[2].id = doc.features[0].id;
    let err: unknown;
    try {
      loadSite(JSON.stringify(doc));
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(SiteFileError);
    expect((err as SiteFileError).place).toBe('features[2].id');
    expect((err as Error).message).toMatch(/the id "tower" is already used at features\[0\]\.id/);
  });

  it('may repeat across groups (a condition and a feature may share an id)', () => {
    const doc = JSON.parse(DEMO_TEXT);
    doc.features[0].id = doc.conditions[0].id;
    for (const e of doc.estimates) if (e.feature === 'tower') e.feature = doc.conditions[0].id;
    expect(() => loadSite(JSON.stringify(doc))).not.toThrow();
  });
});

describe('geometry of the site', () => {
  it('has nothing to say about the demo site', () => {
    const s = demo();
    const a = assessSite(s, { gprimeVersion: 't', siteHash: 'h' });
    expect(a.checks).toEqual([]);
  });

  it("says when a port lies below the bed, naming the field, in the reader's units", () => {
    const s = demo();
    const outfall = s.features.findIndex((f) => f.kind === 'outfall');
    (s.features[outfall] as { portDepth: number | string }).portDepth = '130 ft'; // 39.62 m, bed at 38 m
    const w = siteGeometryChecks(s);
    expect(w.map((x) => x.code)).toEqual(['port-below-bed']);
    expect(w[0].input).toBe(`features[${outfall}].portDepth`);
    expect(sentenceIn(w[0].message, 'si')).toMatch(/39\.6\d* m puts the port below the bed: waterBody\.depth is 38 m/);
    // and the assessment carries it
    expect(assessSite(s, { gprimeVersion: 't', siteHash: 'h' }).checks.map((x) => x.code)).toEqual(['port-below-bed']);
  });

  it('says when a port lies above the surface', () => {
    const s = demo();
    const intake = s.features.findIndex((f) => f.kind === 'intake');
    (s.features[intake] as { ports: { depth: number | string }[] }).ports[1].depth = -2;
    const w = siteGeometryChecks(s);
    expect(w.map((x) => x.code)).toEqual(['port-above-surface']);
    expect(w[0].input).toBe(`features[${intake}].ports[1].depth`);
  });

  it('says when the greatest depth is shallower than a profile or a port, and not at equality', () => {
    const s = demo();
    s.waterBody.depth = 30;
    // the deepest intake port is 98 ft = 29.87 m: above a 30 m bed; the deepest sample is given as 38 m
    expect(codes(s, [38, undefined])).toEqual(['profile-below-bed']);
    expect(codes(s, [30])).toEqual([]);
    s.waterBody.depth = 25;
    expect(codes(s, [25])).toEqual(['port-below-bed']); // the 98 ft port
  });

  it('skips what does not read (its own field reports it) and an absent greatest depth', () => {
    const s = demo();
    (s.features[0] as { ports: { depth: number | string }[] }).ports[0].depth = 'deep';
    expect(codes(s)).toEqual([]);
    delete (s.waterBody as { depth?: unknown }).depth;
    expect(codes(s, [500])).toEqual([]);
  });
});

describe('site checks reach every view in words', () => {
  it('the CLI summary and the report cautions say a port lies below the bed, naming the field as the editors do', async () => {
    const { summariseAssessment } = await import('../../../src-main/cli/assess-command');
    const { buildReportModel } = await import('../../../shared-core/report/model');
    const s = demo();
    const outfall = s.features.findIndex((f) => f.kind === 'outfall');
    (s.features[outfall] as { portDepth: number | string }).portDepth = '130 ft';
    const a = assessSite(s, { gprimeVersion: 't', siteHash: 'h' });
    const name = (s.features[outfall] as { name: string }).name;
    const summary = summariseAssessment(a, 'us');
    expect(summary).toContain('Site checks:');
    expect(summary).toContain(`${name}: Port depth = 130 ft puts the port below the bed`);
    expect(summary).not.toMatch(/features\[|waterBody\./);
    const cautions = buildReportModel(a, 'si', s).cautions.filter((c) => c.startsWith('Site check:'));
    expect(cautions).toHaveLength(1);
    expect(cautions[0]).toMatch(/Port depth = 39\.62 m puts the port below the bed: Water body: .* is 38 m/);
  });
});
