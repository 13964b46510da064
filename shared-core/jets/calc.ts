import { num, text } from '../calc/resolve';
import { arg, type CalcArgs, type CalcMethod, type CalcOutput } from '../calc/types';
import { positive, nonNegative } from '../core/range';
import { JET_LENGTH_SCALES, jetLengthScales } from './length-scales';
import { BUOYANT_JET, EXIT_VELOCITY, PORT_DIAMETER } from './closure';
import { JET_PATH_COLUMNS } from './buoyant-jet';
import { buoyantJetCalcMethod, incompleteOf } from './buoyant-jet-calc';
import { diffuserInputFromArgs, jetPathSeries, jetPortParams } from './calc-inputs';
import { LINE_PLUME_RSB1989, linePlume } from './line-plume';
import { DIFFUSER_PLUME, diffuserPlume } from './diffuser';
import { REQUIRED_DILUTION, requiredDilution } from '../mixing-zone/required-dilution';
import type { ResultValue, Series } from '../calc/types';

export { buoyantJetInputFromArgs, diffuserInputFromArgs, jetPathSeries } from './calc-inputs';
export { incompleteOf } from './buoyant-jet-calc';

const lengthScaleResults = [
  ['l_q', 'lQ', 'Q/√M: distance over which the port geometry matters'],
  ['l_m', 'lM', 'M^¾/|B|^½: jet-to-plume distance'],
  ['l_crossflow_momentum', 'lCrossflowMomentum', '√M/u_a: distance before the current bends the jet'],
  ['l_crossflow_buoyancy', 'lCrossflowBuoyancy', '|B|/u_a³: distance before the current dominates the buoyant rise'],
  ['l_strat_momentum', 'lStratMomentum', '(M/N²)^¼: stratification scale of a jet'],
  ['l_strat_buoyancy', 'lStratBuoyancy', '(|B|/N³)^¼: stratification scale of a plume'],
] as const;

/** Runs the merged-diffuser model for the CLI: regime, merging point, rise and governing dilution. */
function runDiffuserPlume(a: CalcArgs): CalcOutput {
  const r = diffuserPlume(diffuserInputFromArgs(a));
  // the governing dilution first: cards and summaries show the first numeric result
  const results: Record<string, ResultValue> = {
    dilution: num(r.dilution, '1'),
    dilution_average: num(r.dilutionAverage, '1'),
    rise_height: num(r.riseHeight, 'm'),
    regime: text(r.regimeText),
  };
  if (r.merge) {
    results.merge_height = num(r.merge.z, 'm');
    results.merge_distance = num(r.merge.horizontalDistance, 'm');
    results.merge_dilution = num(r.merge.dilutionCentreline, '1');
  }
  results.single_port_dilution = num(
    r.isolated.path.dilutionCentreline[r.isolated.path.dilutionCentreline.length - 1],
    '1',
  );
  results.outcome = text((r.governing === 'merged' ? r.merged : r.isolated).outcomeText);
  const single = r.isolated.path;
  const series: Series[] = [
    ...jetPathSeries(r.merged),
    {
      kind: 'single-port-dilution',
      title: 'Single-port dilution',
      x: { ...JET_PATH_COLUMNS.horizontalDistance, values: [...single.horizontalDistance] },
      y: [{ ...JET_PATH_COLUMNS.dilutionCentreline, values: [...single.dilutionCentreline] }],
      caption: 'Centreline dilution of one port without neighbours, for comparison',
    },
  ];
  return {
    results,
    warnings: r.warnings,
    sources: [DIFFUSER_PLUME.source, BUOYANT_JET.source],
    series,
    model: { kind: 'diffuser', diffuser: r },
    ...incompleteOf(r.merged, r.isolated),
  };
}

