import { hasWords, labelOf } from '../core/vocabulary';
import type { Site } from './schema';

/**
 * Site-file fields and calc parameters as people read them: a message says "Outfall A: Port depth", never
 * `features[2].portDepth` nor an exception's class name. The assessment words its messages with these, so
 * that every view (workspace, CLI, report) reads the same sentence.
 */

/** Site-file fields as the editors label them (the last part of a field path). */
const FIELD_WORDS: Record<string, string> = {
  portDepth: 'Port depth',
  diameter: 'Port diameter',
  discharge: 'Discharge',
  angle: 'Port angle',
  ports: 'Ports',
  spacing: 'Port spacing',
  'effluent.temperature': 'Effluent temperature',
  'effluent.salinity': 'Effluent salinity',
  'effluent.sediment': 'Effluent sediment',
  'mixingZone.distance': 'Mixing-zone distance',
  'mixingZone.zid.distance': 'Zone of initial dilution',
  release: 'Total release',
  targetTemperature: 'Target release temperature',
  sink: 'Form of the intake',
  width: 'Width',
  depth: 'Depth',
  capacity: 'Capacity',
  temperature: 'Temperature',
  salinity: 'Salinity',
  sediment: 'Sediment',
  bedSlope: 'Bed slope',
  form: 'Form',
  length: 'Length',
  riverDischarge: 'River discharge',
  tidalVelocity: 'Tidal velocity',
  seaDensity: 'Sea water density',
  riverDensity: 'River water density',
  current: 'Current speed',
  wind: 'Wind speed',
  profile: 'Profile',
  area: 'Area',
  method: 'Method',
  feature: 'Feature',
  condition: 'Condition',
};

/** A field path inside an item ("effluent.temperature") as the editors label it. */
export const fieldWords = (rest: string): string => {
  const tail = rest.replace(/\[\d+\]/g, '');
  if (FIELD_WORDS[tail]) return FIELD_WORDS[tail];
  const last = tail.split('.').pop() ?? tail;
  return FIELD_WORDS[last] ?? labelOf(last.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`)).label;
};

/** A site-file path ("features[2].ports[0].depth") as the user sees the field ("Intake A, Port 1: Depth"). */
export function placeName(path: string, site: Site): string {
  const m = /^(features|conditions|estimates)\[(\d+)\](?:\.(.*))?$/.exec(path);
  if (!m) return path.startsWith('waterBody.') ? `Water body: ${fieldWords(path.slice(10))}` : path;
  const [, group, index, rest = ''] = m;
  const list = site[group as 'features' | 'conditions' | 'estimates'] as {
    name?: string;
    title?: string;
    id: string;
  }[];
  const item = list[Number(index)];
  const owner = item ? (item.name ?? item.title ?? item.id) : `${group.slice(0, -1)} ${Number(index) + 1}`;
  const port = /^ports\[(\d+)\]\./.exec(rest);
  const portName =
    port && group === 'features' ? (site.features[Number(index)] as { ports?: { name: string }[] })?.ports : undefined;
  const where = port ? `${owner}, ${portName?.[Number(port[1])]?.name ?? `port ${Number(port[1]) + 1}`}` : owner;
  const param = /^params\.(\w+)$/.exec(rest);
  if (param) return `${where}: ${labelOf(param[1]).label}`;
  return rest ? `${where}: ${fieldWords(port ? rest.slice(port[0].length) : rest)}` : where;
}

const PATH = /\b(?:features|conditions|estimates)\[\d+\](?:\.[A-Za-z]+(?:\[\d+\])?)*|\bwaterBody\.[A-Za-z.]+/g;

/** Parameter names written inside a sentence ("or give ambient_density") as their labels, lower case. */
export function namesAsWords(text: string, method?: string): string {
  return text.replace(/\b[a-z][a-z0-9]*(?:_[a-z0-9]+)+\b/g, (n) =>
    hasWords(n) ? labelOf(n, method).label.replace(/^[A-Z](?![A-Z])/, (c) => c.toLowerCase()) : n,
  );
}

/**
 * A message for people: site-file paths become the fields as the editors name them, a calc parameter at the
 * start ("port_depth = …") its label, other parameter names their words, and an exception's class name
 * ("ProfileError: ") is dropped. Quantity tokens are left for the edge to show in the reader's units.
 */
export function siteMessage(text: string, site: Site, method?: string): string {
  const named = text
    .replace(/\b[A-Z][A-Za-z]*Error:\s*/g, '')
    .replace(/ \((“[^”]*”)\) profile:/g, ' profile:')
    .replace(/("[^"]*?\s(\S+)") \2(?=\s)/g, '$1')
    .replace(PATH, (p) => placeName(p, site));
  // "uncertainty of g_prime = …" keeps its parameter name: the uncertainty editor finds its field by it
  const band = /^uncertainty of [a-z][a-z0-9_]* = /.exec(named);
  if (band) return band[0] + namesAsWords(named.slice(band[0].length), method);
  const param = /^([a-z][a-z0-9]*(?:_[a-z0-9]+)*) = /.exec(named);
  return param
    ? `${labelOf(param[1], method, 'input').label} = ${namesAsWords(named.slice(param[1].length + 3), method)}`
    : namesAsWords(named, method);
}
