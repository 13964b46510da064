import type { CalcMethod } from './types';
import { waterCalcMethods } from '../water/calc';
import { profileCalcMethods } from '../profile/calc';
import { gravityCurrentCalcMethods } from '../gravity-currents/calc';
import { estuaryCalcMethods } from '../estuaries/calc';
import { lockCalcMethods } from '../estuaries/lock-calc';
import { internalWaveCalcMethods } from '../internal-waves/calc';
import { lakeCalcMethods } from '../internal-waves/lake-calc';
import { hydraulicsCalcMethods } from '../hydraulics/calc';
import { sillCalcMethods } from '../hydraulics/sill-calc';
import { withdrawalCalcMethods } from '../withdrawal/calc';
import { inflowCalcMethods } from '../inflows/calc';
import { jetCalcMethods } from '../jets/calc';
import { mixingZoneCalcMethods } from '../mixing-zone/calc';

/**
 * Every method of `gprime calc`, in the order `--list` shows them. Each topic contributes one array
 * from its own calc.ts.
 */
export const CALC_METHODS: readonly CalcMethod[] = [
  ...waterCalcMethods,
  ...profileCalcMethods,
  ...gravityCurrentCalcMethods,
  ...estuaryCalcMethods,
  ...lockCalcMethods,
  ...internalWaveCalcMethods,
  ...lakeCalcMethods,
  ...hydraulicsCalcMethods,
  ...sillCalcMethods,
  ...withdrawalCalcMethods,
  ...inflowCalcMethods,
  ...jetCalcMethods,
  ...mixingZoneCalcMethods,
];

export function findCalcMethod(id: string): CalcMethod | undefined {
  return CALC_METHODS.find((m) => m.id === id);
}
