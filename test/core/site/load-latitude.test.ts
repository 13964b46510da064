// The site's latitude reaches the depth-from-pressure of every profile (conditions and estimates alike).
// Consistency of the plumbing, not a validation of the formula: depthFromPressureUnesco1983 has its own
// check values (UNESCO 1983, Fofonoff & Millard, Tech. Pap. Mar. Sci. 44, depth table).
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { assessSite, loadSite, serialiseSite } from '../../../shared-core/site';
import { depthFromPressureUnesco1983 } from '../../../shared-core/water/salinity';

const site = () => {
  const s = loadSite(
    readFileSync(resolve(import.meta.dirname, '../../../examples/quillmere-reservoir.gpsite'), 'utf8'),
  );
  s.conditions[0].profile = {
    columns: ['pressure (dbar)', 'temperature (degC)', 'salinity (PSU)'],
    rows: [
      [0, 20, 35],
      [1000, 5, 35],
    ],
  };
  return s;
};
const deepest = (s: ReturnType<typeof site>) =>
  assessSite(s, { gprimeVersion: 't', siteHash: 'h' }).conditions[0].deepest;

describe('site latitude', () => {
  it('is optional, kept through a save and typed with its unit', () => {
    const s = site();
    s.waterBody.latitude = '60 deg';
    expect(loadSite(serialiseSite(s)).waterBody.latitude).toBe('60 deg');
  });

  it('gives the depth from pressure of the profiles (45° when the site gives none)', () => {
    const s = site();
    expect(deepest(s)).toBeCloseTo(depthFromPressureUnesco1983(1000, 45).value, 9);
    for (const lat of [0, 90, -30]) {
      s.waterBody.latitude = lat;
      expect(deepest(s)).toBeCloseTo(depthFromPressureUnesco1983(1000, lat).value, 9);
    }
    // gravity grows toward the poles, so the same pressure is a shallower depth there
    s.waterBody.latitude = 0;
    const equator = deepest(s)!;
    s.waterBody.latitude = 90;
    expect(deepest(s)!).toBeLessThan(equator);
  });
});
