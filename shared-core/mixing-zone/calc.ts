import { num } from '../calc/resolve';
import { arg, type CalcMethod, type Series } from '../calc/types';
import { nonNegative } from '../core/range';
import { brooksField, DEFAULT_FAR_FIELD_ALPHA, FAR_FIELD_BROOKS_1960, farFieldSpreadingBrooks1960 } from './far-field';

/** Points of the far-field chart, from the end of the near field to the distance asked for. */
const SERIES_POINTS = 41;

/** Field width and centreline dilution factor against distance downstream of the end of the near field. */
export function farFieldSeries(width: number, current: number, distance: number, alpha: number): Series {
  const xs = Array.from({ length: SERIES_POINTS }, (_, i) => (distance * i) / (SERIES_POINTS - 1));
  const field = xs.map((x) => brooksField(width, current, x, alpha));
  return {
    kind: 'far-field-dilution',
    title: 'Far-field spreading',
    x: { label: 'Distance downstream of the end of the near field', unit: 'm', values: xs },
    y: [
      { label: 'Centreline dilution factor', unit: '1', values: field.map((p) => p.dilution) },
      { label: 'Field width', unit: 'm', values: field.map((p) => p.width) },
    ],
    caption: 'The wastefield widens by the 4/3-law; the factor multiplies the near-field dilution',
  };
}

/** The mixing-zone methods of `gprime calc`. */
export const mixingZoneCalcMethods: CalcMethod[] = [
  {
    id: 'far-field',
    title: FAR_FIELD_BROOKS_1960.title,
    topic: 'mixing-zone',
    params: [
      {
        kind: 'number',
        name: 'width',
        unit: 'm',
        description: 'wastefield width at the end of the near field',
        range: { min: 0.1, max: 1e4 },
      },
      {
        kind: 'number',
        name: 'current',
        unit: 'm/s',
        description: 'ambient current carrying the wastefield',
        range: { min: 1e-3, max: 5 },
      },
      {
        kind: 'number',
        name: 'distance',
        unit: 'm',
        description: 'distance downstream of the end of the near field',
        range: { ...nonNegative, max: 1e6 },
      },
      {
        kind: 'number',
        name: 'alpha',
        unit: 'm^(2/3)/s',
        default: DEFAULT_FAR_FIELD_ALPHA,
        range: { min: 1e-5, max: 1e-2 },
        description:
          '4/3-law coefficient of ε = α L^(4/3) (default 0.01 cm^(2/3)/s ≈ 4.64e-4 m^(2/3)/s, a typical coastal value, Fischer et al. 1979)',
      },
    ],
    results: [
      {
        name: 'dilution',
        unit: '1',
        description: 'far-field centreline dilution factor (multiplies the near-field dilution)',
      },
      { name: 'field_width', unit: 'm', description: 'wastefield width at the distance' },
    ],
    everyday: { width: [5, 500], current: [0.05, 0.5], distance: [0, 5000], alpha: [2e-4, 1e-3] },
    run(a) {
      const [b, u, x, alpha] = ['width', 'current', 'distance', 'alpha'].map((n) => arg.num(a, n));
      const r = farFieldSpreadingBrooks1960(b, u, x, alpha);
      return {
        results: { dilution: num(r.dilution, '1'), field_width: num(r.width, 'm') },
        warnings: r.warnings,
        sources: [FAR_FIELD_BROOKS_1960.source],
        ...(x > 0 ? { series: [farFieldSeries(b, u, x, alpha)] } : {}),
      };
    },
  },
];
