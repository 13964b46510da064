import { num, text } from '../calc/resolve';
import { arg, type CalcMethod, type Series } from '../calc/types';
import { positive } from '../core/range';
import { GRAVITY } from '../quantities';
import {
  DEFAULT_INTERFACIAL_FRICTION,
  SCHIJF_SCHONFELD_1953,
  saltWedgeLengthSchijfSchonfeld1953,
  saltWedgeProfile,
} from './salt-wedge';
import { FISCHER_1972, estuarineRichardsonFischer1972 } from './richardson';
import {
  ARMI_FARMER_1986_NET_FLOW,
  exchangeNetFlowCurve,
  exchangeWithNetFlowArmiFarmer1986,
} from './exchange-net-flow';
import {
  FARMER_ARMI_1986_SILL_NET_FLOW,
  exchangeSillNetFlowCurve,
  exchangeSillWithNetFlowFarmerArmi1986,
} from './exchange-sill-net-flow';

const G_PRIME = {
  kind: 'number',
  name: 'g_prime',
  unit: 'm/s2',
  description: 'reduced gravity between sea and river water',
  range: { ...positive, max: GRAVITY },
} as const;

/** The estuaries methods of `gprime calc`. */
export const estuaryCalcMethods: CalcMethod[] = [
  {
    id: 'salt-wedge',
    title: 'Arrested salt wedge intrusion length',
    topic: 'estuaries',
    params: [
      {
        kind: 'number',
        name: 'river_velocity',
        unit: 'm/s',
        description: 'river velocity over the full depth, Q/(W H)',
        range: { ...positive, max: 20 },
      },
      { kind: 'number', name: 'depth', unit: 'm', description: 'channel depth H', range: { ...positive, max: 1e3 } },
      G_PRIME,
      {
        kind: 'number',
        name: 'interfacial_friction',
        unit: '1',
        description:
          'f_i with interfacial stress τ_i = ρ f_i u1², u1 the upper-layer velocity (default: Sørgard et al. 1990)',
        default: DEFAULT_INTERFACIAL_FRICTION,
        range: { ...positive, max: 0.1 },
      },
    ],
    results: [
      {
        name: 'length',
        unit: 'm',
        description: 'intrusion length from the mouth to the tip (0 when no wedge is arrested)',
      },
      { name: 'river_froude', unit: '1', description: 'F0 = U0/√(g′H)' },
    ],
    run(a) {
      const input = {
        riverVelocity: arg.num(a, 'river_velocity'),
        depth: arg.num(a, 'depth'),
        gPrime: arg.num(a, 'g_prime'),
        interfacialFriction: arg.num(a, 'interfacial_friction'),
      };
      const r = saltWedgeLengthSchijfSchonfeld1953(input);
      const profile = saltWedgeProfile(input);
      const series: Series[] = profile.distance.length
        ? [
            {
              kind: 'salt-wedge-interface',
              title: 'Salt-wedge interface',
              x: { label: 'Distance landward from the mouth', unit: 'm', values: profile.distance },
              y: [{ label: 'Interface depth', unit: 'm', values: profile.interfaceDepth }],
              depthAxis: true,
              caption: 'Depth of the interface between river water and the salt wedge, mouth to tip',
            },
          ]
        : [];
      return {
        results: { length: num(r.length.value, 'm'), river_froude: num(r.riverFroude, '1') },
        warnings: [...r.length.warnings, ...profile.warnings],
        sources: [SCHIJF_SCHONFELD_1953.source],
        series,
      };
    },
  },
  {
    id: 'estuarine-richardson',
    title: 'Estuarine Richardson number and stratification class',
    topic: 'estuaries',
    params: [
      G_PRIME,
      {
        kind: 'number',
        name: 'river_discharge',
        unit: 'm3/s',
        description: 'river (fresh-water) discharge',
        range: { ...positive, max: 1e6 },
      },
      { kind: 'number', name: 'width', unit: 'm', description: 'estuary width', range: { ...positive, max: 1e6 } },
      {
        kind: 'number',
        name: 'tidal_velocity',
        unit: 'm/s',
        description: 'root-mean-square tidal velocity',
        range: { min: 1e-3, max: 10 },
      },
    ],
    results: [
      { name: 'richardson', unit: '1', description: 'Ri_E = g′Q/(W U_t³)' },
      { name: 'class', unit: '', description: 'strongly stratified, partially mixed or well mixed (rules of thumb)' },
    ],
    run(a) {
      const r = estuarineRichardsonFischer1972(
        arg.num(a, 'g_prime'),
        arg.num(a, 'river_discharge'),
        arg.num(a, 'width'),
        arg.num(a, 'tidal_velocity'),
      );
      return {
        results: { richardson: num(r.richardson.value, '1'), class: text(r.estuaryClass) },
        warnings: r.richardson.warnings,
        sources: [FISCHER_1972.source],
      };
    },
  },
  {
    id: 'exchange-flow',
    title: 'Maximal two-layer exchange flow through a contraction (with or without net flow) or over a sill',
    topic: 'estuaries',
    params: [
      G_PRIME,
      {
        kind: 'number',
        name: 'depth',
        unit: 'm',
        description: 'depth at the control (contraction depth or sill-crest depth)',
        range: { ...positive, max: 1e4 },
      },
      {
        kind: 'number',
        name: 'width',
        unit: 'm',
        description: 'width at the control',
        range: { ...positive, max: 1e6 },
      },
      {
        kind: 'choice',
        name: 'control',
        description: 'narrowest section of a flat channel, or a sill',
        choices: ['contraction', 'sill'],
        default: 'contraction',
      },
      {
        kind: 'number',
        name: 'net_discharge',
        unit: 'm3/s',
        description:
          'net (barotropic) discharge Q0 = Q_upper − Q_lower, positive in the direction the upper (lighter) layer flows, e.g. a river outflow',
        default: 0,
        range: { min: -1e9, max: 1e9 },
      },
      {
        kind: 'number',
        name: 'end_width',
        unit: 'm',
        description:
          'channel width at its ends, where it meets the reservoirs (checks that the virtual control fits; contraction only)',
        optional: true,
        range: { ...positive, max: 1e7 },
      },
      {
        kind: 'number',
        name: 'reservoir_depth',
        unit: 'm',
        description:
          'depth of the dense-side basin beyond the sill, more than the crest depth (sill only; default: a deep basin)',
        optional: true,
        range: { ...positive, max: 1e5 },
      },
    ],
    results: [
      {
        name: 'exchange_discharge',
        unit: 'm3/s',
        description: 'discharge of the opposing (smaller) layer: the two-way exchange; equal each way without net flow',
      },
      { name: 'upper_layer_discharge', unit: 'm3/s', description: 'discharge of the upper layer (magnitude)' },
      { name: 'lower_layer_discharge', unit: 'm3/s', description: 'discharge of the lower layer (magnitude)' },
    ],
    run(a) {
      const [g, h, b, q0] = [
        arg.num(a, 'g_prime'),
        arg.num(a, 'depth'),
        arg.num(a, 'width'),
        arg.num(a, 'net_discharge'),
      ];
      const sill = arg.text(a, 'control') === 'sill';
      const r = sill
        ? exchangeSillWithNetFlowFarmerArmi1986(g, h, b, q0, arg.optNum(a, 'reservoir_depth'))
        : exchangeWithNetFlowArmiFarmer1986(g, h, b, q0, arg.optNum(a, 'end_width'));
      const curve = sill
        ? exchangeSillNetFlowCurve(g, h, b, arg.optNum(a, 'reservoir_depth'))
        : exchangeNetFlowCurve(g, h, b);
      const series: Series[] = [
        {
          kind: 'exchange-layer-discharges',
          title: 'Layer discharges against net flow',
          x: { label: 'Net discharge Q0 (positive with the upper layer)', unit: 'm3/s', values: curve.net },
          y: [
            { label: 'Upper layer', unit: 'm3/s', values: curve.upper },
            { label: 'Lower layer', unit: 'm3/s', values: curve.lower },
          ],
          caption: `Maximal exchange ${sill ? 'over the sill' : 'through the contraction'}; at either end the opposing layer stops (one-way flow)`,
        },
      ];
      const [up, low] = [r.upperDischarge.value, r.lowerDischarge.value];
      return {
        results: {
          exchange_discharge: num(Math.min(up, low), 'm3/s'),
          upper_layer_discharge: num(up, 'm3/s'),
          lower_layer_discharge: num(low, 'm3/s'),
        },
        warnings: r.warnings,
        sources: [(sill ? FARMER_ARMI_1986_SILL_NET_FLOW : ARMI_FARMER_1986_NET_FLOW).source],
        series,
      };
    },
  },
];
