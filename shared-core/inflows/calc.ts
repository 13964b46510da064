import type { CalcMethod } from '../calc/types';

/** The inflows methods of `gprime calc`. */
export const inflowCalcMethods: CalcMethod[] = [];
