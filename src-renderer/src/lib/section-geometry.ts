/** Pure geometry of the section drawing: depth scale, ticks and plume envelopes. */

export interface DepthScale {
  /** water depth [m] the drawing spans */
  depth: number;
  top: number;
  bottom: number;
  y: (d: number) => number;
}

export function depthScale(depth: number, top: number, bottom: number): DepthScale {
  const D = depth > 0 && Number.isFinite(depth) ? depth : 20;
  return { depth: D, top, bottom, y: (d) => top + (Math.min(Math.max(d, 0), D * 1.05) / D) * (bottom - top) };
}

/** Round tick values from 0 to max (in display units). */
export function ticks(max: number, count = 6): number[] {
  if (!(max > 0)) return [0];
  const raw = max / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? 10 * mag;
  const out: number[] = [];
  for (let v = 0; v <= max + 1e-9; v += step) out.push(Number(v.toPrecision(10)));
  return out;
}

/** Polyline points "x,y x,y" */
export function points(xs: number[], ys: number[]): string {
  return xs.map((x, i) => `${x.toFixed(1)},${ys[i].toFixed(1)}`).join(' ');
}

/**
 * Outline of a plume of radius r around a centreline, in screen coordinates. Offsets are perpendicular to
 * the path in metres before scaling, so the width reads right whatever the two scales.
 */
export function envelope(x: number[], depth: number[], radius: number[], sx: (m: number) => number, sy: (m: number) => number): string {
  const n = x.length;
  if (n < 2) return '';
  const left: string[] = [], right: string[] = [];
  for (let i = 0; i < n; i++) {
    const a = Math.max(0, i - 1), b = Math.min(n - 1, i + 1);
    const tx = x[b] - x[a], tz = -(depth[b] - depth[a]);
    const len = Math.hypot(tx, tz) || 1;
    const nx = -tz / len, nz = tx / len;
    left.push(`${sx(x[i] + nx * radius[i]).toFixed(1)},${sy(depth[i] - nz * radius[i]).toFixed(1)}`);
    right.push(`${sx(x[i] - nx * radius[i]).toFixed(1)},${sy(depth[i] + nz * radius[i]).toFixed(1)}`);
  }
  return [...left, ...right.reverse()].join(' ');
}

import type { SectionMark } from './estimate-curves';

/** A drawing of an estimate placed in the section, with what its hover and click need. */
export interface PlacedMark {
  mark: SectionMark;
  estimateId: string;
  title: string;
  /** why the result lies outside its method's validity (drawn dashed) */
  outside: string[];
}
