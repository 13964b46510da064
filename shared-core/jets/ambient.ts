import { InputError } from '../core/errors';
import { requireInRange, positive } from '../core/range';
import type { Warning } from '../core/warning';
import type { Profile } from '../profile/profile';

/** Ambient water around a discharge: uniform or a measured profile, with a uniform or depth-varying current. */
export type AmbientWater =
  | { kind: 'uniform'; density: number; temperature?: number; waterDepth?: number }
  | { kind: 'profile'; profile: Profile }
  /** measured density [kg/m3] (and optionally temperature [degC]) by depth [m], linear between rows */
  | { kind: 'table'; depth: readonly number[]; density: readonly number[]; temperature?: readonly number[] };

/** Current speed along +x: one value [m/s] or a table of depths [m] and speeds [m/s] (linear between). */
export type Current = number | { depths: readonly number[]; speeds: readonly number[] };

/**
 * The ambient seen by the jet as plain tables by depth d [m] (positive down), linear between rows and constant
 * beyond the ends (interpolateAt); a uniform value is a table of one row.
 */
export interface AmbientTables {
  depth: readonly number[];
  density: readonly number[];
  /** absent when the ambient temperature is not known */
  temperature?: readonly number[];
  currentDepth: readonly number[];
  currentSpeed: readonly number[];
  /** the bed depth when known [m] */
  bedDepth?: number;
  warnings: Warning[];
}

function currentTable(c: Current): { currentDepth: readonly number[]; currentSpeed: readonly number[] } {
  if (typeof c === 'number')
    return { currentDepth: [0], currentSpeed: [requireInRange('current', c, 'm/s', { min: 0, max: 10 })] };
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
  return { currentDepth: [...c.depths], currentSpeed: [...c.speeds] };
}

/** Builds the depth tables of the ambient; a profile is extrapolated with its end values. */
export function ambientTables(a: AmbientWater, current: Current = 0, bedDepth?: number): AmbientTables {
  const warnings: Warning[] = [];
  const u = currentTable(current);
  if (a.kind === 'uniform') {
    const rho = requireInRange('ambient_density', a.density, 'kg/m3', { min: 900, max: 1300 });
    const t =
      a.temperature === undefined
        ? undefined
        : requireInRange('ambient_temperature', a.temperature, 'degC', { min: -3, max: 60 });
    return {
      depth: [0],
      density: [rho],
      ...(t === undefined ? {} : { temperature: [t] }),
      ...u,
      bedDepth: bedDepth ?? a.waterDepth,
      warnings,
    };
  }
  if (a.kind === 'table') return tableOf(a, u, bedDepth, warnings);
  const p = a.profile;
  warnings.push(...p.warnings);
  const bed = bedDepth ?? p.depth[p.depth.length - 1];
  if (bedDepth !== undefined) requireInRange('bed_depth', bedDepth, 'm', positive);
  return { depth: p.depth, density: p.density, temperature: p.temperature, ...u, bedDepth: bed, warnings };
}

function tableOf(
  a: Extract<AmbientWater, { kind: 'table' }>,
  u: { currentDepth: readonly number[]; currentSpeed: readonly number[] },
  bedDepth: number | undefined,
  warnings: Warning[],
): AmbientTables {
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
  return {
    depth: [...a.depth],
    density: [...a.density],
    ...(a.temperature ? { temperature: [...a.temperature] } : {}),
    ...u,
    bedDepth: bedDepth ?? a.depth[n - 1],
    warnings,
  };
}
