import { qty } from '../core/quantity-text';
import { InputError } from '../core/errors';
import { LIMITS } from '../core/limits';
import { uniqueWarnings, type Warning } from '../core/warning';
import { waterDensity, type EquationOfState, defaultEos } from '../water/density';

/** An extra constituent column (e.g. dissolved oxygen) carried through in its own unit. */
export interface ProfileColumn {
  name: string;
  unit: string;
  values: number[];
}

/** A text column carried along row by row (date, time, station, flags…). */
export interface ProfileLabelColumn {
  name: string;
  values: string[];
}

/**
 * A measured ambient profile. Depth is positive down from the water surface, strictly increasing.
 * Density is the potential density referenced to the surface (p = 0), so that compressibility does not
 * appear as stratification. Profiles are values: they are replaced whole, never mutated.
 */
export interface Profile {
  readonly depth: readonly number[];
  readonly temperature: readonly number[];
  readonly salinity: readonly number[];
  readonly sediment: readonly number[];
  readonly extra: readonly ProfileColumn[];
  /** text columns (date, time, station…), one value per row */
  readonly labels: readonly ProfileLabelColumn[];
  readonly eos: EquationOfState;
  readonly density: readonly number[];
  readonly warnings: readonly Warning[];
}

export interface ProfileInput {
  depth: number[];
  temperature: number[];
  salinity?: number[];
  sediment?: number[];
  extra?: ProfileColumn[];
  labels?: ProfileLabelColumn[];
  eos?: EquationOfState;
  /** warnings from reading the profile (skipped rows, conversions), kept with it */
  warnings?: Warning[];
}

/** One problem found in a profile, with the 1-based data row and the column name. */
export interface ProfileIssue {
  row: number;
  column: string;
  message: string;
}

/** One issue in words: "row 4, column "temperature": …", "the header: …" (never a bracketed placeholder). */
function issueText(i: ProfileIssue): string {
  if (i.column === '(header)') return `the header: ${i.message}`;
  if (i.column === '(row)') return `row ${i.row}: ${i.message}`;
  return i.row > 0 ? `row ${i.row}, column "${i.column}": ${i.message}` : `column "${i.column}": ${i.message}`;
}

export class ProfileError extends Error {
  readonly issues: ProfileIssue[];
  constructor(issues: ProfileIssue[]) {
    super(issues.map(issueText).join('\n'));
    this.name = 'ProfileError';
    this.issues = issues;
  }
}

const COLUMN_RANGES = {
  depth: { min: 0, max: 11000, unit: 'm' },
  temperature: { min: -2.5, max: 60, unit: 'degC' },
  salinity: { min: 0, max: 70, unit: 'PSU' },
  sediment: { min: 0, max: 500, unit: 'kg/m3' },
} as const;

function checkColumn(
  name: keyof typeof COLUMN_RANGES,
  values: readonly number[],
  n: number,
  issues: ProfileIssue[],
): void {
  if (values.length !== n) {
    issues.push({ row: 0, column: name, message: `has ${values.length} values but depth has ${n}` });
    return;
  }
  const { min, max, unit } = COLUMN_RANGES[name];
  values.forEach((v, i) => {
    if (!Number.isFinite(v)) issues.push({ row: i + 1, column: name, message: 'value is missing or not a number' });
    else if (v < min || v > max)
      issues.push({
        row: i + 1,
        column: name,
        message: `${qty(v, unit, 6)} is physically impossible here (allowed ${qty(min, unit)} … ${qty(max, unit)})`,
      });
  });
}

/** Throws a ProfileError when a profile has more rows than LIMITS.profileRows. */
export function requireProfileRows(rows: number): void {
  if (rows > LIMITS.profileRows)
    throw new ProfileError([
      {
        row: 0,
        column: '(file)',
        message: `has ${rows} data rows, more than the ${LIMITS.profileRows} rows one profile may have`,
      },
    ]);
}

