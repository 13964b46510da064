import type { Site } from '../site/schema';
import { parseQuantity, toDisplay, type UnitSystem } from '../units/units';
import { figuresFor, formatValue, prettyUnit } from './format';
import { fieldWords } from '../site/words';

/** One input of the site document as typed, in SI, in the display units, and where it sits in the file. */
export interface InputLine {
  /** what it belongs to: the water body, a condition, a feature */
  owner: string;
  /** the field in words and as the file names it ("Capacity (ports[1].capacity)") */
  field: string;
  typed: string;
  si: string;
  shown: string;
}

// SI unit of each quantity field of the site schema (shared-core/site/schema.ts), by field name
const FIELD_UNITS: Record<string, string> = {
  depth: 'm',
  length: 'm',
  width: 'm',
  area: 'm2',
  portDepth: 'm',
  diameter: 'm',
  spacing: 'm',
  distance: 'm',
  discharge: 'm3/s',
  capacity: 'm3/s',
  release: 'm3/s',
  riverDischarge: 'm3/s',
  angle: 'deg',
  temperature: 'degC',
  targetTemperature: 'degC',
  salinity: 'PSU',
  sediment: 'kg/m3',
  seaDensity: 'kg/m3',
  riverDensity: 'kg/m3',
  bedSlope: '1',
  current: 'm/s',
  wind: 'm/s',
  tidalVelocity: 'm/s',
};

/** A field in the editors' words with its path in the file, so that the reader can find it in either. */
const fieldText = (path: string) => `${fieldWords(path)} (${path})`;

function lines(owner: string, value: unknown, path: string, units: UnitSystem): InputLine[] {
  if (Array.isArray(value)) return value.flatMap((v, i) => lines(owner, v, `${path}[${i}]`, units));
  if (value && typeof value === 'object')
    return Object.entries(value).flatMap(([k, v]) =>
      ['id', 'kind', 'name', 'profile', 'constituents'].includes(k)
        ? []
        : lines(owner, v, path ? `${path}.${k}` : k, units),
    );
  const key =
    path
      .replace(/\[\d+\]/g, '')
      .split('.')
      .at(-1) ?? path;
  const unit = FIELD_UNITS[key];
  if (unit === undefined || (typeof value !== 'number' && typeof value !== 'string'))
    return value === undefined ? [] : [{ owner, field: fieldText(path), typed: String(value), si: '', shown: '' }];
  let si: number;
  try {
    si = typeof value === 'number' ? value : parseQuantity(path, value, unit);
  } catch {
    return [{ owner, field: fieldText(path), typed: String(value), si: 'cannot be read', shown: '' }];
  }
  const d = toDisplay(si, unit, units);
  return [
    {
      owner,
      field: fieldText(path),
      typed: typeof value === 'number' ? `${value} (SI)` : value,
      si: `${formatValue(si, figuresFor(unit))} ${prettyUnit(unit)}`.trim(),
      shown: `${formatValue(d.value, figuresFor(d.unit))} ${prettyUnit(d.unit)}`.trim(),
    },
  ];
}

/**
 * The inputs appendix: every quantity of the site document as entered, its SI value and its display value,
 * for the water body, each condition (with its profile's extent) and each feature. Constituents and
 * profiles are tabulated in their own sections; here a condition lists its profile's size.
 */
export function siteInputs(site: Site, units: UnitSystem): InputLine[] {
  const out = lines(`Water body “${site.waterBody.name}”`, site.waterBody, '', units);
  for (const c of site.conditions) {
    out.push(...lines(`Condition “${c.name}”`, { current: c.current, wind: c.wind }, '', units));
    out.push({
      owner: `Condition “${c.name}”`,
      field: 'profile',
      typed: `${c.profile.rows.length} rows; columns ${c.profile.columns.join(', ')}`,
      si: '',
      shown: '',
    });
  }
  for (const f of site.features) {
    out.push(...lines(`${f.kind[0].toUpperCase()}${f.kind.slice(1)} “${f.name}”`, f, '', units));
    if (f.kind === 'outfall')
      for (const c of f.constituents)
        out.push({
          owner: `Outfall “${f.name}”`,
          field: `constituent ${c.name}`,
          typed:
            [
              `effluent ${c.of ? `= effluent ${c.of}` : c.effluent}`,
              `ambient ${c.ambient}`,
              c.acute === undefined ? '' : `acute limit ${c.acute}`,
              c.chronic === undefined ? '' : `chronic limit ${c.chronic}`,
            ]
              .filter(Boolean)
              .join(', ') + ` ${prettyUnit(c.unit)}`,
          si: '',
          shown: '',
        });
  }
  return out;
}
