import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { findCalcMethod } from '../../../shared-core/calc/registry';
import { runCalc } from '../../../shared-core/calc/resolve';
import type { CalcMethod } from '../../../shared-core/calc/types';
import { lakeNumberImbergerPatterson1990, windStressLargePond1981 } from '../../../shared-core/internal-waves/basin';
import { parseProfileCsv } from '../../../shared-core/profile/csv';
import { thermoclineDepth } from '../../../shared-core/profile/stratification';

const PROFILE = parseProfileCsv(
  readFileSync(join(resolve(import.meta.dirname, '..', '..', '..'), 'examples', 'demo-profile.csv'), 'utf8'),
);
const method = (id: string): CalcMethod => {
  const m = findCalcMethod(id);
  if (!m) throw new Error(`no calc method ${id}`);
  return m;
};
const value = (out: ReturnType<typeof runCalc>, name: string) => out.results[name].value as number;

describe('coded methods offered by gprime calc', () => {
  it('front-speed shin-dalziel-linden: Fr = 1 in a deep ambient and ½√(g′H) for a full-depth lock (Shin, Dalziel & Linden 2004, abstract)', () => {
    const deep = runCalc(method('front-speed'), { g_prime: 0.1, current_depth: 0.5, model: 'shin-dalziel-linden' });
    expect(value(deep, 'froude')).toBeCloseTo(1, 12);
    const full = runCalc(method('front-speed'), {
      g_prime: 0.1,
      current_depth: 0.5,
      total_depth: 1,
      model: 'shin-dalziel-linden',
    });
    expect(value(full, 'speed')).toBeCloseTo(0.5 * Math.sqrt(0.1 * 1), 12);
    expect(() =>
      runCalc(method('front-speed'), {
        g_prime: 0.1,
        current_depth: 0.6,
        total_depth: 1,
        model: 'shin-dalziel-linden',
      }),
    ).toThrow(/current_depth = .* is not allowed/);
  });

  it('navigation-lock: ideal exchange V = ¼ B H √(g′H) t before the fronts reach the ends (Yih 1965 §3; Benjamin 1968 §4)', () => {
    const out = runCalc(method('navigation-lock'), {
      g_prime: 0.16,
      length: 200,
      width: 20,
      depth: 4,
      salinity_difference: 30,
      open_time: 100,
      speed: 'ideal',
    });
    expect(value(out, 'exchanged_volume')).toBeCloseTo(0.25 * 20 * 4 * Math.sqrt(0.16 * 4) * 100, 9);
    expect(value(out, 'exchanged_fraction')).toBeCloseTo(1600 / 16000, 12);
    expect(out.series?.[0].kind).toBe('lock-exchanged-volume');
  });

  it('sill-overflow: q = (2/3)^{3/2} √g′ Y^{3/2} and the crest flow is critical, u = √(g′h_c) (Whitehead et al. 1974; Turner 1973 §3.2)', () => {
    const out = runCalc(method('sill-overflow'), { g_prime: 0.1, interface_above_crest: 10, width: 200 });
    expect(value(out, 'discharge_per_width')).toBeCloseTo((2 / 3) ** 1.5 * Math.sqrt(0.1) * 10 ** 1.5, 12);
    expect(value(out, 'discharge')).toBeCloseTo(200 * value(out, 'discharge_per_width'), 9);
    const hc = value(out, 'crest_thickness');
    expect(value(out, 'crest_velocity')).toBeCloseTo(Math.sqrt(0.1 * hc), 12);
  });

  it('lake-number: the basin method on the measured profile, its thermocline and the Large & Pond friction velocity', () => {
    const out = runCalc(method('lake-number'), {
      file: PROFILE,
      hypsography: '0:2e6, 10:1.2e6, 25:4e5, 38:0',
      wind_speed: 8,
    });
    const direct = lakeNumberImbergerPatterson1990(
      PROFILE,
      { depth: [0, 10, 25, 38], area: [2e6, 1.2e6, 4e5, 0] },
      windStressLargePond1981(8).shearVelocity,
      thermoclineDepth(PROFILE).value,
    );
    expect(value(out, 'lake_number')).toBe(direct.value);
    expect(value(out, 'schmidt_stability')).toBe(direct.schmidtStability);
    expect(value(out, 'schmidt_stability')).toBeGreaterThan(0);
    expect(out.warnings.map((w) => w.code)).toContain('thermocline-from-profile');
  });

  it('lake-number names the hypsography when a pair is malformed or the curve does not start at the surface', () => {
    const run = (h: string) => () => runCalc(method('lake-number'), { file: PROFILE, hypsography: h, wind_speed: 8 });
    expect(run('0:2e6, ten:1e6')).toThrow(/hypsography = "ten:1e6" is not allowed/);
    expect(run('5:2e6, 38:0')).toThrow(/hypsography depth\[0\]/);
  });
});
