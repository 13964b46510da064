import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { assessSite, conditionsFromCsv, loadSite } from '../../../shared-core/site';

// An invented survey file of three casts (test/fixtures/profiles/multi-cast.csv) becomes three conditions
// of a site, each one assessed on its own profile. Plumbing only: no method value is checked here.
const ROOT = resolve(import.meta.dirname, '../../..');
const site = loadSite(readFileSync(resolve(ROOT, 'examples/quillmere-reservoir.gpsite'), 'utf8'));
const survey = readFileSync(resolve(ROOT, 'test/fixtures/profiles/multi-cast.csv'), 'utf8');

describe('a file of several casts', () => {
  it('becomes one condition per cast, named from its station and date, with unique ids', () => {
    const conditions = conditionsFromCsv(site, survey, 'Survey');
    expect(conditions.map((c) => c.name)).toEqual(['A1, 2025-06-02', 'B2, 2025-06-02', 'A1, 2025-06-16']);
    expect(new Set(conditions.map((c) => c.id)).size).toBe(3);
    expect(conditions.every((c) => !site.conditions.some((s) => s.id === c.id))).toBe(true);
    expect(conditions[1].profile.rows).toHaveLength(3);
  });

  it('each cast condition reads as a profile of its own in the assessment', () => {
    const conditions = conditionsFromCsv(site, survey, 'Survey');
    const a = assessSite(
      { ...site, conditions: [...site.conditions, ...conditions] },
      { gprimeVersion: 't', siteHash: '' },
      { bands: false },
    );
    const read = a.conditions.filter((c) => conditions.some((k) => k.id === c.id));
    expect(read.map((c) => c.status)).toEqual(['ok', 'ok', 'ok']);
    expect(read.map((c) => c.deepest)).toEqual([4, 6, 4]);
  });

  it('a single-cast file is one condition with the given name', () => {
    const one = survey.split('\n').slice(0, 5).join('\n');
    expect(conditionsFromCsv(site, one, 'Spring cast').map((c) => c.name)).toEqual(['Spring cast']);
  });
});
