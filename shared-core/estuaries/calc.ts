import type { CalcMethod } from '../calc/types';

/** The estuaries methods of `gprime calc`. */
export const estuaryCalcMethods: CalcMethod[] = [];
