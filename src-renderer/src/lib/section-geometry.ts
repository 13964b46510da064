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
export function envelope(
  x: number[],
  depth: number[],
  radius: number[],
  sx: (m: number) => number,
  sy: (m: number) => number,
): string {
  const n = x.length;
  if (n < 2) return '';
  const left: string[] = [],
    right: string[] = [];
  for (let i = 0; i < n; i++) {
    const a = Math.max(0, i - 1),
      b = Math.min(n - 1, i + 1);
    const tx = x[b] - x[a],
      tz = -(depth[b] - depth[a]);
    const len = Math.hypot(tx, tz) || 1;
    const nx = -tz / len,
      nz = tx / len;
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

/** One row of a basin's outline: the width at `depth` [m] as a fraction of the surface width. */
export interface BasinWidth {
  depth: number;
  fraction: number;
}

/**
 * Schematic cross-section of a basin from its area–depth (hypsographic) table, down to the bed at
 * `bedDepth` [m]. Our choice, stated: the plan outline at each depth is taken as a scaled copy of the
 * surface outline, so the width at depth d is the surface width times √(A(d)/A(0)), and the section is
 * drawn symmetric about its centre line. It shows how the basin narrows with depth; it is not a surveyed
 * section. Between rows the width follows the straight line between them; below the last row the width
 * is held down to the bed. Returns undefined (the caller draws a flat bed) when the table is not usable:
 * fewer than two rows, the first not at the surface, depths not increasing, an area negative or not finite,
 * or no area at the surface.
 */
export function basinWidths(
  table: readonly { depth: number; area: number }[],
  bedDepth: number,
): BasinWidth[] | undefined {
  if (table.length < 2 || !(bedDepth > 0) || table[0].depth !== 0 || !(table[0].area > 0)) return undefined;
  if (
    table.some(
      (r, i) =>
        !Number.isFinite(r.area) ||
        r.area < 0 ||
        !Number.isFinite(r.depth) ||
        (i > 0 && !(r.depth > table[i - 1].depth)),
    )
  )
    return undefined;
  const rows = table.map((r) => ({ depth: r.depth, fraction: Math.sqrt(r.area / table[0].area) }));
  const above = rows.filter((r) => r.depth < bedDepth);
  const next = rows[above.length];
  if (!next) return [...above, { depth: bedDepth, fraction: above[above.length - 1].fraction }];
  const prev = above[above.length - 1];
  const t = (bedDepth - prev.depth) / (next.depth - prev.depth);
  return [...above, { depth: bedDepth, fraction: prev.fraction + t * (next.fraction - prev.fraction) }];
}

/** Polygon "x,y …" of the water in a basin outline, centred on `cx`, `halfWidth` px at the surface. */
export function basinPolygon(
  widths: readonly BasinWidth[],
  cx: number,
  halfWidth: number,
  sy: (d: number) => number,
): string {
  const left = widths.map((w) => `${(cx - w.fraction * halfWidth).toFixed(1)},${sy(w.depth).toFixed(1)}`);
  const right = widths.map((w) => `${(cx + w.fraction * halfWidth).toFixed(1)},${sy(w.depth).toFixed(1)}`).reverse();
  return [...left, ...right].join(' ');
}

/**
 * A name broken into at most `maxLines` lines of about `perLine` characters at spaces, so a bay's title is
 * read whole; only a name longer than all lines together ends in "…" (the full name stays in its tooltip).
 */
export function wrappedName(name: string, perLine: number, maxLines = 2): string[] {
  const width = Math.max(4, Math.floor(perLine));
  const lines: string[] = [];
  let line = '';
  for (const word of name.split(/\s+/).filter(Boolean)) {
    const next = line ? `${line} ${word}` : word;
    if (next.length <= width || !line) line = next;
    else {
      lines.push(line);
      line = word;
    }
  }
  if (line) lines.push(line);
  if (lines.length <= maxLines && lines.every((l) => l.length <= width)) return lines;
  const kept = lines.slice(0, maxLines);
  const rest = lines.slice(maxLines - 1).join(' ');
  kept[maxLines - 1] = rest.length > width ? `${rest.slice(0, width - 1)}…` : rest;
  return kept.map((l) => (l.length > width ? `${l.slice(0, width - 1)}…` : l));
}
