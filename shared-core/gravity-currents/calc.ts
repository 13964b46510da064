import type { CalcMethod } from '../calc/types';

/** The gravity-currents methods of `gprime calc`. */
export const gravityCurrentCalcMethods: CalcMethod[] = [];
