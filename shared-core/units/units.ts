import { create, unitDependencies, createUnitDependencies, type Unit } from 'mathjs';
import { InputError } from '../core/errors';
import { readLeadingNumber, type DecimalMark } from './number';

/**
 * Quantities with units at the edges. Inside shared-core every number is SI in the unit names of
 * quantities.ts ('m', 'm3/s', 'kg/m3', 'degC', 'PSU' …). Parsing uses mathjs units plus the trade's
 * customary units (cfs, MGD, ML/d, gpm, acre-ft/d, knot, mph, 6", 40', 5'6").
 */
function createUnitMath() {
  const math = create({ unitDependencies, createUnitDependencies });
  math.createUnit('cfs', '1 ft^3/s');
  math.createUnit('MGD', '1000000 gal/day');
  math.createUnit('MLD', '1000 m^3/day');
  math.createUnit('acreft', '43560 ft^3');
  math.createUnit('gpm', '1 gal/minute');
  math.createUnit('knot', { definition: '0.514444444444 m/s', aliases: ['knots', 'kn', 'kt'] });
  math.createUnit('mph', '1 mile/hour');
  return math;
}

let unitMath: ReturnType<typeof createUnitMath> | undefined;

/** The mathjs instance with our units, created on first use: a start that parses no unit does not pay for it. */
const math = () => (unitMath ??= createUnitMath());

export type UnitSystem = 'si' | 'us';

/** Our unit names → mathjs unit expressions. Dimensionless units are handled apart. */
const MATHJS_NAME: Record<string, string> = {
  m: 'm',
  s: 's',
  'm/s': 'm/s',
  'm/s2': 'm/s^2',
  'm2/s': 'm^2/s',
  'm3/s': 'm^3/s',
  'kg/m3': 'kg/m^3',
  degC: 'degC',
  K: 'K',
  dbar: 'dbar',
  m2: 'm^2',
  m3: 'm^3',
  '1/s': '1/s',
  '1/s2': '1/s^2',
  deg: 'deg',
  'Pa s': 'Pa s',
  'kg/s': 'kg/s',
  Pa: 'Pa',
  'W/(m K)': 'W/(m K)',
  'J/(kg K)': 'J/(kg K)',
  'm4/s3': 'm^4/s^3',
  'm3/s3': 'm^3/s^3',
  'm4/s2': 'm^4/s^2',
  'mS/cm': 'mS/cm',
  'S/m': 'S/m',
};

/** Unit names accepted as spelled variants in CSV headers and typed input. */
const ALIASES: Record<string, string> = {
  'm3/s': 'm^3/s',
  'm³/s': 'm^3/s',
  'm^3/s': 'm^3/s',
  cms: 'm^3/s',
  'ft3/s': 'ft^3/s',
  'l/s': 'L/s',
  'gal/min': 'gal/minute',
  'kg/m3': 'kg/m^3',
  'kg/m³': 'kg/m^3',
  'mg/l': 'mg/L',
  'g/l': 'g/L',
  'm/s2': 'm/s^2',
  'm2/s': 'm^2/s',
  'm²/s': 'm^2/s',
  '°c': 'degC',
  '°f': 'degF',
  c: 'degC',
  f: 'degF',
  degc: 'degC',
  degf: 'degF',
  'deg c': 'degC',
  'deg f': 'degF',
  celsius: 'degC',
  fahrenheit: 'degF',
  ft: 'ft',
  feet: 'ft',
  meters: 'm',
  metres: 'm',
  'ft/s': 'ft/s',
  fps: 'ft/s',
  'ft/s2': 'ft/s^2',
  'lb/ft3': 'lb/ft^3',
  cfs: 'cfs',
  mgd: 'MGD',
  gpm: 'gpm',
  mld: 'MLD',
  'ML/d': 'MLD',
  'Ml/d': 'MLD',
  'ML/day': 'MLD',
  'm3/d': 'm^3/day',
  'm³/d': 'm^3/day',
  'm^3/d': 'm^3/day',
  'm3/day': 'm^3/day',
  'm³/day': 'm^3/day',
  'acre-ft/d': 'acreft/day',
  'acre-ft/day': 'acreft/day',
  'ac-ft/d': 'acreft/day',
  'af/d': 'acreft/day',
  'acre-feet/day': 'acreft/day',
  in: 'in',
  inch: 'in',
  inches: 'in',
  "'": 'ft',
  '’': 'ft',
  '′': 'ft',
  '"': 'in',
  "''": 'in',
  '”': 'in',
  '″': 'in',
  'ms/cm': 'mS/cm',
  'µs/cm': 'uS/cm',
  'μs/cm': 'uS/cm',
  'us/cm': 'uS/cm',
  's/m': 'S/m',
};

