import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  loadSite,
  serialiseSite,
  assessSite,
  siteJsonSchema,
  SiteFileError,
  SITE_VERSION,
} from '../../../shared-core/site';

const ROOT = resolve(import.meta.dirname, '../../..');
const read = (p: string) => readFileSync(resolve(ROOT, p), 'utf8');
const DEMOS = ['examples/quillmere-reservoir.gpsite', 'examples/amsel-estuary.gpsite'];

describe('site document', () => {
  it('the demo sites load and survive a save/load round trip unchanged', () => {
    for (const path of DEMOS) {
      const site = loadSite(read(path));
      expect(loadSite(serialiseSite(site))).toEqual(site);
    }
  });

  it('migrates a version-1 file forward (single profile → one named condition)', () => {
    const site = loadSite(read('test/fixtures/sites/version1.gpsite'));
    expect(site.version).toBe(SITE_VERSION);
    expect(site.conditions).toHaveLength(1);
    expect(site.conditions[0].profile.columns).toEqual(['depth (ft)', 'temperature (degF)']);
    expect(site.estimates[0].condition).toBe(site.conditions[0].id);
    const a = assessSite(site, { gprimeVersion: 't', siteHash: 'h' });
    expect(a.estimates[0].status).toBe('ok');
  });

  it('migrates a version-2 file (no input uncertainties) forward, unchanged otherwise', () => {
    const doc = JSON.parse(read('test/fixtures/sites/version3.gpsite'));
    doc.version = 2;
    for (const e of doc.estimates) delete e.uncertainty;
    const site = loadSite(JSON.stringify(doc));
    expect(site.version).toBe(SITE_VERSION);
    expect(site.estimates.map((e) => e.id)).toEqual(doc.estimates.map((e: { id: string }) => e.id));
    expect(site.estimates.every((e) => e.uncertainty === undefined)).toBe(true);
  });

  it('migrates a version-3 file: the criterion becomes the chronic one, a repeated effluent temperature is linked', () => {
    const v3 = JSON.parse(read('test/fixtures/sites/version3.gpsite'));
    const site = loadSite(JSON.stringify(v3));
    expect(site.version).toBe(4);
    const outfall = site.features.find((f) => f.kind === 'outfall')!;
    if (outfall.kind !== 'outfall') throw new Error('an outfall');
    const [ammonia, temperature] = outfall.constituents;
    expect(ammonia).toEqual({ name: 'Ammonia-N', unit: 'mg/L', effluent: 12, ambient: 0.05, chronic: 1.2 });
    // the version-3 row repeated the outfall's effluent temperature (22 degC): it now reads that field
    expect(temperature).toEqual({ name: 'Temperature', unit: 'degC', of: 'temperature', ambient: 10.5, chronic: 12.5 });
    expect(outfall.effluent.temperature).toBe(22);
    // every other part of the document is as it was
    expect(site.estimates).toEqual(loadSite(JSON.stringify(v3)).estimates);
    expect(site.conditions.map((c) => c.profile)).toEqual(v3.conditions.map((c: { profile: unknown }) => c.profile));
  });

  it('a version-3 row that differs from the effluent field keeps its own value (nothing typed is lost)', () => {
    const v3 = JSON.parse(read('test/fixtures/sites/version3.gpsite'));
    const outfall = v3.features.find((f: { kind: string }) => f.kind === 'outfall');
    outfall.constituents[1].effluent = 23;
    const site = loadSite(JSON.stringify(v3));
    const f = site.features.find((x) => x.kind === 'outfall')!;
    if (f.kind !== 'outfall') throw new Error('an outfall');
    expect(f.constituents[1]).toMatchObject({ effluent: 23, chronic: 12.5 });
    expect(f.constituents[1].of).toBeUndefined();
  });

  it('refuses a newer version with a clear message', () => {
    const doc = JSON.parse(read(DEMOS[0]));
    doc.version = SITE_VERSION + 1;
    expect(() => loadSite(JSON.stringify(doc))).toThrow(
      new RegExp(`version ${SITE_VERSION + 1}; this gprime reads versions up to ${SITE_VERSION}`),
    );
  });

  it('names the place of a malformed value', () => {
    const doc = JSON.parse(read(DEMOS[0]));
    doc.features[0].ports[1].depth = true;
    try {
      loadSite(JSON.stringify(doc));
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(SiteFileError);
      expect((e as SiteFileError).place).toBe('features[0].ports[1].depth');
    }
    expect(() => loadSite('{"format": "gprime-site", "version": 2,')).toThrow(SiteFileError);
    expect(() => loadSite('{"format": "other"}')).toThrow(/not a gprime site file/);
  });

  it('never throws anything but SiteFileError on arbitrary JSON (property)', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        try {
          loadSite(JSON.stringify(v));
        } catch (e) {
          expect(e).toBeInstanceOf(SiteFileError);
        }
      }),
    );
  });

  it('the shipped JSON Schema matches the zod schema', () => {
    expect(JSON.parse(read('shared-core/site/site.schema.json'))).toEqual(JSON.parse(JSON.stringify(siteJsonSchema())));
  });

  it('assessing is deterministic: the same site gives the same numbers', () => {
    const site = loadSite(read(DEMOS[0]));
    const a = assessSite(site, { gprimeVersion: 't', siteHash: 'h' });
    const b = assessSite(loadSite(read(DEMOS[0])), { gprimeVersion: 't', siteHash: 'h' });
    expect(JSON.stringify(a)).toBe(JSON.stringify(b));
  });

  it('a bad value in a feature gives that estimate an error naming the place, the others still run', () => {
    const doc = JSON.parse(read(DEMOS[0]));
    doc.features[0].release = '18 kg';
    const a = assessSite(loadSite(JSON.stringify(doc)), { gprimeVersion: 't', siteHash: 'h' });
    const blend = a.estimates.find((e) => e.id === 'release-summer')!;
    expect(blend.status).toBe('error');
    // the field as the editors name it, the value as typed (its unit once), the expected quantity in words
    expect(blend.error).toMatch(
      /^Tower intake: Total release = "18 kg" is not allowed: "kg" is not a unit of discharge/,
    );
    expect(blend.error).not.toMatch(/features\[|Error:/);
    expect(a.estimates.find((e) => e.id === 'strat-summer')!.status).toBe('ok');
  });

  it('builds the mixing-zone compliance table for every outfall × condition × constituent', () => {
    const a = assessSite(loadSite(read(DEMOS[0])), { gprimeVersion: 't', siteHash: 'h' });
    // 1 outfall × 2 conditions × (2 chronic constituents + 1 with an acute criterion)
    expect(a.compliance).toHaveLength(6);
    const ammonia = a.compliance.find(
      (r) => r.constituent === 'Ammonia-N' && r.condition === 'Early winter' && r.zone === 'chronic',
    )!;
    // required dilution by mass balance S = (Ce − Ca)/(Cc − Ca) (US EPA 1991, Technical Support Document, §4.3 — worked by hand)
    expect(ammonia.requiredDilution).toBeCloseTo((12 - 0.05) / (1.2 - 0.05), 10);
    expect(ammonia.achievedDilution).toBeGreaterThan(1);
    expect(['meets', 'does not meet', 'cannot tell']).toContain(ammonia.verdict);
    expect(ammonia.margin).toBeCloseTo(ammonia.achievedDilution! / ammonia.requiredDilution! - 1, 12);
  });

  it('a condition the plume model cannot run for gives "cannot tell" rows naming the reason', () => {
    const doc = JSON.parse(read(DEMOS[0]));
    doc.features[2].diameter = '0.5 kg';
    const a = assessSite(loadSite(JSON.stringify(doc)), { gprimeVersion: 't', siteHash: 'h' });
    expect(
      a.compliance.every(
        (r) => r.verdict === 'cannot tell' && /Port diameter = "0\.5 kg"/.test(r.note) && !/features\[/.test(r.note),
      ),
    ).toBe(true);
  });
});