/** The jets and mixing-zone methods of `gprime calc`. */
export const jetCalcMethods: CalcMethod[] = [
  {
    id: 'jet-length-scales',
    title: JET_LENGTH_SCALES.title,
    topic: 'jets',
    params: [
      { kind: 'number', name: 'diameter', unit: 'm', description: 'port diameter', range: PORT_DIAMETER },
      { kind: 'number', name: 'velocity', unit: 'm/s', description: 'exit velocity', range: EXIT_VELOCITY },
      {
        kind: 'number',
        name: 'g_prime',
        unit: 'm/s2',
        description: 'reduced gravity g(ρ_a − ρ_e)/ρ_a, positive for a rising effluent',
        range: { min: -5, max: 5 },
      },
      {
        kind: 'number',
        name: 'current',
        unit: 'm/s',
        description: 'ambient current speed',
        default: 0,
        range: { ...nonNegative, max: 10 },
      },
      {
        kind: 'number',
        name: 'buoyancy_frequency',
        unit: '1/s',
        description: 'ambient buoyancy frequency N',
        default: 0,
        range: { ...nonNegative, max: 2 },
      },
    ],
    results: [
      ...lengthScaleResults.map(([name, , description]) => ({
        name,
        unit: 'm',
        description: `${description} (omitted when the process is absent)`,
      })),
      {
        name: 'froude',
        unit: '1',
        description: 'port densimetric Froude number (omitted for a neutrally buoyant jet)',
      },
      { name: 'regime', unit: '', description: 'which process dominates where, in words' },
    ],
    run(a) {
      const r = jetLengthScales({
        diameter: arg.num(a, 'diameter'),
        velocity: arg.num(a, 'velocity'),
        gPrime: arg.num(a, 'g_prime'),
        current: arg.num(a, 'current'),
        buoyancyFrequency: arg.num(a, 'buoyancy_frequency'),
      });
      const results: Record<string, ResultValue> = {};
      for (const [name, key] of lengthScaleResults) if (Number.isFinite(r[key])) results[name] = num(r[key], 'm');
      if (Number.isFinite(r.froude)) results.froude = num(r.froude, '1');
      results.regime = text(r.regime.join(' '));
      return { results, warnings: r.warnings, sources: [JET_LENGTH_SCALES.source] };
    },
  },
  buoyantJetCalcMethod,
  {
    id: 'diffuser-plume',
    title: DIFFUSER_PLUME.title,
    topic: 'jets',
    params: [
      ...jetPortParams,
      {
        kind: 'number',
        name: 'spacing',
        unit: 'm',
        description: 'port spacing along the diffuser (or give diffuser_length and ports)',
        optional: true,
        range: { ...positive, max: 1e4 },
      },
      {
        kind: 'number',
        name: 'ports',
        unit: '1',
        description: 'number of ports (1: a single port)',
        optional: true,
        range: { min: 1, max: 500 },
      },
      {
        kind: 'number',
        name: 'diffuser_length',
        unit: 'm',
        description: 'length from the first to the last port',
        optional: true,
        range: { ...positive, max: 1e5 },
      },
      {
        kind: 'number',
        name: 'current_angle',
        unit: 'deg',
        description: 'angle between the current and the diffuser axis (90: across it, the case modelled)',
        optional: true,
        range: { min: 0, max: 90 },
      },
    ],
    results: [
      {
        name: 'dilution',
        unit: '1',
        description:
          'governing centreline dilution at the end of the near field: the smaller of merged and single-port',
      },
      { name: 'dilution_average', unit: '1', description: 'flux-average dilution there' },
      {
        name: 'rise_height',
        unit: 'm',
        description: 'highest centreline point above the ports (governing path; 0 for a sinking plume)',
      },
      { name: 'regime', unit: '', description: 'whether the plumes merge and which regime governs, in words' },
      {
        name: 'merge_height',
        unit: 'm',
        description:
          'height above the ports where neighbouring plumes merge, negative below (omitted when they do not)',
      },
      { name: 'merge_distance', unit: 'm', description: 'horizontal distance from the ports where they merge' },
      { name: 'merge_dilution', unit: '1', description: 'centreline dilution where they merge' },
      {
        name: 'single_port_dilution',
        unit: '1',
        description: 'centreline dilution of one port without neighbours, at the end of its near field',
      },
      { name: 'outcome', unit: '', description: 'how the near field ends, in words' },
    ],
    run: (a) => runDiffuserPlume(a),
  },
  {
    id: 'line-plume',
    title: LINE_PLUME_RSB1989.title,
    topic: 'jets',
    params: [
      {
        kind: 'number',
        name: 'discharge_per_length',
        unit: 'm2/s',
        description: 'diffuser discharge per unit length q',
        range: { ...positive, max: 100 },
      },
      {
        kind: 'number',
        name: 'g_prime',
        unit: 'm/s2',
        description: 'reduced gravity of the effluent (rising)',
        range: { ...positive, max: 5 },
      },
      {
        kind: 'number',
        name: 'buoyancy_frequency',
        unit: '1/s',
        description: 'buoyancy frequency N of the linear stratification (0: unstratified water, give water_depth)',
        range: { ...nonNegative, max: 2 },
      },
      {
        kind: 'number',
        name: 'water_depth',
        unit: 'm',
        description: 'height of the water surface above the diffuser (needed when buoyancy_frequency = 0)',
        optional: true,
        range: { ...positive, max: 11000 },
      },
      {
        kind: 'number',
        name: 'current',
        unit: 'm/s',
        description: 'current perpendicular to the diffuser',
        default: 0,
        range: { ...nonNegative, max: 10 },
      },
    ],
    results: [
      { name: 'rise_height', unit: 'm', description: 'top of the wastefield above the diffuser' },
      { name: 'dilution', unit: '1', description: 'minimum dilution at the end of the near field' },
    ],
    run(a) {
      const r = linePlume(
        arg.num(a, 'discharge_per_length'),
        arg.num(a, 'g_prime'),
        arg.num(a, 'buoyancy_frequency'),
        arg.num(a, 'current'),
        arg.optNum(a, 'water_depth'),
      );
      return {
        results: { rise_height: num(r.riseHeight, 'm'), dilution: num(r.dilution, '1') },
        warnings: r.warnings,
        sources: [LINE_PLUME_RSB1989.source],
      };
    },
  },
  {
    id: 'required-dilution',
    title: REQUIRED_DILUTION.title,
    topic: 'jets',
    params: [
      {
        kind: 'number',
        name: 'effluent',
        unit: '1',
        description: 'effluent concentration (any unit, the same for all three)',
      },
      { kind: 'number', name: 'ambient', unit: '1', description: 'ambient (background) concentration' },
      {
        kind: 'number',
        name: 'criterion',
        unit: '1',
        description: 'water-quality criterion at the mixing-zone boundary',
      },
    ],
    results: [{ name: 'dilution', unit: '1', description: '(C_e − C_a)/(C_c − C_a), at least 1' }],
    run(a) {
      const r = requiredDilution(arg.num(a, 'effluent'), arg.num(a, 'ambient'), arg.num(a, 'criterion'));
      return { results: { dilution: num(r.value, '1') }, warnings: r.warnings, sources: [REQUIRED_DILUTION.source] };
    },
  },
];