/** Units of the US customary system: there a comma between digits only ever groups thousands. */
const US_CUSTOMARY = /(^|[^a-z])(ft|feet|foot|in|inch|mi|mile|yd|gal|gpm|MGD|cfs|degF|acreft|mph|lb|fps)([^a-z]|$)/i;

function decimalMarkFor(unit: string): DecimalMark {
  return unit !== '' && US_CUSTOMARY.test(normaliseUnitText(unit)) ? 'point' : 'either';
}

const DIMENSIONLESS = new Set(['1', 'PSU', '']);
const SALINITY_UNITS = /^(psu|pss-?78|ppt|‰|g\/kg|o\/oo)$/i;

/** Normalises a unit as typed by a user ("ft3/s", "°F", "mg/l") to mathjs syntax. */
export function normaliseUnitText(text: string): string {
  const t = text.trim();
  return (
    ALIASES[t] ??
    ALIASES[t.toLowerCase()] ??
    t
      .replace(/(\w)([23])(?![\d.])/g, '$1^$2')
      .replace(/²/g, '^2')
      .replace(/³/g, '^3')
  );
}

/** What a quantity in an SI unit is, and units a user may type for it, for refusals in words. */
const QUANTITY_KIND: Record<string, [string, string]> = {
  m: ['a length', 'ft, in, km'],
  s: ['a time', 'min, h, day'],
  'm/s': ['a speed', 'ft/s, knot, mph'],
  'm/s2': ['an acceleration', 'ft/s2'],
  'm2/s': ['a diffusivity or kinematic viscosity', 'ft2/s, cm2/s'],
  'm3/s': ['a discharge', 'cfs, MGD, ML/d, L/s'],
  'kg/m3': ['a density or concentration', 'lb/ft3, g/L, mg/L'],
  degC: ['a temperature', 'degF, K'],
  K: ['a temperature difference', 'degF'],
  dbar: ['a pressure', 'bar, Pa'],
  m2: ['an area', 'ft2, km2'],
  m3: ['a volume', 'ft3, gal'],
  '1/s': ['a frequency', '1/min'],
  deg: ['an angle', 'rad'],
};

/** The unit a field expects, in words: "a length in m or a unit convertible to it (ft, in, km)". */
export function expectedQuantity(siUnit: string): string {
  if (siUnit === 'PSU') return 'a salinity in PSU (or ppt, g/kg)';
  if (DIMENSIONLESS.has(siUnit)) return 'a plain number without a unit';
  const [kind, others] = QUANTITY_KIND[siUnit] ?? ['a quantity', ''];
  return `${kind} in ${siUnit} or a unit convertible to it${others ? ` (${others})` : ''}`;
}

function toMathUnit(field: string, text: string, value: number, siUnit: string): Unit {
  try {
    return math().unit(value, normaliseUnitText(text));
  } catch {
    throw new InputError(
      field,
      `${value} ${text}`,
      siUnit,
      expectedQuantity(siUnit),
      `the unit "${text}" is not known; give ${expectedQuantity(siUnit)}`,
    );
  }
}

/** True when the text is a unit gprime knows ("m", "degC", "PSU", "mS/cm"…). */
export function isKnownUnit(text: string): boolean {
  if (SALINITY_UNITS.test(text)) return true;
  try {
    math().unit(1, normaliseUnitText(text));
    return true;
  } catch {
    return false;
  }
}

/**
 * Converts value·fromUnit to the SI unit `siUnit` (one of our unit names).
 * Throws an InputError naming the field when the units do not match in dimension.
 */
