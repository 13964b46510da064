import type { CalcMethod } from './types';
import { waterCalcMethods } from '../water/calc';
import { profileCalcMethods } from '../profile/calc';
import { gravityCurrentCalcMethods } from '../gravity-currents/calc';
import { estuaryCalcMethods } from '../estuaries/calc';
import { internalWaveCalcMethods } from '../internal-waves/calc';
import { hydraulicsCalcMethods } from '../hydraulics/calc';
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
  ...internalWaveCalcMethods,
  ...hydraulicsCalcMethods,
  ...withdrawalCalcMethods,
  ...inflowCalcMethods,
  ...jetCalcMethods,
  ...mixingZoneCalcMethods,
];

export function findCalcMethod(id: string): CalcMethod | undefined {
  return CALC_METHODS.find((m) => m.id === id);
}
