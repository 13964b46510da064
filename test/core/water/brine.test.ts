import { describe, expect, it } from 'vitest';
import { runCheckValues } from '../../helpers/check-values';
import { densityBrineSharqawy2010, SHARQAWY_2010 } from '../../../shared-core/water/brine';
import { waterDensity, seawaterSalinityLimit } from '../../../shared-core/water/density';
import { densitySeawaterTeos10 } from '../../../shared-core/water/teos10';

runCheckValues(
  'water',
  'density-brine-sharqawy2010',
  (i) => densityBrineSharqawy2010(Number(i.absolute_salinity), Number(i.temperature)).value,
);

describe('brines beyond the seawater equations of state', () => {
  it('up to SP 42 the chosen seawater equation of state is used as before', () => {
    expect(waterDensity({ temperature: 20, salinity: 42, eos: 'teos10' }).value).toBe(
      densitySeawaterTeos10(42, 20).value,
    );
  });
  it('beyond it the density is the brine correlation at the reference-composition salinity, with a note naming both', () => {
    const r = waterDensity({ temperature: 20, salinity: 70, eos: 'teos10' });
    expect(r.method).toBe(SHARQAWY_2010.id);
    expect(r.value).toBe(densityBrineSharqawy2010((35.16504 / 35) * 70, 20).value);
    expect(r.warnings.map((w) => w.code)).toEqual(['brine-equation-of-state']);
    expect(seawaterSalinityLimit('eos80')).toBe(42);
  });
  it('hot brine gets a caution: the correlation leaves its stated accuracy above 40 °C', () => {
    const r = waterDensity({ temperature: 50, salinity: 65, eos: 'eos80' });
    expect(r.warnings.map((w) => w.code)).toContain('hot-brine-density');
  });
});
