import type { EstimateOutcome } from '../../../shared-core/site/assess';
import type { Site } from '../../../shared-core/site/schema';
import type { UnitSystem } from '../../../shared-core/units/units';
import { formatNumber, safeDisplay, prettyUnit } from './format';
import { readQuantity } from './quantity';

/** One port of an intake's port list as an estimate ran with it (SI), named when it is the site's own. */
export interface PortRow {
  name?: string;
  depth: number;
  capacity: number;
}

const PAIR = /^\s*([-+]?\d*\.?\d+(?:[eE][-+]?\d+)?)\s*:\s*([-+]?\d*\.?\d+(?:[eE][-+]?\d+)?)\s*$/;

/**
 * A port-list input ("depth:capacity" pairs in m and m3/s, the form the release methods take) as rows; the
 * names are the intake's own when the list came from the site. Undefined when the text is not such a list.
 */
export function portRows(text: string, site: Site, o: EstimateOutcome, name = 'ports'): PortRow[] | undefined {
  const pairs = text.split(',').map((p) => PAIR.exec(p));
  if (!pairs.length || pairs.some((m) => !m)) return undefined;
  const f = site.features.find((x) => x.id === o.feature?.id);
  const named = f?.kind === 'intake' && o.origins[name] === 'site' && f.ports.length === pairs.length;
  return pairs.map((m, k) => ({
    ...(named ? { name: f.ports[k].name } : {}),
    depth: Number(m![1]),
    capacity: Number(m![2]),
  }));
}

/** inputs that show an outfall estimate runs on its port or diffuser */
const PORT_INPUTS = ['port_depth', 'diameter', 'ports', 'spacing'];

const shown = (v: number, unit: string, system: UnitSystem) => {
  const d = safeDisplay(v, unit, system);
  return `${formatNumber(d.value)} ${prettyUnit(d.unit)}`;
};

/**
 * Which port or ports of its feature an estimate uses, in words ("Upper port at 16.4 ft"), or '' when it has
 * no intake or outfall. An intake's port list names all its ports; a single-port method names the port at
 * the depth it ran with (the site binds the intake's first port unless a port depth is typed).
 */
export function portsUsed(site: Site, o: EstimateOutcome, system: UnitSystem): string {
  const f = site.features.find((x) => x.id === o.feature?.id);
  if (!f) return '';
  if (f.kind === 'outfall') {
    // a criterion's required dilution is a mass balance: it uses no port
    if (!PORT_INPUTS.some((name) => name in o.inputs)) return '';
    const typed = o.inputs.port_depth?.value;
    const depth = typeof typed === 'number' ? typed : readQuantity(f.portDepth, 'm', 'port depth').si;
    const at = depth === undefined ? '' : ` at ${shown(depth, 'm', system)}`;
    return f.ports > 1 ? `diffuser of ${f.ports} ports${at}` : `single port${at}`;
  }
  if (f.kind !== 'intake') return '';
  const list = o.inputs.ports?.value;
  if (typeof list === 'string') {
    const rows = portRows(list, site, o);
    if (!rows) return '';
    const names = rows.map((r) => r.name ?? `port at ${shown(r.depth, 'm', system)}`);
    return `${rows.length === 1 ? 'port' : 'ports'}: ${names.join(', ')}`;
  }
  const depth = o.inputs.port_depth?.value;
  const depths = f.ports.map((p) => readQuantity(p.depth, 'm', 'port depth').si);
  if (typeof depth === 'number') {
    const k = depths.findIndex((d) => d !== undefined && Math.abs(d - depth) < 1e-6);
    return `port: ${k >= 0 ? f.ports[k].name : 'typed'} at ${shown(depth, 'm', system)}`;
  }
  const first = depths[0];
  return `port: ${f.ports[0].name}${first === undefined ? '' : ` at ${shown(first, 'm', system)}`}`;
}
