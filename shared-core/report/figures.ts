import type { JetEvent } from '../jets/buoyant-jet';
import type { ComplianceRow, EstimateOutcome } from '../site/assess';
import type { ConditionOutcome } from '../site/conditions';
import { toDisplay, type UnitSystem } from '../units/units';
import { LINE_STYLES, type ChartDataset, type ChartSpec } from './charts';

/**
 * The reference lines a reviewer expects on the plume in section, from the same assessment: the water surface,
 * the bed, each zone boundary of the compliance rows this run feeds and the points where the path
 * meets the surface or bed, is trapped or ends. (The required dilutions on the dilution chart come with the
 * assessment's own series.) No physics here: every value is read from the outcome.
 */

/** The events marked on the section, in words. */
const MARKED: Partial<Record<JetEvent['kind'], string>> = {
  'surface contact': 'Reaches the surface',
  'bed contact': 'Reaches the bed',
  'return to port level': 'Returns to port level',
  'neutral buoyancy': 'Trapped (neutral buoyancy)',
  'plumes merge': 'Plumes merge',
  'end of near field': 'End of the near field',
};

function events(e: EstimateOutcome): JetEvent[] {
  const m = e.model;
  if (m?.kind === 'jet') return m.trajectory.events;
  if (m?.kind === 'diffuser')
    return [...m.diffuser[m.diffuser.governing].events, ...(m.diffuser.merge ? [m.diffuser.merge] : [])];
  return [];
}

const finite = (v: number | null): v is number => v !== null && Number.isFinite(v);

function extent(spec: ChartSpec, axis: 'x' | 'y'): [number, number] {
  const values = spec.datasets.flatMap((d) => d.points.map((p) => p[axis])).filter(finite);
  let lo = Infinity,
    hi = -Infinity;
  for (const v of values) [lo, hi] = [Math.min(lo, v), Math.max(hi, v)];
  return values.length ? [lo, hi] : [0, 1];
}

const line = (label: string, style: number, points: ChartDataset['points']): ChartDataset => ({
  label,
  points,
  style: style % LINE_STYLES.length,
});

const zoneName = (r: ComplianceRow) =>
  r.zone === 'acute' ? 'zone of initial dilution (acute)' : 'mixing-zone boundary (chronic)';

function section(
  spec: ChartSpec,
  e: EstimateOutcome,
  rows: readonly ComplianceRow[],
  deepest: number | undefined,
  units: UnitSystem,
): ChartSpec {
  const len = (m: number) => toDisplay(m, 'm', units).value;
  const port = e.inputs.port_depth?.value;
  // the bed the run stops at: its condition's deepest sample, or the port itself when that is shallower (jets/trace.ts)
  const portDepth = typeof port === 'number' ? Math.max(port, deepest ?? port) : undefined;
  const boundaries = [...new Map(rows.filter((r) => finite(r.boundary)).map((r) => [r.zone, r])).values()];
  const xMax = Math.max(extent(spec, 'x')[1], ...boundaries.map((r) => len(r.boundary!)));
  const bed = typeof portDepth === 'number' ? len(portDepth) : extent(spec, 'y')[1];
  let style = spec.datasets.length;
  const added: ChartDataset[] = [
    line('Water surface', style++, [
      { x: 0, y: 0 },
      { x: xMax, y: 0 },
    ]),
    ...(typeof portDepth === 'number'
      ? [
          line('Bed', style++, [
            { x: 0, y: bed },
            { x: xMax, y: bed },
          ]),
        ]
      : []),
    ...boundaries.map((r) =>
      line(
        zoneName(r).replace(/^./, (c) => c.toUpperCase()),
        style++,
        [
          { x: len(r.boundary!), y: 0 },
          { x: len(r.boundary!), y: bed },
        ],
      ),
    ),
    ...events(e)
      .filter((ev, i, all) => MARKED[ev.kind] && all.findIndex((o) => MARKED[o.kind] && o.s === ev.s) === i)
      .map((ev) => line(MARKED[ev.kind]!, style++, [{ x: len(ev.horizontalDistance), y: len(ev.depth) }])),
  ];
  return {
    ...spec,
    datasets: [...spec.datasets, ...added],
    caption: `${spec.caption}; with the water surface, the bed${boundaries.length ? ', the zone boundaries' : ''} and the points where the path ends or changes`,
  };
}

/** The charts of one estimate with the reference lines of the compliance rows its run feeds. */
export function withReferenceLines(
  specs: readonly ChartSpec[],
  e: EstimateOutcome,
  compliance: readonly ComplianceRow[],
  conditions: readonly ConditionOutcome[],
  units: UnitSystem,
): ChartSpec[] {
  const rows = compliance.filter((r) => r.estimate === e.id);
  const deepest = conditions.find((c) => c.id === e.condition?.id)?.deepest;
  return specs.map((s) => (s.kind === 'plume-centreline' ? section(s, e, rows, deepest, units) : s));
}
