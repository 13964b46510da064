import type { CalcMethod } from '../calc/types';

/** The withdrawal methods of `gprime calc`. */
export const withdrawalCalcMethods: CalcMethod[] = [];
