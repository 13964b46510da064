import { num, text } from '../calc/resolve';
import { arg, type CalcMethod, type Series } from '../calc/types';
import { arrivalTime, frontAt, sampleFront, type FrontPiece, type FrontSeries } from './front-pieces';
import {
  BRITTER_LINDEN_1980,
  CONSTANT_FLUX_RELEASE,
  constantFluxRelease,
  frontSpeedSlopeBritterLinden1980,
} from './flux';
import { positive } from '../core/range';
import { GRAVITY } from '../quantities';
import { kinematicViscosityWater } from '../water/transport';
import {
  BENJAMIN_1968,
  HUPPERT_SIMPSON_1980_FRONT,
  SHIN_2004,
  VON_KARMAN_1940,
  frontSpeedBenjamin1968,
  frontSpeedHuppertSimpson1980,
  frontSpeedShinDalzielLinden2004,
  frontSpeedVonKarman1940,
  type FrontSpeed,
} from './front-speed';
import { HUPPERT_1982, type SpreadingGeometry } from './viscous';
import { LOCK_RELEASE_HS1980, lockReleaseHuppertSimpson1980 } from './release';
import { formatNumber, InputError } from '../core/errors';
import { note, type Warning } from '../core/warning';
import { qty } from '../core/quantity-text';

const G_PRIME = {
  kind: 'number',
  name: 'g_prime',
  unit: 'm/s2',
  description: 'reduced gravity g′ (ambient density as reference)',
  range: { ...positive, max: GRAVITY },
} as const;
const NU_20C = kinematicViscosityWater(20).value;
const GEOMETRY = {
  kind: 'choice',
  name: 'geometry',
  description: 'planar (channel) or axisymmetric (radial) spreading',
  choices: ['planar', 'axisymmetric'],
  default: 'planar',
} as const;
const VISCOSITY = {
  kind: 'number',
  name: 'kinematic_viscosity',
  unit: 'm2/s',
  description: 'kinematic viscosity of the current (default: fresh water at room temperature)',
  default: NU_20C,
  range: { ...positive, max: 1 },
} as const;
const ARRIVAL = {
  kind: 'number',
  name: 'arrival_distance',
  unit: 'm',
  description:
    'a point of interest: the arrival time of the front there is reported (measured like the front position)',
  optional: true,
  range: { ...positive, max: 1e7 },
} as const;
/** The results of a release: front position, speed and phase at the time, and the arrival time at a point. */
const frontResults = (position: string, phase: string) => [
  { name: 'front_position', unit: 'm', description: position },
  { name: 'front_speed', unit: 'm/s', description: 'front speed' },
  { name: 'phase', unit: '', description: phase },
  {
    name: 'arrival_time',
    unit: 's',
    description: 'time the front reaches arrival_distance (0 when the point lies inside the release)',
  },
];

/** Front state at `time`, its arrival time at the optional point, and the position/speed charts over 0…2·time. */
function frontReport(
  pieces: readonly FrontPiece[],
  time: number,
  arrival: number | undefined,
  warnings: Warning[],
  sources: string[],
) {
  const s = frontAt(pieces, time);
  const results: Record<string, ReturnType<typeof num> | ReturnType<typeof text>> = {
    front_position: num(s.position, 'm'),
    front_speed: num(s.speed, 'm/s'),
    phase: text(s.phase),
  };
  if (arrival !== undefined) results.arrival_time = num(arrivalTime(pieces, arrival), 's');
  const horizon = Math.max(2 * time, arrival !== undefined ? 1.2 * arrivalTime(pieces, arrival) : 0);
  // a point source has no front at t = 0 (its speed is unbounded there): its curves start one step later
  const skip = pieces[0].xStart === 0 && pieces[0].m > 0 ? 1 : 0;
  return {
    results,
    series: frontSeriesCharts(
      sampleFront(
        pieces,
        Array.from({ length: 121 - skip }, (_, i) => (horizon * (i + skip)) / 120),
        [],
        [],
      ),
    ),
    warnings,
    sources,
  };
}

type FrontModel = 'benjamin' | 'huppert-simpson' | 'shin-dalziel-linden' | 'von-karman';

