import { depthInX, type Series, type SeriesAxis } from '../calc/types';
import { displayUnit, toDisplay, type UnitSystem } from '../units/units';
import { sentenceIn } from '../units/sentence';
import { prettyUnit, slug } from './format';

/**
 * Chart specifications derived from calc series, in the display unit system. Depth is always drawn
 * downwards on the vertical axis. Every renderer (export service, UI) draws from these specs.
 */

/** Line and marker styles that stay distinguishable in grayscale: dash pattern and marker differ too. */
export const LINE_STYLES: readonly {
  color: string;
  dash: readonly number[];
  marker: 'circle' | 'rect' | 'triangle' | 'crossRot' | 'rectRot' | 'star';
}[] = [
  { color: '#1f4e9c', dash: [], marker: 'circle' },
  { color: '#c0392b', dash: [8, 4], marker: 'rect' },
  { color: '#2e7d32', dash: [2, 3], marker: 'triangle' },
  { color: '#6a3d9a', dash: [10, 3, 2, 3], marker: 'crossRot' },
  { color: '#b15928', dash: [4, 2], marker: 'rectRot' },
  { color: '#333333', dash: [12, 6], marker: 'star' },
];

export interface ChartAxis {
  label: string;
  /** display unit as typeset ("m³/s"); empty for dimensionless */
  unit: string;
  /** axis title: label with unit in brackets */
  title: string;
  /** true when values grow downwards (depth) */
  reverse: boolean;
}

export interface ChartDataset {
  label: string;
  /** points in display units; null coordinates break the line */
  points: { x: number | null; y: number | null }[];
  /** index into LINE_STYLES */
  style: number;
}

export interface ChartSpec {
  /** the kind of the series it draws ("plume-centreline"), for views that add reference lines */
  kind: string;
  /** file-safe identifier, unique within a report */
  id: string;
  title: string;
  caption: string;
  x: ChartAxis;
  y: ChartAxis;
  datasets: ChartDataset[];
  /** the chart's data as a table: header and rows in display units (null = no value) */
  table: { header: string[]; rows: (number | null)[][] };
}

function axisTitle(label: string, unit: string): string {
  return unit ? `${label} (${unit})` : label;
}

function display(values: readonly number[], unit: string, units: UnitSystem): (number | null)[] {
  return values.map((v) => (Number.isFinite(v) ? toDisplay(v, unit, units).value : null));
}

/** Groups y columns by unit so that each chart has one unit per axis. */
function groupsByUnit(ys: readonly SeriesAxis[]): SeriesAxis[][] {
  const groups = new Map<string, SeriesAxis[]>();
  for (const y of ys) groups.set(y.unit, [...(groups.get(y.unit) ?? []), y]);
  return [...groups.values()];
}

function groupLabel(series: Series, group: readonly SeriesAxis[]): string {
  return group.length === 1 ? group[0].label : group.length <= 3 ? group.map((g) => g.label).join(', ') : series.title;
}

/** One chart per series and unit group; `prefix` makes ids unique within the report. */
export function chartSpecs(series: readonly Series[], units: UnitSystem, prefix: string): ChartSpec[] {
  const out: ChartSpec[] = [];
  series.forEach((s, si) => {
    const groups = groupsByUnit(s.y);
    groups.forEach((group, gi) => {
      const xUnit = prettyUnit(displayUnit(s.x.unit, units));
      const yUnit = prettyUnit(displayUnit(group[0].unit, units));
      const xs = display(s.x.values, s.x.unit, units);
      const columns = group.map((g) => display(g.values, g.unit, units));
      // depthAxis: depth is drawn on the vertical axis, downwards, whichever side of the series holds it
      const swap = depthInX(s);
      const along = { label: s.x.label, unit: xUnit };
      const across = { label: groupLabel(s, group), unit: yUnit };
      const h = swap ? across : along;
      const v = swap ? along : across;
      const title = sentenceIn(groups.length > 1 ? `${s.title}: ${across.label}` : s.title, units);
      out.push({
        kind: s.kind,
        id: `${prefix}-${si + 1}${groups.length > 1 ? String.fromCharCode(97 + gi) : ''}-${slug(title, 40)}`,
        title,
        caption: sentenceIn(s.caption ?? `${across.label} against ${s.x.label.toLowerCase()}`, units),
        x: { ...h, title: axisTitle(h.label, h.unit), reverse: false },
        y: { ...v, title: axisTitle(v.label, v.unit), reverse: !!s.depthAxis },
        datasets: group.map((g, k) => ({
          label: g.label + (group.length > 1 || !yUnit ? '' : ` (${yUnit})`),
          points: xs.map((x, i) => (swap ? { x: columns[k][i] ?? null, y: x } : { x, y: columns[k][i] ?? null })),
          style: k % LINE_STYLES.length,
        })),
        table: {
          header: [axisTitle(s.x.label, xUnit), ...group.map((g) => axisTitle(g.label, yUnit))],
          rows: xs.map((x, i) => [x, ...columns.map((c) => c[i] ?? null)]),
        },
      });
    });
  });
  return out;
}
