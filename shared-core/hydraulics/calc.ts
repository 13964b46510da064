import type { CalcMethod } from '../calc/types';

/** The hydraulics methods of `gprime calc`. */
export const hydraulicsCalcMethods: CalcMethod[] = [];
