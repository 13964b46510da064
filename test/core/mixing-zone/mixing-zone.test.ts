import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { requiredDilution } from '../../../shared-core/mixing-zone/required-dilution';
import { dilutionAtBoundary } from '../../../shared-core/mixing-zone/boundary';
import { complianceTable, temperatureExcessLimit, type Constituent } from '../../../shared-core/mixing-zone/compliance';
import { buoyantJetTrajectory } from '../../../shared-core/jets/buoyant-jet';
import { InputError } from '../../../shared-core/core/errors';
import { SCREENING_CAUTION } from '../../../shared-core/core/caution';
import { runCheckValues } from '../../helpers/check-values';

runCheckValues(
  'mixing-zone',
  'required-dilution',
  (i) => requiredDilution(Number(i.effluent), Number(i.ambient), Number(i.criterion)).value,
);

describe('required dilution', () => {
  it('an ambient that already fails the criterion is an InputError', () => {
    expect(() => requiredDilution(30, 6, 5)).toThrow(InputError);
    expect(() => requiredDilution(2, 5, 6, 'minimum')).toThrow(InputError);
    expect(() => requiredDilution(Number.NaN, 1, 2)).toThrow(InputError);
  });
  it('mixing effluent and ambient at the required dilution meets the criterion exactly (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e3, max: 1e3, noNaN: true }),
        fc.double({ min: 0.01, max: 1e3, noNaN: true }),
        fc.double({ min: 1.01, max: 1e3, noNaN: true }),
        (ca, allowed, factor) => {
          const cc = ca + allowed,
            ce = ca + allowed * factor;
          const s = requiredDilution(ce, ca, cc).value;
          expect(s).toBeGreaterThanOrEqual(1);
          expect(ca + (ce - ca) / s).toBeCloseTo(cc, 6);
        },
      ),
    );
  });
});

describe('mixing-zone boundary and compliance table', () => {
  const winter = buoyantJetTrajectory({
    diameter: 0.15,
    velocity: 3,
    angle: 0,
    portDepth: 35,
    effluentDensity: 1000,
    ambient: { kind: 'uniform', density: 1026 },
    current: 0.1,
  });
  const summer = buoyantJetTrajectory({
    diameter: 0.15,
    velocity: 3,
    angle: 0,
    portDepth: 35,
    effluentDensity: 1000,
    ambient: { kind: 'table', depth: [0, 10, 20, 40], density: [1023, 1023.2, 1025.6, 1026] },
  });
  const constituents: Constituent[] = [
    { name: 'ammonia', unit: 'mg/L', effluent: 30, ambient: 0.02, criterion: 1.5 },
    { name: 'copper', unit: 'µg/L', effluent: 400, ambient: 1, criterion: 3.1 },
    temperatureExcessLimit('temperature', 24, 12, 1),
  ];

  it('dilution at a horizontal boundary lies between the path values around it', () => {
    const b = dilutionAtBoundary(winter, { measure: 'horizontal', distance: 5 });
    expect(b.reached).toBe(true);
    const i = winter.path.horizontalDistance.findIndex((x) => x >= 5);
    expect(b.dilutionCentreline).toBeGreaterThanOrEqual(winter.path.dilutionCentreline[i - 1]);
    expect(b.dilutionCentreline).toBeLessThanOrEqual(winter.path.dilutionCentreline[i]);
  });
  it('a boundary beyond the near field takes the end value and says so', () => {
    const b = dilutionAtBoundary(summer, { measure: 'path', distance: 1e4 });
    expect(b.reached).toBe(false);
    expect(b.dilutionCentreline).toBe(summer.path.dilutionCentreline.at(-1));
    expect(b.note).toMatch(/far-field/);
  });
  it('rows cover every condition × constituent with margin and verdict', () => {
    const conditions = [
      { name: 'winter, peak current', dilution: dilutionAtBoundary(winter, { measure: 'horizontal', distance: 100 }) },
      { name: 'summer, slack', dilution: dilutionAtBoundary(summer, { measure: 'horizontal', distance: 100 }) },
      { name: 'given', dilution: 50, ambient: { copper: 3.5 } },
    ];
    const { rows, caution } = complianceTable(conditions, constituents);
    expect(caution).toBe(SCREENING_CAUTION);
    expect(rows).toHaveLength(9);
    const given = rows.filter((r) => r.condition === 'given');
    const amm = given.find((r) => r.constituent === 'ammonia')!;
    expect(amm.requiredDilution).toBeCloseTo(29.98 / 1.48, 10);
    expect(amm.margin).toBeCloseTo(50 / (29.98 / 1.48) - 1, 10);
    expect(amm.verdict).toBe('meets');
    expect(given.find((r) => r.constituent === 'copper')!.verdict).toBe('does not meet');
    expect(given.find((r) => r.constituent === 'temperature')!.requiredDilution).toBeCloseTo(12, 12);
    for (const r of rows) expect(['meets', 'does not meet', 'cannot tell']).toContain(r.verdict);
  });
  it('within the uncertainty band the verdict is cannot tell', () => {
    const { rows } = complianceTable(
      [{ name: 'c', dilution: 10.5 }],
      [{ name: 'x', unit: '', effluent: 11, ambient: 1, criterion: 2 }],
    );
    expect(rows[0].verdict).toBe('cannot tell');
    expect(() => complianceTable([], constituents)).toThrow(InputError);
    expect(() => complianceTable([{ name: 'c', dilution: 0.5 }], constituents)).toThrow(InputError);
  });
});
