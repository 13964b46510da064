import { num, text } from '../calc/resolve';
import { uniqueWarnings } from '../core/warning';
import { arg, type CalcMethod, type CalcOutput, type ResultValue, type Series } from '../calc/types';
import { InputError } from '../core/errors';
import { positive, nonNegative } from '../core/range';
import {
  DEFAULT_PLUNGE_FROUDE,
  plungeDepthAkiyamaStefan1984,
  PLUNGE_AKIYAMA_STEFAN_1984,
  PLUNGE_INITIAL_MIXING,
} from './plunge';
import { DEFAULT_DRAG, UNDERFLOW_NORMAL_STATE, type UnderflowPath } from './underflow';
import { riverInflowPath, type RiverInflow } from './river';
import { insertionDepthSpread } from './sensitivity';
import { ENTRAINMENT_ELLISON_TURNER_1959, ENTRAINMENT_PARKER_1987, type EntrainmentLaw } from './entrainment';
import { note } from '../core/warning';
import { qty } from '../core/quantity-text';
import type { CalcArgs } from '../calc/types';

/** Chart curves of an underflow: the bed path in the vertical section, and discharge and temperature along it. */
export function underflowSeries(path: UnderflowPath): Series[] {
  const distance = { label: 'Distance along the bed from the plunge line', unit: 'm', values: [...path.distance] };
  return [
    {
      kind: 'underflow-path',
      title: 'Underflow path',
      x: distance,
      y: [{ label: 'Depth of the current', unit: 'm', values: [...path.depth] }],
      depthAxis: true,
      caption: 'The current runs down the bed until it meets water of its own density',
    },
    {
      kind: 'underflow-discharge',
      title: 'Underflow discharge',
      x: distance,
      y: [{ label: 'Discharge of the current', unit: 'm3/s', values: [...path.discharge] }],
      caption: 'Discharge grows by entrainment of reservoir water',
    },
    {
      kind: 'underflow-temperature',
      title: 'Underflow temperature',
      x: distance,
      y: [{ label: 'Temperature of the current', unit: 'degC', values: [...path.temperature] }],
      caption: 'Temperature of the current as it mixes',
    },
  ];
}

function runUnderflow(a: CalcArgs): CalcOutput {
  const p = arg.profile(a);
  if (!p) throw new InputError('file', '(missing)', '', 'a CSV profile', 'a profile file is required');
  const inflow: RiverInflow = {
    discharge: arg.num(a, 'discharge'),
    width: arg.num(a, 'width'),
    temperature: arg.num(a, 'temperature'),
    salinity: arg.num(a, 'salinity'),
    sediment: arg.num(a, 'sediment'),
    bedSlope: arg.num(a, 'bed_slope'),
    distanceToPoint: arg.optNum(a, 'distance'),
  };
  const law = arg.text<EntrainmentLaw>(a, 'entrainment_law');
  const r = riverInflowPath(p, {
    ...inflow,
    law,
    dragCoefficient: arg.num(a, 'drag_coefficient'),
    initialMixing: arg.num(a, 'initial_mixing'),
    plungeFroude: arg.num(a, 'plunge_froude'),
  });
  const u = r.underflow;
  const spread = insertionDepthSpread(p, inflow);
  const results: Record<string, ResultValue> = { plunge_depth: num(r.plungeDepth, 'm') };
  if (u.insertionDepth !== undefined) {
    results.insertion_depth = num(u.insertionDepth, 'm');
    results.insertion_distance = num(u.path.distance[u.path.distance.length - 1], 'm');
  }
  results.insertion_depth_low = num(spread.low, 'm');
  results.insertion_depth_high = num(spread.high, 'm');
  const spreadNote = note(
    'insertion-spread',
    `Across both entrainment laws and the published ranges of bed drag, plunge mixing and plunge Froude number the insertion depth lies between ${qty(spread.low, 'm', 3)} and ${qty(spread.high, 'm', 3)}` +
      (spread.reachingBottom > 0
        ? `; in ${spread.reachingBottom} of ${spread.runs} combinations the current reaches the bottom of the profile.`
        : '.'),
  );
  results.discharge_at_end = num(u.path.discharge[u.path.discharge.length - 1], 'm3/s');
  if (u.travelTimeToPoint !== undefined) results.travel_time = num(u.travelTimeToPoint, 's');
  results.outcome = text(
    u.insertionDepth !== undefined
      ? `The inflow plunges at ${qty(r.plungeDepth, 'm', 3)} and runs down the bed until it leaves it as an interflow at ${qty(u.insertionDepth, 'm', 3)}.`
      : 'The inflow plunges and runs down the bed to the bottom of the profile without meeting water of its own density.',
  );
  const stopped = u.status === 'max-steps' || u.status === 'step-failed';
  return {
    results,
    ...(stopped ? { incomplete: `the underflow integration stopped early: ${u.message}` } : {}),
    warnings: uniqueWarnings([...r.warnings, spreadNote]),
    sources: [
      PLUNGE_AKIYAMA_STEFAN_1984.source,
      PLUNGE_INITIAL_MIXING.source,
      UNDERFLOW_NORMAL_STATE.source,
      (law === 'parker1987' ? ENTRAINMENT_PARKER_1987 : ENTRAINMENT_ELLISON_TURNER_1959).source,
    ],
    series: underflowSeries(u.path),
  };
}

