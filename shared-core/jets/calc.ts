import type { CalcMethod } from '../calc/types';

/** The jets methods of `gprime calc`. */
export const jetCalcMethods: CalcMethod[] = [];
