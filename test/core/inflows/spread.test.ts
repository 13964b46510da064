import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { findCalcMethod } from '../../../shared-core/calc/registry';
import { runCalc } from '../../../shared-core/calc/resolve';
import { parseProfileCsv } from '../../../shared-core/profile/csv';
import { riverInflowPath } from '../../../shared-core/inflows/river';
import { insertionDepthSpread } from '../../../shared-core/inflows/sensitivity';
import { UNDERFLOW_NORMAL_STATE } from '../../../shared-core/inflows/underflow';
import { ENTRAINMENT_ELLISON_TURNER_1959, ENTRAINMENT_PARKER_1987 } from '../../../shared-core/inflows/entrainment';

const PROFILE = parseProfileCsv(
  readFileSync(join(resolve(import.meta.dirname, '..', '..', '..'), 'examples', 'demo-profile.csv'), 'utf8'),
);
const INFLOW = { discharge: 40, width: 60, temperature: 14, sediment: 0.5, bedSlope: 0.01 };
const value = (out: ReturnType<typeof runCalc>, name: string) => out.results[name]?.value as number;

describe('underflow: the coefficients are inputs and the estimate shows how far the insertion moves across them', () => {
  it('the defaults give the same insertion as before (Parker et al. 1987, C_D = 0.005, Φ = 0.1, F_p = 0.5)', () => {
    const out = runCalc(findCalcMethod('underflow')!, {
      file: PROFILE,
      discharge: 40,
      width: 60,
      temperature: 14,
      sediment: 0.5,
      bed_slope: 0.01,
    });
    const direct = riverInflowPath(PROFILE, INFLOW).underflow.insertionDepth!;
    expect(value(out, 'insertion_depth')).toBe(direct);
    expect(value(out, 'insertion_depth_low')).toBeLessThanOrEqual(direct);
    expect(value(out, 'insertion_depth_high')).toBeGreaterThanOrEqual(direct);
    expect(value(out, 'insertion_depth_high') - value(out, 'insertion_depth_low')).toBeGreaterThan(1);
  });
  it('the spread is the shallowest and deepest of the 16 corners of the published ranges', () => {
    const s = insertionDepthSpread(PROFILE, INFLOW);
    expect(s.runs).toBe(16);
    const { min, max } = UNDERFLOW_NORMAL_STATE.validity.drag_coefficient;
    const corners = [min!, max!].flatMap((dragCoefficient) =>
      (['parker1987', 'ellison-turner1959'] as const).flatMap((law) =>
        [0, 0.5].flatMap((initialMixing) =>
          [0.2, 0.8].map(
            (plungeFroude) =>
              riverInflowPath(PROFILE, { ...INFLOW, law, dragCoefficient, initialMixing, plungeFroude }).underflow
                .insertionDepth ?? PROFILE.depth[PROFILE.depth.length - 1],
          ),
        ),
      ),
    );
    expect(s.low).toBe(Math.min(...corners));
    expect(s.high).toBe(Math.max(...corners));
  });
  it('a chosen entrainment law, drag and plunge mixing change the estimate and name their sources', () => {
    const base = { file: PROFILE, discharge: 40, width: 60, temperature: 14, sediment: 0.5, bed_slope: 0.01 };
    const m = findCalcMethod('underflow')!;
    const et = runCalc(m, {
      ...base,
      entrainment_law: 'ellison-turner1959',
      drag_coefficient: 0.01,
      initial_mixing: 0.3,
    });
    expect(value(et, 'insertion_depth')).not.toBe(value(runCalc(m, base), 'insertion_depth'));
    expect(et.sources).toContain(ENTRAINMENT_ELLISON_TURNER_1959.source);
    expect(et.sources).not.toContain(ENTRAINMENT_PARKER_1987.source);
  });
});
