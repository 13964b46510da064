import { num } from '../calc/resolve';
import { arg, type CalcMethod } from '../calc/types';
import { positive } from '../core/range';
import { SILL_OVERFLOW_CRITICAL, sillOverflowCritical } from './two-layer';

/** The critical sill overflow of `gprime calc`: the dense layer spilling over a sill crest under deep water. */
export const sillCalcMethods: CalcMethod[] = [
  {
    id: 'sill-overflow',
    title: 'Critical overflow of a dense layer over a sill crest',
    topic: 'hydraulics',
    params: [
      {
        kind: 'number',
        name: 'g_prime',
        unit: 'm/s2',
        description: 'reduced gravity between the dense layer and the water above',
        range: { min: 1e-6, max: 20 },
      },
      {
        kind: 'number',
        name: 'interface_above_crest',
        unit: 'm',
        description:
          'height Y of the upstream interface above the sill crest (upstream, where the dense water is slow)',
        range: { ...positive, max: 11000 },
      },
      {
        kind: 'number',
        name: 'width',
        unit: 'm',
        description: 'width of the sill crest across the flow',
        default: 1,
        range: { ...positive, max: 1e6 },
      },
    ],
    results: [
      { name: 'discharge_per_width', unit: 'm2/s', description: 'q = (2/3)^{3/2} √(g′) Y^{3/2}' },
      { name: 'discharge', unit: 'm3/s', description: 'q times the crest width' },
      { name: 'crest_thickness', unit: 'm', description: 'critical thickness of the dense layer at the crest, 2Y/3' },
      { name: 'crest_velocity', unit: 'm/s', description: 'mean velocity of the dense layer at the crest, q/h_c' },
    ],
    everyday: { g_prime: [1e-3, 0.3], interface_above_crest: [0.5, 50], width: [1, 5000] },
    run(a) {
      const Y = arg.num(a, 'interface_above_crest');
      const r = sillOverflowCritical(arg.num(a, 'g_prime'), Y);
      const hc = (2 * Y) / 3;
      return {
        results: {
          discharge_per_width: num(r.value, 'm2/s'),
          discharge: num(r.value * arg.num(a, 'width'), 'm3/s'),
          crest_thickness: num(hc, 'm'),
          crest_velocity: num(r.value / hc, 'm/s'),
        },
        warnings: r.warnings,
        sources: [SILL_OVERFLOW_CRITICAL.source],
      };
    },
  },
];
