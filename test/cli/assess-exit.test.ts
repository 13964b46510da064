import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { assessmentExit } from '../../src-main/cli/assess-command';
import { EXIT_NOT_ALL_OK } from '../../src-main/cli/errors';
import type { Assessment, EstimateOutcome } from '../../shared-core/site';
import { ROOT, runGprime } from '../helpers/cli';

// Exit codes are gprime's own contract (src-main/cli/main.ts usage text): no outside source applies.
const dir = mkdtempSync(join(tmpdir(), 'gprime-exit-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** The demo reservoir with only the given estimates, written to a temporary site file. */
function demoWith(name: string, estimates: object[]): string {
  const site = JSON.parse(readFileSync(join(ROOT, 'examples', 'quillmere-reservoir.gpsite'), 'utf8'));
  site.estimates = estimates;
  const path = join(dir, `${name}.gpsite`);
  writeFileSync(path, JSON.stringify(site, null, 2));
  return path;
}

const dilution = {
  id: 'ammonia-dilution',
  method: 'required-dilution',
  feature: 'works',
  params: { effluent: 12, ambient: 0.05, criterion: 1.2 },
};
/** exit velocity 500 m/s lies outside the method's hard range (≤ 100 m/s): the estimate is in error */
const badJet = { id: 'bad-jet', method: 'buoyant-jet', feature: 'works', params: { velocity: 500 } };

describe('gprime assess exit codes (real CLI)', () => {
  it('exits 0 when every estimate is ok, with nothing on stderr', () => {
    const run = runGprime(['assess', demoWith('ok', [dilution]), '--json']);
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    expect(run.json.estimates.every((e: EstimateOutcome) => e.status === 'ok')).toBe(true);
  });

  it('exits 3 with a one-line reason when an estimate is in error, and still writes the whole output', () => {
    const out = join(dir, 'report');
    const run = runGprime(['assess', demoWith('bad', [dilution, badJet]), '--out', out, '--format', 'csv', '--json']);
    expect(run.code).toBe(EXIT_NOT_ALL_OK);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
    expect(run.stderr).toMatch(/^gprime: 1 in error of \d+ estimates/);
    const ids = run.json.estimates.map((e: EstimateOutcome) => e.id);
    expect(ids).toEqual(expect.arrayContaining(['ammonia-dilution', 'bad-jet']));
    expect(run.json.estimates.find((e: EstimateOutcome) => e.id === 'bad-jet').status).toBe('error');
    for (const f of ['tables/summary.csv', 'tables/ammonia-dilution.csv', 'tables/bad-jet.csv'])
      expect(existsSync(join(out, f)), f).toBe(true);
  });

  it('keeps exit 2 for bad input and names the problem', () => {
    const run = runGprime(['assess', join(dir, 'no-such-site.gpsite')]);
    expect(run.code).toBe(2);
    expect(runGprime(['assess']).code).toBe(2);
  });
});

describe('assessmentExit', () => {
  const outcome = (id: string, status: EstimateOutcome['status']) => ({ id, status }) as EstimateOutcome;
  const of = (...estimates: EstimateOutcome[]) => ({ estimates }) as Assessment;

  it('is empty (exit 0) when all are ok', () => {
    expect(assessmentExit(of(outcome('a', 'ok'), outcome('b', 'ok')))).toEqual({});
  });

  it('gives 3 and counts incomplete and failed estimates', () => {
    const r = assessmentExit(of(outcome('a', 'ok'), outcome('b', 'incomplete'), outcome('c', 'error')));
    expect(r.exitCode).toBe(3);
    expect(r.stderr).toMatch(/^1 in error and 1 incomplete of 3 estimates/);
    expect(assessmentExit(of(outcome('a', 'incomplete'))).stderr).toMatch(/^1 incomplete of 1 estimates/);
  });
});
