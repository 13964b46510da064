import type { CalcMethod } from '../calc/types';

/** The internal-waves methods of `gprime calc`. */
export const internalWaveCalcMethods: CalcMethod[] = [];
