/**
 * Linear interpolation in a depth-sorted table at depths that move a little between calls (a grid walked
 * down, a root search inside one bracket): the cursor steps from the last segment, so a sweep over q depths
 * costs O(rows + q) instead of O(q log rows). Gives exactly what interpolateAt() gives (same segment, same
 * formula); constant beyond the first and last samples.
 */
export class DepthCursor {
  private lo = 0;
  private f = 0;
  private readonly n: number;

  constructor(private readonly depths: readonly number[]) {
    this.n = depths.length;
  }

  /** Moves to depth d [m]; value() then reads any column of the table there. */
  seek(d: number): this {
    const x = this.depths,
      n = this.n;
    if (n < 2 || d <= x[0]) return this.at(0, 0);
    if (d >= x[n - 1]) return this.at(n - 2, 1);
    let lo = this.lo;
    for (let step = 0; step < 8 && (x[lo] > d || x[lo + 1] <= d); step++) lo += x[lo] > d ? -1 : 1;
    if (x[lo] > d || x[lo + 1] <= d) lo = firstIndex(x, (v) => v > d) - 1;
    return this.at(lo, (d - x[lo]) / (x[lo + 1] - x[lo]));
  }

  /** The column's value at the depth of the last seek(). */
  value(column: readonly number[]): number {
    if (this.n < 2) return column[0];
    if (this.f === 0) return column[this.lo];
    if (this.f === 1) return column[this.lo + 1];
    return column[this.lo] + this.f * (column[this.lo + 1] - column[this.lo]);
  }

  /** Adds w to the weights of the two samples around the last seek(), as value() would mix them. */
  spread(w: number, weights: Float64Array): void {
    if (this.n < 2 || this.f === 0) weights[this.lo] += w;
    else if (this.f === 1) weights[this.lo + 1] += w;
    else {
      weights[this.lo] += w * (1 - this.f);
      weights[this.lo + 1] += w * this.f;
    }
  }

  private at(lo: number, f: number): this {
    this.lo = lo;
    this.f = f;
    return this;
  }
}

/** The first index of an ascending list where `after` holds (`after` false then true along the list), or its length. */
export function firstIndex(list: readonly number[], after: (v: number) => boolean): number {
  let lo = 0,
    hi = list.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (after(list[mid])) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

/** The distinct values of ascending lists, ascending: merged pairwise in linear time (no sort). */
export function mergeAscending(lists: readonly (readonly number[])[]): number[] {
  let merged: number[] = [];
  for (const list of lists) {
    const out: number[] = [];
    let i = 0,
      j = 0;
    while (i < merged.length || j < list.length) {
      const x = j >= list.length || (i < merged.length && merged[i] <= list[j]) ? merged[i++] : list[j++];
      if (out.length === 0 || out[out.length - 1] !== x) out.push(x);
    }
    merged = out;
  }
  return merged;
}
