import { InputError } from '../core/errors';
import { requireInRange, positive } from '../core/range';
import { interpolateAt, type Profile } from '../profile/profile';

/** Ambient water around a discharge: uniform or a measured profile, with a uniform or depth-varying current. */
export type AmbientWater =
  | { kind: 'uniform'; density: number; temperature?: number; waterDepth?: number }
  | { kind: 'profile'; profile: Profile }
  /** measured density [kg/m3] (and optionally temperature [degC]) by depth [m], linear between rows */
  | { kind: 'table'; depth: readonly number[]; density: readonly number[]; temperature?: readonly number[] };

/** Current speed along +x: one value [m/s] or a table of depths [m] and speeds [m/s] (linear between). */
export type Current = number | { depths: readonly number[]; speeds: readonly number[] };

/** The ambient seen by the jet, as functions of depth d [m] (positive down). */
export interface AmbientFunctions {
  density(d: number): number;
  /** undefined when the ambient temperature is not known */
  temperature?(d: number): number;
  current(d: number): number;
  /** water depth where the surface is reached is 0; the bed depth when known [m] */
  bedDepth?: number;
  warnings: string[];
}

function currentFunction(c: Current): (d: number) => number {
  if (typeof c === 'number') {
    const u = requireInRange('current', c, 'm/s', { min: 0, max: 10 });
    return () => u;
  }
  if (c.depths.length < 1 || c.depths.length !== c.speeds.length) {
    throw new InputError(
      'current',
      c.depths.length,
      '',
      'equal numbers of depths and speeds',
      'the current table needs depths and speeds of the same length',
    );
  }
  c.depths.forEach((d, i) => {
    requireInRange(`current depth ${i + 1}`, d, 'm', { min: 0, max: 11000 });
    requireInRange(`current speed ${i + 1}`, c.speeds[i], 'm/s', { min: 0, max: 10 });
    if (i > 0 && d <= c.depths[i - 1])
      throw new InputError(
        `current depth ${i + 1}`,
        d,
        'm',
        'strictly increasing depths',
        'current depths must increase',
      );
  });
  const depths = [...c.depths],
    speeds = [...c.speeds];
  return depths.length === 1 ? () => speeds[0] : (d) => interpolateAt(depths, speeds, d);
}

/** Builds depth functions of the ambient; a profile is extrapolated with its end values. */
export function ambientFunctions(a: AmbientWater, current: Current = 0, bedDepth?: number): AmbientFunctions {
  const warnings: string[] = [];
  const u = currentFunction(current);
  if (a.kind === 'uniform') {
    const rho = requireInRange('ambient_density', a.density, 'kg/m3', { min: 900, max: 1300 });
    const t =
      a.temperature === undefined
        ? undefined
        : requireInRange('ambient_temperature', a.temperature, 'degC', { min: -3, max: 60 });
    return {
      density: () => rho,
      temperature: t === undefined ? undefined : () => t,
      current: u,
      bedDepth: bedDepth ?? a.waterDepth,
      warnings,
    };
  }
  if (a.kind === 'table') return tableFunctions(a, u, bedDepth, warnings);
  const p = a.profile;
  warnings.push(...p.warnings);
  const density = (d: number) => interpolateAt(p.depth, p.density, d);
  const temperature = (d: number) => interpolateAt(p.depth, p.temperature, d);
  const bed = bedDepth ?? p.depth[p.depth.length - 1];
  if (bedDepth !== undefined) requireInRange('bed_depth', bedDepth, 'm', positive);
  return { density, temperature, current: u, bedDepth: bed, warnings };
}

function tableFunctions(
  a: Extract<AmbientWater, { kind: 'table' }>,
  u: (d: number) => number,
  bedDepth: number | undefined,
  warnings: string[],
): AmbientFunctions {
  const n = a.depth.length;
  if (n < 2 || a.density.length !== n || (a.temperature && a.temperature.length !== n)) {
    throw new InputError(
      'ambient table',
      n,
      '',
      'at least 2 rows, equal column lengths',
      'the ambient table needs at least 2 rows and columns of equal length',
    );
  }
  a.depth.forEach((d, i) => {
    requireInRange(`ambient depth ${i + 1}`, d, 'm', { min: 0, max: 11000 });
    requireInRange(`ambient density ${i + 1}`, a.density[i], 'kg/m3', { min: 900, max: 1300 });
    if (a.temperature) requireInRange(`ambient temperature ${i + 1}`, a.temperature[i], 'degC', { min: -3, max: 60 });
    if (i > 0 && d <= a.depth[i - 1])
      throw new InputError(`ambient depth ${i + 1}`, d, 'm', 'strictly increasing depths', 'depths must increase');
  });
  const depth = [...a.depth],
    rho = [...a.density],
    temp = a.temperature ? [...a.temperature] : undefined;
  return {
    density: (d) => interpolateAt(depth, rho, d),
    temperature: temp ? (d) => interpolateAt(depth, temp, d) : undefined,
    current: u,
    bedDepth: bedDepth ?? depth[n - 1],
    warnings,
  };
}