/** The gravity-currents methods of `gprime calc`. */
export const gravityCurrentCalcMethods: CalcMethod[] = [
  {
    id: 'front-speed',
    title: 'Steady front speed of a gravity current',
    topic: 'gravity-currents',
    params: [
      G_PRIME,
      {
        kind: 'number',
        name: 'current_depth',
        unit: 'm',
        description: 'depth h of the current behind its head',
        range: { ...positive, max: 1e4 },
      },
      {
        kind: 'number',
        name: 'total_depth',
        unit: 'm',
        description: 'total depth H of the channel (omit for a deep ambient)',
        optional: true,
        range: { ...positive, max: 1e4 },
      },
      {
        kind: 'choice',
        name: 'model',
        description:
          'front condition (shin-dalziel-linden: the slumping current of a lock twice as deep as the current, Shin et al. 2004)',
        choices: ['benjamin', 'huppert-simpson', 'shin-dalziel-linden', 'von-karman'],
        default: 'benjamin',
      },
    ],
    results: [
      { name: 'speed', unit: 'm/s', description: 'front speed U' },
      { name: 'froude', unit: '1', description: 'U/√(g′h), h the current depth' },
    ],
    run(a) {
      const g = arg.num(a, 'g_prime'),
        h = arg.num(a, 'current_depth'),
        H = arg.optNum(a, 'total_depth');
      const model = arg.text<FrontModel>(a, 'model');
      let r: FrontSpeed, source: string;
      if (model === 'von-karman') {
        r = frontSpeedVonKarman1940(g, h);
        source = VON_KARMAN_1940.source;
        if (H !== undefined)
          r.warnings.push(
            note('input-ignored', 'total_depth is ignored by the deep-ambient von Kármán speed.', 'total_depth'),
          );
      } else if (model === 'shin-dalziel-linden') {
        // Shin, Dalziel & Linden (2004): the slumping current is half the lock depth deep, so D = 2h
        if (H !== undefined && 2 * h > H)
          throw new InputError(
            'current_depth',
            h,
            'm',
            `≤ ${qty(H / 2, 'm')}`,
            `the lock that makes a current ${qty(h, 'm')} deep is ${qty(2 * h, 'm')} deep, more than total_depth = ${qty(H, 'm')} (Shin et al. 2004: the current is half the lock depth)`,
          );
        r = frontSpeedShinDalzielLinden2004(g, 2 * h, H);
        source = SHIN_2004.source;
        r.warnings.push(
          note(
            'lock-depth-from-current',
            `Shin et al. (2004) describe the slumping current of a lock ${qty(2 * h, 'm')} deep (twice the current depth) released into the channel.`,
          ),
        );
      } else if (model === 'huppert-simpson') {
        r = frontSpeedHuppertSimpson1980(g, h, H);
        source = HUPPERT_SIMPSON_1980_FRONT.source;
      } else {
        r = frontSpeedBenjamin1968(g, h, H);
        source = BENJAMIN_1968.source;
      }
      return {
        results: { speed: num(r.value, 'm/s'), froude: num(r.froude, '1') },
        warnings: r.warnings,
        sources: [source],
      };
    },
  },
  {
    id: 'lock-release',
    title: 'Front of a lock release at a given time (slumping, inertial, viscous)',
    topic: 'gravity-currents',
    params: [
      G_PRIME,
      {
        kind: 'number',
        name: 'lock_length',
        unit: 'm',
        description: 'lock length (planar) or lock radius (axisymmetric)',
        range: { ...positive, max: 1e5 },
      },
      {
        kind: 'number',
        name: 'lock_depth',
        unit: 'm',
        description: 'depth of the released fluid',
        range: { ...positive, max: 1e4 },
      },
      {
        kind: 'number',
        name: 'total_depth',
        unit: 'm',
        description: 'ambient depth (≥ lock_depth; omit for a full-depth lock)',
        optional: true,
        range: { ...positive, max: 1e4 },
      },
      { kind: 'number', name: 'time', unit: 's', description: 'time since release', range: { min: 0, max: 1e9 } },
      GEOMETRY,
      VISCOSITY,
      ARRIVAL,
    ],
    results: frontResults(
      'front distance from the back wall of the lock (from the centre when axisymmetric)',
      'slumping, inertial or viscous',
    ),
    run(a) {
      const lockDepth = arg.num(a, 'lock_depth');
      const model = lockReleaseHuppertSimpson1980({
        gPrime: arg.num(a, 'g_prime'),
        lockLength: arg.num(a, 'lock_length'),
        lockDepth,
        totalDepth: arg.optNum(a, 'total_depth') ?? lockDepth,
        geometry: arg.text<SpreadingGeometry>(a, 'geometry'),
        kinematicViscosity: arg.num(a, 'kinematic_viscosity'),
      });
      return frontReport(model.pieces, arg.num(a, 'time'), arg.optNum(a, 'arrival_distance'), model.warnings, [
        LOCK_RELEASE_HS1980.source,
        HUPPERT_1982.source,
      ]);
    },
  },
  {
    id: 'flux-release',
    title: 'Front of a constant-flux release (a steady spill or inflow): horizontal floor or slope',
    topic: 'gravity-currents',
    params: [
      G_PRIME,
      {
        kind: 'number',
        name: 'flux',
        unit: 'm2/s',
        description: 'inflow per unit width (planar) or, for axisymmetric spreading, the inflow in m³/s',
        range: { ...positive, max: 1e6 },
      },
      {
        kind: 'number',
        name: 'time',
        unit: 's',
        description: 'time since the release began',
        range: { min: 0, max: 1e9 },
      },
      GEOMETRY,
      {
        kind: 'number',
        name: 'slope',
        unit: 'deg',
        description: 'bed slope down which the current runs (omit or 0 for a horizontal floor; planar only)',
        default: 0,
        range: { min: 0, max: 90 },
      },
      VISCOSITY,
      ARRIVAL,
    ],
    results: frontResults(
      'front distance from the source',
      'inertial or viscous on a horizontal floor; steady on a slope',
    ),
    run(a) {
      const [g, flux, slope] = [arg.num(a, 'g_prime'), arg.num(a, 'flux'), arg.num(a, 'slope')];
      const geometry = arg.text<SpreadingGeometry>(a, 'geometry');
      if (slope > 0) {
        if (geometry !== 'planar')
          throw new InputError(
            'geometry',
            geometry,
            '',
            'planar',
            'the slope current (Britter & Linden 1980) is a line-source current: use geometry=planar',
          );
        const u = frontSpeedSlopeBritterLinden1980(g, flux, slope);
        const warnings = [
          ...u.warnings,
          note('laboratory-scatter', `Laboratory scatter: ${formatNumber(u.low)} … ${formatNumber(u.high)} m/s.`),
        ];
        return frontReport(
          [{ phase: 'steady', tStart: 0, xStart: 0, c: u.value, m: 0 }],
          arg.num(a, 'time'),
          arg.optNum(a, 'arrival_distance'),
          warnings,
          [BRITTER_LINDEN_1980.source],
        );
      }
      const r = constantFluxRelease({
        gPrime: g,
        flux,
        geometry,
        kinematicViscosity: arg.num(a, 'kinematic_viscosity'),
      });
      return frontReport(r.pieces, arg.num(a, 'time'), arg.optNum(a, 'arrival_distance'), r.warnings, [
        CONSTANT_FLUX_RELEASE.source,
      ]);
    },
  },
];

/** Chart curves of a release: front position and front speed against time. */
export function frontSeriesCharts(f: FrontSeries): Series[] {
  const time = { label: 'Time since release', unit: 's', values: [...f.time] };
  const phases = f.transitions.map((t) => `${t.phase} from ${Math.round(t.time)} s`).join(', ');
  return [
    {
      kind: 'front-position',
      title: 'Front position',
      x: time,
      y: [{ label: 'Front position', unit: 'm', values: [...f.position] }],
      caption: `Front distance from the back wall against time${phases ? ` (${phases})` : ''}`,
    },
    {
      kind: 'front-speed',
      title: 'Front speed',
      x: time,
      y: [{ label: 'Front speed', unit: 'm/s', values: [...f.speed] }],
      caption: 'Front speed against time',
    },
  ];
}
