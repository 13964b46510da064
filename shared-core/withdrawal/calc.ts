import { num, text } from '../calc/resolve';
import { arg, type CalcMethod } from '../calc/types';
import { caution, note } from '../core/warning';
import { qty } from '../core/quantity-text';
import { InputError } from '../core/errors';
import { positive } from '../core/range';
import { criticalDischargeCraya1949, CRAYA_1949, SINK_POSITIONS, type SinkKind, type SinkPosition } from './two-layer';
import { halfThicknessSpreadLineSink, withdrawalLayer, WITHDRAWAL_LINE_SINK, WITHDRAWAL_POINT_SINK } from './layer';
import { WITHDRAWAL_MEASURED_PROFILE } from './measured';
import { WITHDRAWAL_VELOCITY } from './outflow';
import { releaseSeries, withdrawalZones } from './release-charts';
import { checkPortCount, RELEASE_BLEND, type Port } from './blend';
import { optimiseRelease } from './release-optimiser';
import { LayerMemo } from './port-layer';
import { WITHDRAWAL_INTERFERENCE, type InterferenceMode } from './interference';

const SINKS = ['line', 'point'] as const;
const SINK = {
  kind: 'choice',
  name: 'sink',
  description: 'line = slot across the width, point = orifice',
  choices: SINKS,
} as const;
const SLOT_WIDTH = {
  kind: 'number',
  name: 'width',
  unit: 'm',
  description: 'slot width across the channel (line sink only)',
  optional: true,
  range: { ...positive, max: 1e5 },
} as const;
const INTERFERENCE = ['combined', 'independent'] as const;

/** Parses `ports=5:40,30:40` (depth below the surface in m : capacity in m3/s, one pair per port). */
export function parsePorts(textValue: string): Port[] {
  const pairs = textValue
    .split(/[,;]/)
    .map((s) => s.trim())
    .filter((s) => s !== '');
  if (pairs.length === 0)
    throw new InputError(
      'ports',
      textValue,
      '',
      'depth:capacity pairs, e.g. 5:40,30:40',
      'give at least one port as depth:capacity',
    );
  checkPortCount(pairs.length);
  return pairs.map((pair) => {
    const m = /^([-+]?\d*\.?\d+(?:[eE][-+]?\d+)?)\s*:\s*([-+]?\d*\.?\d+(?:[eE][-+]?\d+)?)$/.exec(pair);
    if (!m)
      throw new InputError(
        'ports',
        pair,
        '',
        'depth:capacity pairs, e.g. 5:40,30:40',
        `"${pair}" is not a depth:capacity pair (m : m3/s)`,
      );
    return { depth: Number(m[1]), capacity: Number(m[2]) };
  });
}

