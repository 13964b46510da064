import { num, text } from '../calc/resolve';
import { arg, type CalcMethod, type Series } from '../calc/types';
import { sampleFront, type FrontSeries } from './front-pieces';
import { positive } from '../core/range';
import { GRAVITY } from '../quantities';
import { kinematicViscosityWater } from '../water/transport';
import { BENJAMIN_1968, HUPPERT_SIMPSON_1980_FRONT, VON_KARMAN_1940, frontSpeedBenjamin1968, frontSpeedHuppertSimpson1980, frontSpeedVonKarman1940, type FrontSpeed } from './front-speed';
import { HUPPERT_1982, type SpreadingGeometry } from './viscous';
import { LOCK_RELEASE_HS1980, lockReleaseFrontAt, lockReleaseHuppertSimpson1980 } from './release';

const G_PRIME = { kind: 'number', name: 'g_prime', unit: 'm/s2', description: 'reduced gravity g′ (ambient density as reference)', range: { ...positive, max: GRAVITY } } as const;
const NU_20C = kinematicViscosityWater(20).value;

type FrontModel = 'benjamin' | 'huppert-simpson' | 'von-karman';

/** The gravity-currents methods of `gprime calc`. */
export const gravityCurrentCalcMethods: CalcMethod[] = [
  {
    id: 'front-speed',
    title: 'Steady front speed of a gravity current',
    topic: 'gravity-currents',
    params: [
      G_PRIME,
      { kind: 'number', name: 'current_depth', unit: 'm', description: 'depth h of the current behind its head', range: { ...positive, max: 1e4 } },
      { kind: 'number', name: 'total_depth', unit: 'm', description: 'total depth H of the channel (omit for a deep ambient)', optional: true, range: { ...positive, max: 1e4 } },
      { kind: 'choice', name: 'model', description: 'front condition', choices: ['benjamin', 'huppert-simpson', 'von-karman'], default: 'benjamin' },
    ],
    results: [
      { name: 'speed', unit: 'm/s', description: 'front speed U' },
      { name: 'froude', unit: '1', description: 'U/√(g′h), h the current depth' },
    ],
    run(a) {
      const g = arg.num(a, 'g_prime'), h = arg.num(a, 'current_depth'), H = arg.optNum(a, 'total_depth');
      const model = arg.text<FrontModel>(a, 'model');
      let r: FrontSpeed, source: string;
      if (model === 'von-karman') {
        r = frontSpeedVonKarman1940(g, h); source = VON_KARMAN_1940.source;
        if (H !== undefined) r.warnings.push('total_depth is ignored by the deep-ambient von Kármán speed.');
      } else if (model === 'huppert-simpson') {
        r = frontSpeedHuppertSimpson1980(g, h, H); source = HUPPERT_SIMPSON_1980_FRONT.source;
      } else {
        r = frontSpeedBenjamin1968(g, h, H); source = BENJAMIN_1968.source;
      }
      return { results: { speed: num(r.value, 'm/s'), froude: num(r.froude, '1') }, warnings: r.warnings, sources: [source] };
    },
  },
  {
    id: 'lock-release',
    title: 'Front of a lock release at a given time (slumping, inertial, viscous)',
    topic: 'gravity-currents',
    params: [
      G_PRIME,
      { kind: 'number', name: 'lock_length', unit: 'm', description: 'lock length (planar) or lock radius (axisymmetric)', range: { ...positive, max: 1e5 } },
      { kind: 'number', name: 'lock_depth', unit: 'm', description: 'depth of the released fluid', range: { ...positive, max: 1e4 } },
      { kind: 'number', name: 'total_depth', unit: 'm', description: 'ambient depth (≥ lock_depth; omit for a full-depth lock)', optional: true, range: { ...positive, max: 1e4 } },
      { kind: 'number', name: 'time', unit: 's', description: 'time since release', range: { min: 0, max: 1e9 } },
      { kind: 'choice', name: 'geometry', description: 'planar (channel) or axisymmetric (radial) spreading', choices: ['planar', 'axisymmetric'], default: 'planar' },
      { kind: 'number', name: 'kinematic_viscosity', unit: 'm2/s', description: 'kinematic viscosity of the current (default: water at 20 °C)', default: NU_20C, range: { ...positive, max: 1 } },
    ],
    results: [
      { name: 'front_position', unit: 'm', description: 'front distance from the back wall of the lock (from the centre when axisymmetric)' },
      { name: 'front_speed', unit: 'm/s', description: 'front speed' },
      { name: 'phase', unit: '', description: 'slumping, inertial or viscous' },
    ],
    run(a) {
      const lockDepth = arg.num(a, 'lock_depth');
      const model = lockReleaseHuppertSimpson1980({
        gPrime: arg.num(a, 'g_prime'), lockLength: arg.num(a, 'lock_length'), lockDepth,
        totalDepth: arg.optNum(a, 'total_depth') ?? lockDepth,
        geometry: arg.text<SpreadingGeometry>(a, 'geometry'), kinematicViscosity: arg.num(a, 'kinematic_viscosity'),
      });
      const time = arg.num(a, 'time');
      const s = lockReleaseFrontAt(model, time);
      return {
        results: { front_position: num(s.position, 'm'), front_speed: num(s.speed, 'm/s'), phase: text(s.phase) },
        series: frontSeriesCharts(sampleFront(model.pieces, Array.from({ length: 121 }, (_, i) => (time * 2 * i) / 120 || 0), [], [])),
        warnings: model.warnings,
        sources: [LOCK_RELEASE_HS1980.source, HUPPERT_1982.source],
      };
    },
  },
];

/** Chart curves of a release: front position and front speed against time. */
export function frontSeriesCharts(f: FrontSeries): Series[] {
  const time = { label: 'Time since release', unit: 's', values: [...f.time] };
  const phases = f.transitions.map((t) => `${t.phase} from ${Math.round(t.time)} s`).join(', ');
  return [
    { title: 'Front position', x: time, y: [{ label: 'Front position', unit: 'm', values: [...f.position] }], caption: `Front distance from the back wall against time${phases ? ` (${phases})` : ''}` },
    { title: 'Front speed', x: time, y: [{ label: 'Front speed', unit: 'm/s', values: [...f.speed] }], caption: 'Front speed against time' },
  ];
}