/** The inflows methods of `gprime calc`. */
export const inflowCalcMethods: CalcMethod[] = [
  {
    id: 'plunge-depth',
    title: 'Plunge depth of a dense river inflow',
    topic: 'inflows',
    params: [
      {
        kind: 'number',
        name: 'discharge',
        unit: 'm3/s',
        description: 'river inflow',
        range: { ...positive, max: 1e5 },
      },
      {
        kind: 'number',
        name: 'width',
        unit: 'm',
        description: 'width of the inflow at the plunge line',
        range: { ...positive, max: 1e5 },
      },
      {
        kind: 'number',
        name: 'g_prime',
        unit: 'm/s2',
        description: 'reduced gravity between the inflow and the surface water',
        range: { ...positive, max: 20 },
      },
      {
        kind: 'number',
        name: 'plunge_froude',
        unit: '1',
        default: DEFAULT_PLUNGE_FROUDE,
        range: { ...positive, max: 5 },
        description: 'plunge densimetric Froude number (default 0.5: Fischer et al. 1979, h_p ≈ 1.6 (q²/g′)^⅓)',
      },
    ],
    results: [{ name: 'plunge_depth', unit: 'm', description: 'water depth at the plunge line' }],
    run(a) {
      const r = plungeDepthAkiyamaStefan1984(
        arg.num(a, 'discharge'),
        arg.num(a, 'width'),
        arg.num(a, 'g_prime'),
        arg.num(a, 'plunge_froude'),
      );
      return {
        results: { plunge_depth: num(r.value, 'm') },
        warnings: r.warnings,
        sources: [PLUNGE_AKIYAMA_STEFAN_1984.source],
      };
    },
  },
  {
    id: 'underflow',
    title: 'River inflow: plunge, underflow down the bed and insertion depth',
    topic: 'inflows',
    params: [
      { kind: 'profile', name: 'file', description: 'CSV profile of the reservoir' },
      {
        kind: 'number',
        name: 'discharge',
        unit: 'm3/s',
        description: 'river inflow',
        range: { ...positive, max: 1e5 },
      },
      {
        kind: 'number',
        name: 'width',
        unit: 'm',
        description: 'width of the inflow and of the underflow',
        range: { ...positive, max: 1e5 },
      },
      {
        kind: 'number',
        name: 'temperature',
        unit: 'degC',
        description: 'river water temperature',
        range: { min: -3, max: 60 },
      },
      {
        kind: 'number',
        name: 'salinity',
        unit: 'PSU',
        description: 'river water salinity',
        default: 0,
        range: { min: 0, max: 70 },
      },
      {
        kind: 'number',
        name: 'sediment',
        unit: 'kg/m3',
        description: 'suspended sediment of the river',
        default: 0,
        range: { ...nonNegative, max: 500 },
      },
      {
        kind: 'number',
        name: 'bed_slope',
        unit: '1',
        description: 'bed slope tanθ below the plunge line',
        range: { ...positive, max: 1 },
      },
      {
        kind: 'number',
        name: 'distance',
        unit: 'm',
        description: 'distance along the bed to a point of interest (e.g. the dam)',
        optional: true,
        range: { ...positive, max: 1e6 },
      },
      {
        kind: 'choice',
        name: 'entrainment_law',
        description:
          'entrainment of reservoir water into the current: parker1987 (Parker et al. 1987) or ellison-turner1959 (Turner 1986 fit); the two fits differ by 20–35 % at Ri = 0.1–0.5',
        choices: ['parker1987', 'ellison-turner1959'],
        default: 'parker1987',
      },
      {
        kind: 'number',
        name: 'drag_coefficient',
        unit: '1',
        description: `total drag of the bed and the interface C_D (published range ${UNDERFLOW_NORMAL_STATE.validity.drag_coefficient.min}–${UNDERFLOW_NORMAL_STATE.validity.drag_coefficient.max}; default ${DEFAULT_DRAG}, common practice)`,
        default: DEFAULT_DRAG,
        range: { ...positive, max: 1 },
      },
      {
        kind: 'number',
        name: 'initial_mixing',
        unit: '1',
        description: `plunge-line mixing ratio Φ, entrained over inflow discharge (reported range ${PLUNGE_INITIAL_MIXING.validity.initial_mixing.min}–${PLUNGE_INITIAL_MIXING.validity.initial_mixing.max}; default 0.1)`,
        default: 0.1,
        range: { ...nonNegative, max: 5 },
      },
      {
        kind: 'number',
        name: 'plunge_froude',
        unit: '1',
        description: `plunge densimetric Froude number F_p (range ${PLUNGE_AKIYAMA_STEFAN_1984.validity.plunge_froude.min}–${PLUNGE_AKIYAMA_STEFAN_1984.validity.plunge_froude.max}; default ${DEFAULT_PLUNGE_FROUDE})`,
        default: DEFAULT_PLUNGE_FROUDE,
        range: { ...positive, max: 5 },
      },
    ],
    results: [
      { name: 'plunge_depth', unit: 'm', description: 'water depth at the plunge line' },
      {
        name: 'insertion_depth',
        unit: 'm',
        description: 'depth where the current leaves the bed as an interflow (when it does)',
      },
      {
        name: 'insertion_distance',
        unit: 'm',
        description: 'distance along the bed from the plunge line to the insertion',
      },
      {
        name: 'insertion_depth_low',
        unit: 'm',
        description:
          'shallowest insertion across both entrainment laws and the published ranges of drag, plunge mixing and plunge Froude number',
      },
      {
        name: 'insertion_depth_high',
        unit: 'm',
        description: 'deepest insertion across the same combinations (the bottom when a combination reaches it)',
      },
      {
        name: 'discharge_at_end',
        unit: 'm3/s',
        description: 'discharge of the current where it leaves the bed or ends',
      },
      {
        name: 'travel_time',
        unit: 's',
        description: 'travel time to the point of interest (when the current reaches it on the bed)',
      },
      { name: 'outcome', unit: '', description: 'what the inflow does, in words' },
    ],
    run: (a) => runUnderflow(a),
  },
];