/** The withdrawal methods of `gprime calc`. */
export const withdrawalCalcMethods: CalcMethod[] = [
  {
    id: 'withdrawal-two-layer',
    title: 'Critical discharge of an intake below or above a sharp interface (two layers)',
    topic: 'withdrawal',
    params: [
      {
        kind: 'number',
        name: 'g_prime',
        unit: 'm/s2',
        description: 'reduced gravity across the interface',
        range: { ...positive, max: 20 },
      },
      {
        kind: 'number',
        name: 'interface_distance',
        unit: 'm',
        description: 'vertical distance from the intake to the interface',
        range: { ...positive, max: 1e4 },
      },
      SINK,
      SLOT_WIDTH,
      {
        kind: 'choice',
        name: 'position',
        description:
          'wall or bed (half-space approach flow), wall-foot (on the bed at the foot of a wall: quarter-space)',
        choices: SINK_POSITIONS,
        default: 'wall',
      },
      {
        kind: 'number',
        name: 'port_depth',
        unit: 'm',
        description: 'depth of the port the estimate is for, below the surface (named in the estimate; optional)',
        optional: true,
        range: { min: 0, max: 11000 },
      },
      {
        kind: 'number',
        name: 'planned_discharge',
        unit: 'm3/s',
        description: 'planned release through the intake, to compare with the critical discharge (optional)',
        optional: true,
        range: { ...positive, max: 1e5 },
      },
    ],
    results: [
      { name: 'critical_discharge', unit: 'm3/s', description: 'discharge at which the far layer starts to be drawn' },
      {
        name: 'discharge_ratio',
        unit: '1',
        description: 'planned discharge over the critical discharge (present when a planned discharge is given)',
      },
    ],
    run(a) {
      const r = criticalDischargeCraya1949(
        arg.num(a, 'g_prime'),
        arg.num(a, 'interface_distance'),
        arg.text<SinkKind>(a, 'sink'),
        arg.text<SinkPosition>(a, 'position'),
        arg.optNum(a, 'width'),
      );
      const planned = arg.optNum(a, 'planned_discharge');
      const portDepth = arg.optNum(a, 'port_depth');
      const warnings = [
        ...(portDepth === undefined
          ? []
          : [
              note(
                'port-used',
                `Critical discharge of the port at ${qty(portDepth, 'm')} below the surface.`,
                'port_depth',
              ),
            ]),
        ...r.warnings,
      ];
      if (planned !== undefined && planned > r.value)
        warnings.push(
          caution(
            'planned-above-critical',
            `The planned release ${qty(planned, 'm3/s')} exceeds the critical discharge ${qty(r.value, 'm3/s')} (${(planned / r.value).toPrecision(3)} times): water of the far layer is drawn into the intake.`,
            'planned_discharge',
          ),
        );
      return {
        results: {
          critical_discharge: num(r.value, 'm3/s'),
          ...(planned === undefined ? {} : { discharge_ratio: num(planned / r.value, '1') }),
        },
        warnings,
        sources: [CRAYA_1949.source],
      };
    },
  },
  {
    id: 'withdrawal-layer',
    title: 'Withdrawal-layer thickness in linear stratification',
    topic: 'withdrawal',
    params: [
      {
        kind: 'number',
        name: 'buoyancy_frequency',
        unit: '1/s',
        description: 'buoyancy frequency N around the intake',
        range: { ...positive, max: 1 },
      },
      {
        kind: 'number',
        name: 'discharge',
        unit: 'm3/s',
        description: 'intake discharge',
        range: { ...positive, max: 1e5 },
      },
      SLOT_WIDTH,
      SINK,
      {
        kind: 'number',
        name: 'port_depth',
        unit: 'm',
        description: 'depth of the port below the surface, to place the layer in the section (optional)',
        optional: true,
        range: { min: 0, max: 11000 },
      },
      {
        kind: 'number',
        name: 'reservoir_length',
        unit: 'm',
        description: 'reservoir length at the intake level, for the regime (default: inertial assumed)',
        optional: true,
        range: { ...positive, max: 1e6 },
      },
    ],
    results: [
      {
        name: 'thickness',
        unit: 'm',
        description:
          'TOTAL thickness of the withdrawal layer, 2δ: from its upper to its lower limit (before any cut by surface or bed)',
      },
      {
        name: 'half_thickness',
        unit: 'm',
        description: 'HALF-thickness δ: from the port to one limit of the layer',
      },
      {
        name: 'thickness_low',
        unit: 'm',
        description:
          'lowest total thickness of the published coefficients (inertial line sink: Yih 1958 / Kao 1970, Debler 1959, Imberger et al. 1976)',
      },
      {
        name: 'thickness_high',
        unit: 'm',
        description: 'highest total thickness of the published coefficients',
      },
      { name: 'regime', unit: '', description: 'inertial or viscous' },
    ],
    run(a) {
      const sink = arg.text<SinkKind>(a, 'sink');
      const r = withdrawalLayer({
        n: arg.num(a, 'buoyancy_frequency'),
        discharge: arg.num(a, 'discharge'),
        sink,
        width: arg.optNum(a, 'width'),
        length: arg.optNum(a, 'reservoir_length'),
      });
      const regime = r.regimeAssumed ? 'inertial (assumed: no reservoir length)' : r.regime;
      const portDepth = arg.optNum(a, 'port_depth');
      const warnings = [
        ...(portDepth === undefined
          ? []
          : [
              note(
                'port-used',
                `Withdrawal layer of the port at ${qty(portDepth, 'm')} below the surface drawing ${qty(arg.num(a, 'discharge'), 'm3/s')}.`,
                'port_depth',
              ),
            ]),
        ...r.warnings,
      ];
      let spread = { low: r.totalThickness, high: r.totalThickness };
      if (sink === 'line' && r.regime === 'inertial') {
        const half = halfThicknessSpreadLineSink(
          arg.num(a, 'discharge') / arg.num(a, 'width'),
          arg.num(a, 'buoyancy_frequency'),
        );
        spread = { low: 2 * half.low, high: 2 * half.high };
        warnings.push(
          note(
            'published-coefficient-spread',
            `The published inertial line-sink coefficients give a total thickness from ${qty(spread.low, 'm', 3)} (Yih 1958 / Kao 1970, q/(Nδ²) = 1/π) to ${qty(spread.high, 'm', 3)} (Imberger et al. 1976, reported); Debler's (1959) measurements lie between.`,
          ),
        );
      } else
        warnings.push(
          note(
            'single-published-coefficient',
            sink === 'point'
              ? 'One published point-sink coefficient is coded (Imberger & Patterson 1990): the low and high thickness equal the reported one; no spread is stated.'
              : 'One published viscous line-sink coefficient is coded (Imberger et al. 1976): the low and high thickness equal the reported one; Koh (1966) measured layers about 30 % thicker to the first zero of the velocity.',
          ),
        );
      return {
        results: {
          thickness: num(r.totalThickness, 'm'),
          half_thickness: num(r.halfThickness, 'm'),
          thickness_low: num(spread.low, 'm'),
          thickness_high: num(spread.high, 'm'),
          regime: text(regime),
        },
        // the layer drawn around the port; it cannot rise above the surface (the bed is not known here)
        ...(portDepth === undefined
          ? {}
          : {
              model: {
                kind: 'withdrawal-layer' as const,
                portDepth,
                top: Math.max(0, portDepth - r.halfThickness),
                bottom: portDepth + r.halfThickness,
              },
            }),
        warnings,
        sources: [(sink === 'line' ? WITHDRAWAL_LINE_SINK : WITHDRAWAL_POINT_SINK).source],
      };
    },
  },
  {
    id: 'release-blend',
    title: 'Port split meeting a release-temperature target on a measured profile',
    topic: 'withdrawal',
    params: [
      { kind: 'profile', name: 'file', description: 'path to a CSV profile at the intake' },
      {
        kind: 'text',
        name: 'ports',
        description: 'ports as depth:capacity pairs (m below the surface : m3/s), e.g. 5:40,30:40',
      },
      { kind: 'number', name: 'release', unit: 'm3/s', description: 'total release', range: { ...positive, max: 1e5 } },
      {
        kind: 'number',
        name: 'target_temperature',
        unit: 'degC',
        description: 'wanted release temperature',
        range: { min: -3, max: 60 },
      },
      {
        kind: 'choice',
        name: 'interference',
        description:
          'combined = open ports whose withdrawal layers overlap draw one combined withdrawal; independent = each port alone',
        choices: INTERFERENCE,
        default: 'combined',
      },
    ],
    results: [
      {
        name: 'temperature',
        unit: 'degC',
        description: 'temperature of the blended release (the closest achievable when infeasible)',
      },
      { name: 'port_flows', unit: '', description: 'flow of each port' },
      { name: 'feasible', unit: '', description: 'yes when the target is met' },
    ],
    run(a) {
      const p = arg.profile(a);
      if (!p) throw new InputError('file', '(missing)', '', 'a CSV profile', 'a profile file is required');
      const ports = parsePorts(arg.text(a, 'ports'));
      const interference = arg.text<InterferenceMode>(a, 'interference');
      const layers = new LayerMemo(p, { sink: 'point' });
      const r = optimiseRelease(
        p,
        ports,
        arg.num(a, 'release'),
        { temperature: arg.num(a, 'target_temperature') },
        { sink: 'point', interference },
        layers,
      );
      const flows = ports.map((port, i) => `${qty(port.depth, 'm')}: ${qty(r.flows[i], 'm3/s', 3)}`).join('; ');
      const warnings = [
        note(
          'ports-as-point-sinks',
          `Ports are treated as orifices (point sinks); ${interference === 'combined' ? 'ports whose withdrawal layers overlap are combined (see the sources)' : 'interference between their withdrawal layers is ignored'}.`,
          'interference',
        ),
        ...r.warnings,
      ];
      const groups = interference === 'combined' ? r.groups : [];
      return {
        results: {
          temperature: num(r.temperature, 'degC'),
          port_flows: text(flows),
          feasible: text(r.feasible ? 'yes' : 'no'),
        },
        series: releaseSeries(p, ports, r.flows, groups, layers),
        model: { kind: 'withdrawal-zones', zones: withdrawalZones(ports, r, groups) },
        warnings,
        sources: [
          RELEASE_BLEND.source,
          ...(interference === 'combined' ? [WITHDRAWAL_INTERFERENCE.source] : []),
          WITHDRAWAL_MEASURED_PROFILE.source,
          WITHDRAWAL_POINT_SINK.source,
          WITHDRAWAL_VELOCITY.source,
        ],
      };
    },
  },
];