/** Validates a profile and computes its density; throws a ProfileError listing every problem. */
export function makeProfile(input: ProfileInput): Profile {
  const n = input.depth.length;
  requireProfileRows(n);
  const issues: ProfileIssue[] = [];
  if (n < 2) issues.push({ row: 0, column: 'depth', message: `a profile needs at least 2 rows, got ${n}` });
  const salinity = input.salinity ?? new Array<number>(n).fill(0);
  const sediment = input.sediment ?? new Array<number>(n).fill(0);
  checkColumn('depth', input.depth, n, issues);
  checkColumn('temperature', input.temperature, n, issues);
  checkColumn('salinity', salinity, n, issues);
  checkColumn('sediment', sediment, n, issues);
  for (let i = 1; i < n; i++) {
    const a = input.depth[i - 1],
      b = input.depth[i];
    if (a === b)
      issues.push({ row: i + 1, column: 'depth', message: `duplicate depth ${qty(b, 'm', 6)} (same as row ${i})` });
    else if (b < a)
      issues.push({
        row: i + 1,
        column: 'depth',
        message: `depth ${qty(b, 'm', 6)} is shallower than the row above (${qty(a, 'm', 6)}); depths must increase`,
      });
  }
  for (const col of input.extra ?? []) {
    if (col.values.length !== n)
      issues.push({ row: 0, column: col.name, message: `has ${col.values.length} values but depth has ${n}` });
    col.values.forEach((v, i) => {
      if (!Number.isFinite(v))
        issues.push({ row: i + 1, column: col.name, message: 'value is missing or not a number' });
    });
  }
  if (issues.length) throw new ProfileError(issues);
  const hasSalt = salinity.some((s) => s > 0);
  const eos = input.eos ?? defaultEos(hasSalt ? 1 : 0);
  if (eos === 'fresh' && hasSalt) {
    throw new InputError(
      'eos',
      eos,
      '',
      'eos80 or teos10 for a salty profile',
      'the profile has salinity above 0; choose eos80 or teos10',
    );
  }
  for (const col of input.labels ?? [])
    if (col.values.length !== n)
      issues.push({ row: 0, column: col.name, message: `has ${col.values.length} values but depth has ${n}` });
  if (issues.length) throw new ProfileError(issues);
  const warnings: Warning[] = [...(input.warnings ?? [])];
  const density = input.depth.map((_, i) => {
    const r = waterDensity({ temperature: input.temperature[i], salinity: salinity[i], sediment: sediment[i], eos });
    for (const w of r.warnings) warnings.push(w);
    return r.value;
  });
  return {
    depth: [...input.depth],
    temperature: [...input.temperature],
    salinity: [...salinity],
    sediment: [...sediment],
    extra: (input.extra ?? []).map((c) => ({ ...c, values: [...c.values] })),
    labels: (input.labels ?? []).map((c) => ({ ...c, values: [...c.values] })),
    eos,
    density,
    warnings: uniqueWarnings(warnings),
  };
}

/** Linear interpolation of a column at depth d; clamps to the end values outside the measured range. */
export function interpolateAt(depths: readonly number[], values: readonly number[], d: number): number {
  const n = depths.length;
  if (d <= depths[0]) return values[0];
  if (d >= depths[n - 1]) return values[n - 1];
  let lo = 0,
    hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (depths[mid] <= d) lo = mid;
    else hi = mid;
  }
  const f = (d - depths[lo]) / (depths[hi] - depths[lo]);
  return values[lo] + f * (values[hi] - values[lo]);
}

/**
 * A column linearly interpolated at increasing depths `at` (clamped like interpolateAt), in one walk down
 * the column: O(n + m) instead of a search per depth.
 */
export function interpolateSorted(
  depths: readonly number[],
  values: readonly number[],
  at: readonly number[],
): number[] {
  const n = depths.length;
  let lo = 0;
  return at.map((d) => {
    if (d <= depths[0]) return values[0];
    if (d >= depths[n - 1]) return values[n - 1];
    while (depths[lo + 1] <= d) lo++;
    const f = (d - depths[lo]) / (depths[lo + 1] - depths[lo]);
    return values[lo] + f * (values[lo + 1] - values[lo]);
  });
}

/** Every column of a profile by name (temperature, salinity, sediment, density and the extras). */
export function profileColumns(p: Profile): ProfileColumn[] {
  return [
    { name: 'temperature', unit: 'degC', values: [...p.temperature] },
    { name: 'salinity', unit: 'PSU', values: [...p.salinity] },
    { name: 'sediment', unit: 'kg/m3', values: [...p.sediment] },
    { name: 'density', unit: 'kg/m3', values: [...p.density] },
    ...p.extra.map((c) => ({ ...c, values: [...c.values] })),
  ];
}

/** The largest finite value, −∞ if none (a loop: spreading a long array into Math.max overflows the stack). */
export function largestFinite(values: readonly number[]): number {
  let best = -Infinity;
  for (const v of values) if (Number.isFinite(v) && v > best) best = v;
  return best;
}

/** Water-column depth covered by the profile: the deepest sample [m]. */
export function profileBottom(p: Profile): number {
  return p.depth[p.depth.length - 1];
}