export function convertToSi(field: string, value: number, fromUnit: string, siUnit: string): number {
  if (DIMENSIONLESS.has(siUnit)) {
    if (fromUnit === '' || fromUnit === '1' || (siUnit === 'PSU' && SALINITY_UNITS.test(fromUnit))) return value;
    throw new InputError(
      field,
      `${value} ${fromUnit}`,
      siUnit,
      expectedQuantity(siUnit),
      `"${fromUnit}" is not a unit of ${siUnit === 'PSU' ? 'salinity' : 'a dimensionless number'}; give ${expectedQuantity(siUnit)}`,
    );
  }
  const target = MATHJS_NAME[siUnit] ?? siUnit;
  const u = toMathUnit(field, fromUnit, value, siUnit);
  try {
    return u.toNumber(target);
  } catch {
    const kind = QUANTITY_KIND[siUnit]?.[0];
    throw new InputError(
      field,
      `${value} ${fromUnit}`,
      siUnit,
      expectedQuantity(siUnit),
      `"${fromUnit}" ${kind ? `is not a unit of ${kind.replace(/^an? /, '')}` : `cannot be converted to ${siUnit}`}; give ${expectedQuantity(siUnit)}`,
    );
  }
}

/**
 * Parses "30 ft", "30ft", "450 cfs", "54 degF", "1.5e-3", "12,5 degC" (decimal comma), "12 500 ft" and
 * "1,500 cfs" (grouped thousands), 6" and 40' (inches, feet), 5'6" (feet and inches) into the SI unit given.
 * A bare number is taken as already SI. A lone comma before three digits ("1,500 m") is grouped thousands
 * with a US customary unit and refused with both readings otherwise.
 */
export function parseQuantity(field: string, text: string, siUnit: string): number {
  const trimmed = text.trim();
  const unitGuess = trimmed.replace(/^[-+\u2212]?[\d.,\s\u00A0\u2009\u202F]*(?:[eE][-+]?\d+)?/, '');
  const m = readLeadingNumber(field, trimmed, decimalMarkFor(unitGuess), siUnit);
  if (!m)
    throw new InputError(
      field,
      text,
      siUnit,
      expectedQuantity(siUnit),
      `it is not a number; give ${expectedQuantity(siUnit)}`,
    );
  const feetInches = /^(?:'|’|′|ft|feet|foot)\s*(\d+(?:\.\d+)?)\s*(?:"|''|”|″|in|inch|inches)?$/i.exec(m.rest);
  if (feetInches) {
    const inches = Math.abs(m.value) * 12 + Number(feetInches[1]);
    return convertToSi(field, Math.sign(m.value || 1) * inches, 'in', siUnit);
  }
  return m.rest === '' ? m.value : convertToSi(field, m.value, m.rest, siUnit);
}

/** Display unit for each SI unit in the US customary system (the SI system displays SI). */
const US_DISPLAY: Record<string, string> = {
  m: 'ft',
  'm/s': 'ft/s',
  'm/s2': 'ft/s2',
  'm2/s': 'ft2/s',
  'm3/s': 'cfs',
  degC: 'degF',
  'kg/m3': 'lb/ft3',
  m2: 'ft2',
  m3: 'ft3',
  'm^(2/3)/s': 'ft^(2/3)/s',
};

/** Display units that mathjs cannot read (fractional powers): the factor from SI, 1 ft = 0.3048 m exactly. */
const US_FACTOR: Record<string, number> = { 'm^(2/3)/s': 0.3048 ** (-2 / 3) };

/** The unit a value in siUnit is displayed in under the given system. */
export function displayUnit(siUnit: string, system: UnitSystem): string {
  return system === 'us' ? (US_DISPLAY[siUnit] ?? siUnit) : siUnit;
}

/** Converts an SI value to the display unit of the system. */
export function toDisplay(value: number, siUnit: string, system: UnitSystem): { value: number; unit: string } {
  const unit = displayUnit(siUnit, system);
  if (unit === siUnit) return { value, unit };
  if (US_FACTOR[siUnit]) return { value: value * US_FACTOR[siUnit], unit };
  return {
    value: math()
      .unit(value, MATHJS_NAME[siUnit] ?? siUnit)
      .toNumber(normaliseUnitText(unit)),
    unit,
  };
}

/** Converts a value in the display unit of the system back to SI (inverse of toDisplay). */
export function fromDisplay(value: number, siUnit: string, system: UnitSystem): number {
  const unit = displayUnit(siUnit, system);
  if (unit !== siUnit && US_FACTOR[siUnit]) return value / US_FACTOR[siUnit];
  return unit === siUnit ? value : convertToSi('value', value, unit, siUnit);
}
