import { num } from '../calc/resolve';
import { arg, type CalcMethod } from '../calc/types';
import { positive } from '../core/range';
import { DEFAULT_PLUNGE_FROUDE, plungeDepthAkiyamaStefan1984, PLUNGE_AKIYAMA_STEFAN_1984 } from './plunge';

/** The inflows methods of `gprime calc`. */
export const inflowCalcMethods: CalcMethod[] = [
  {
    id: 'plunge-depth',
    title: 'Plunge depth of a dense river inflow',
    topic: 'inflows',
    params: [
      { kind: 'number', name: 'discharge', unit: 'm3/s', description: 'river inflow', range: { ...positive, max: 1e5 } },
      { kind: 'number', name: 'width', unit: 'm', description: 'width of the inflow at the plunge line', range: { ...positive, max: 1e5 } },
      { kind: 'number', name: 'g_prime', unit: 'm/s2', description: 'reduced gravity between the inflow and the surface water', range: { ...positive, max: 20 } },
      {
        kind: 'number', name: 'plunge_froude', unit: '1', default: DEFAULT_PLUNGE_FROUDE, range: { ...positive, max: 5 },
        description: 'plunge densimetric Froude number (default 0.5: Fischer et al. 1979, h_p ≈ 1.6 (q²/g′)^⅓)',
      },
    ],
    results: [{ name: 'plunge_depth', unit: 'm', description: 'water depth at the plunge line' }],
    run(a) {
      const r = plungeDepthAkiyamaStefan1984(arg.num(a, 'discharge'), arg.num(a, 'width'), arg.num(a, 'g_prime'), arg.num(a, 'plunge_froude'));
      return { results: { plunge_depth: num(r.value, 'm') }, warnings: r.warnings, sources: [PLUNGE_AKIYAMA_STEFAN_1984.source] };
    },
  },
];
