import type { CalcMethod } from './types';
import { waterCalcMethods } from '../water/calc';
import { profileCalcMethods } from '../profile/calc';

/**
 * Every method of `gprime calc`, in the order `--list` shows them. Each topic contributes one array
 * from its own calc.ts; add a topic with one import and one spread here.
 */
export const CALC_METHODS: readonly CalcMethod[] = [
  ...waterCalcMethods,
  ...profileCalcMethods,
];

export function findCalcMethod(id: string): CalcMethod | undefined {
  return CALC_METHODS.find((m) => m.id === id);
}
