import { qty } from '../core/quantity-text';
import { arg, type CalcArgs, type ParamSpec, type Series } from '../calc/types';
import { InputError } from '../core/errors';
import { positive, nonNegative } from '../core/range';
import { JET_PATH_COLUMNS, type BuoyantJetInput, type JetPath, type JetTrajectory } from './buoyant-jet';
import type { DiffuserInput } from './diffuser';
import { EXIT_VELOCITY, PORT_DIAMETER } from './closure';

/** Calc parameters and results of the buoyant-jet and diffuser-plume methods: inputs from arguments, chart curves. */

/** The model input from resolved buoyant-jet arguments (shared by the calc method and the compliance table). */
export function buoyantJetInputFromArgs(a: CalcArgs): BuoyantJetInput {
  const profile = arg.profile(a);
  const rhoA = arg.optNum(a, 'ambient_density');
  if ((profile === undefined) === (rhoA === undefined)) {
    throw new InputError(
      profile ? 'ambient_density' : 'file',
      '(missing)',
      '',
      'exactly one of ambient_density and file',
      'give either a uniform ambient_density or a profile file, not both and not neither',
    );
  }
  const input: BuoyantJetInput = {
    diameter: arg.num(a, 'diameter'),
    velocity: arg.num(a, 'velocity'),
    angle: arg.num(a, 'angle'),
    portDepth: arg.num(a, 'port_depth'),
    effluentDensity: arg.num(a, 'effluent_density'),
    ambient: profile ? { kind: 'profile', profile } : { kind: 'uniform', density: rhoA as number },
    current: arg.num(a, 'current'),
    maxPath: arg.optNum(a, 'max_path_length'),
  };
  return input;
}

/** The merged-diffuser input from resolved diffuser-plume arguments (shared by the calc method and the compliance table). */
export function diffuserInputFromArgs(a: CalcArgs): DiffuserInput {
  const ports = arg.optNum(a, 'ports'),
    length = arg.optNum(a, 'diffuser_length');
  let spacing = arg.optNum(a, 'spacing');
  if (spacing === undefined && length !== undefined) {
    if (ports === undefined || ports < 2)
      throw new InputError(
        'ports',
        ports ?? '(missing)',
        '1',
        '≥ 2 with diffuser_length',
        'the spacing follows from diffuser_length only with the number of ports (at least 2)',
      );
    spacing = length / (ports - 1);
  }
  return { ...buoyantJetInputFromArgs(a), spacing, ports, currentAngle: arg.optNum(a, 'current_angle') };
}

/** Chart curves of a trajectory: the centreline in the vertical section and dilution along the path. */
export function jetPathSeries(t: JetTrajectory): Series[] {
  const col = (k: keyof JetPath) => ({ ...JET_PATH_COLUMNS[k], values: [...(t.path[k] ?? [])] });
  return [
    {
      kind: 'plume-centreline',
      title: 'Plume centreline',
      x: col('horizontalDistance'),
      y: [col('depth')],
      depthAxis: true,
      caption: `Centreline path in the vertical section (${t.outcomeText})`,
    },
    {
      kind: 'dilution-along-path',
      title: 'Dilution along the path',
      x: col('horizontalDistance'),
      y: [col('dilutionCentreline'), col('dilutionAverage')],
      caption: 'Centreline and flux-average dilution against horizontal distance from the port',
    },
  ];
}

/** Parameters of one port and its ambient, shared by buoyant-jet and diffuser-plume. */
export const jetPortParams: ParamSpec[] = [
  { kind: 'number', name: 'diameter', unit: 'm', description: 'port diameter', range: PORT_DIAMETER },
  { kind: 'number', name: 'velocity', unit: 'm/s', description: 'exit velocity', range: EXIT_VELOCITY },
  {
    kind: 'number',
    name: 'angle',
    unit: 'deg',
    description: 'vertical angle above horizontal',
    range: { min: -90, max: 90 },
  },
  {
    kind: 'number',
    name: 'port_depth',
    unit: 'm',
    description: 'port depth below the surface',
    range: { ...positive, max: 11000 },
  },
  {
    kind: 'number',
    name: 'effluent_density',
    unit: 'kg/m3',
    description: 'effluent density',
    range: { min: 900, max: 1300 },
  },
  {
    kind: 'number',
    name: 'ambient_density',
    unit: 'kg/m3',
    description: 'uniform ambient density (or give file)',
    optional: true,
    range: { min: 900, max: 1300 },
  },
  {
    kind: 'profile',
    name: 'file',
    description: 'CSV profile of the ambient (or give ambient_density); its deepest sample is taken as the bed',
    optional: true,
  },
  {
    kind: 'number',
    name: 'current',
    unit: 'm/s',
    description:
      'current speed (buoyant-jet: at current_angle to the jet, by default with it, the cautious case; diffuser-plume: with each port)',
    default: 0,
    range: { ...nonNegative, max: 10 },
  },
  {
    kind: 'number',
    name: 'max_path_length',
    unit: 'm',
    description: `longest centreline path followed (default ${qty(10000, 'm')}, or 100 diameters or 50 port depths when longer)`,
    optional: true,
    range: { ...positive, max: 1e6 },
  },
];
