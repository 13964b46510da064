import { caution, type Warning } from '../core/warning';
import { describeRows } from './cells';

/**
 * Row checks of a measured profile, each reported by row (1-based data rows of the table): rows above the
 * surface, rows out of order or at a depth already sampled, spikes, and gaps in carried columns.
 */

/**
 * The order in which to keep rows: the table read top-down (reversed when it runs bottom-up), keeping only
 * rows deeper than every row kept before them. Rows above the surface (depth < 0), repeated depths and
 * rows that go back up (an up-cast, a loop of the instrument) are dropped with a warning naming them.
 * @param depth [m] of each candidate row
 * @param rowNumber 1-based table row of each candidate
 */
export function depthOrder(depth: readonly number[], rowNumber: readonly number[], warnings: Warning[]): number[] {
  const n = depth.length;
  const idx = depth.map((_, i) => i);
  const above = idx.filter((i) => depth[i] < 0);
  if (above.length)
    warnings.push(
      caution(
        'rows-above-surface',
        `Dropped ${describeRows(rowNumbers(above, rowNumber))}: above the water surface (a negative depth, e.g. the instrument in air).`,
        'file',
      ),
    );
  let candidates = idx.filter((i) => depth[i] >= 0);
  if (candidates.length > 1 && depth[candidates[0]] > depth[candidates[candidates.length - 1]])
    candidates = candidates.reverse();
  const kept: number[] = [];
  const repeated: number[] = [];
  const upward: number[] = [];
  for (const i of candidates) {
    const last = kept.length ? depth[kept[kept.length - 1]] : -Infinity;
    if (depth[i] > last) kept.push(i);
    else (depth[i] === last ? repeated : upward).push(i);
  }
  if (repeated.length)
    warnings.push(
      caution(
        'duplicate-depths',
        `Dropped ${describeRows(rowNumbers(repeated, rowNumber))}: the same depth as a row kept before (the first one is used).`,
        'file',
      ),
    );
  if (upward.length) {
    const deepest = kept[kept.length - 1];
    const tail = upward.every((i) => rowNumber[i] > rowNumber[deepest]) && n > 2;
    warnings.push(
      caution(
        'rows-out-of-order',
        `Dropped ${describeRows(rowNumbers(upward, rowNumber))}: shallower than a row above them` +
          (tail ? ` (the up-cast after the deepest sample, row ${rowNumber[deepest]})` : '; depths must increase') +
          '.',
        'file',
      ),
    );
  }
  return kept;
}

function rowNumbers(indices: readonly number[], rowNumber: readonly number[]): number[] {
  return indices.map((i) => rowNumber[i]).sort((a, b) => a - b);
}

/**
 * Spike test of the Argo quality-control manual (Wong et al., Argo Quality Control Manual for CTD and
 * Trajectory Data, test 9 — thresholds from memory): a value whose
 * |v − (v₋ + v₊)/2| − |v₊ − v₋|/2 exceeds the threshold is reported (and kept).
 */
export const SPIKE_THRESHOLDS = {
  /** [degC] above 500 m / below */
  temperature: [6, 2],
  /** [PSU] above 500 m / below */
  salinity: [0.9, 0.3],
} as const;

export function reportSpikes(
  column: keyof typeof SPIKE_THRESHOLDS,
  depth: readonly number[],
  values: readonly number[],
  rowNumber: readonly number[],
  warnings: Warning[],
): void {
  const rows: number[] = [];
  for (let i = 1; i + 1 < values.length; i++) {
    const test =
      Math.abs(values[i] - (values[i + 1] + values[i - 1]) / 2) - Math.abs(values[i + 1] - values[i - 1]) / 2;
    const [shallow, deep] = SPIKE_THRESHOLDS[column];
    if (test > (depth[i] < 500 ? shallow : deep)) rows.push(rowNumber[i]);
  }
  if (rows.length)
    warnings.push(
      caution(
        'spike',
        `Possible spike in ${column} at ${describeRows(rows)} (Argo spike test); the values are kept — check the sensor record.`,
        'file',
      ),
    );
}

/**
 * A carried column with gaps (NaN) filled by linear interpolation in depth between the nearest values
 * (the end value beyond the last one), with a warning naming the rows; undefined, with a warning, when
 * fewer than two values are left.
 */
export function fillGaps(
  name: string,
  depth: readonly number[],
  values: readonly number[],
  rowNumber: readonly number[],
  warnings: Warning[],
): number[] | undefined {
  const known = values.flatMap((v, i) => (Number.isFinite(v) ? [i] : []));
  const gaps = values.flatMap((v, i) => (Number.isFinite(v) ? [] : [rowNumber[i]]));
  if (gaps.length === 0) return [...values];
  if (known.length < 2) {
    warnings.push(
      caution('column-dropped', `Column "${name}" left out: fewer than two of its cells hold a number.`, 'file'),
    );
    return undefined;
  }
  warnings.push(
    caution(
      'cells-filled',
      `Column "${name}": ${describeRows(gaps.sort((a, b) => a - b))} blank, "NaN", flagged or not a number; filled by linear interpolation in depth between the neighbouring rows.`,
      'file',
    ),
  );
  let k = 0;
  return values.map((v, i) => {
    if (Number.isFinite(v)) return v;
    while (k + 1 < known.length && known[k + 1] < i) k++;
    const lo = known[k],
      hi = known[k + 1];
    if (i < lo || hi === undefined) return values[i < lo ? lo : known[known.length - 1]];
    const f = (depth[i] - depth[lo]) / (depth[hi] - depth[lo]);
    return values[lo] + f * (values[hi] - values[lo]);
  });
}
