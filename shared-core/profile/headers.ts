import { InputError } from '../core/errors';
import { convertToSi } from '../units/units';
import type { ProfileIssue } from './profile';

/** Which standard column a header names; anything else is carried along (numbers as extras, text as labels). */
export type Role =
  | 'depth'
  | 'elevation'
  | 'pressure'
  | 'temperature'
  | 'salinity'
  | 'conductivity'
  | 'specific-conductance'
  | 'sediment';

const ROLE_PATTERNS: [Role, RegExp][] = [
  ['depth', /^(depth|dep|d|z_?down)$/i],
  ['elevation', /^(elevation|elev|height|z|level|stage)$/i],
  ['pressure', /^(pressure|pres|press|prdm|p|sea_?pressure)$/i],
  ['temperature', /^(temperature|temp|t|water_?temp(erature)?|wtemp)$/i],
  ['salinity', /^(salinity|sal|s|psal|practical_?salinity)$/i],
  ['conductivity', /^(conductivity|cond|ec|electrical_?conductivity|in_?situ_?conductivity)$/i],
  [
    'specific-conductance',
    /^(specific_?conductance|specific_?conductivity|spcond|sp_?cond|spc|sc|ec_?25|sc_?25|cond(uctivity)?_?25)$/i,
  ],
  ['sediment', /^(sediment|ssc|tss|suspended_?(sediment|solids)|sed)$/i],
];

/** SI unit of each role inside shared-core (conductivity in mS/cm, the unit of PSS-78). */
export const ROLE_UNIT: Record<Role, string> = {
  depth: 'm',
  elevation: 'm',
  pressure: 'dbar',
  temperature: 'degC',
  salinity: 'PSU',
  conductivity: 'mS/cm',
  'specific-conductance': 'mS/cm',
  sediment: 'kg/m3',
};

/** Roles that give the vertical coordinate, in order of preference. */
export const VERTICAL_ROLES: readonly Role[] = ['depth', 'elevation', 'pressure'];

/** Names of columns that label a row or a cast rather than measure something (always kept as text). */
export const LABEL_NAME =
  /^(date|time|date_?time|timestamp|day|station|stn|cast|profile|site|location|id|flag|qc|quality|comment|notes?|sample)(_?id)?$/i;

export interface ParsedHeader {
  name: string;
  unit: string;
}

/** "at 25 °C" in a conductivity unit ("µS/cm @ 25C") marks specific conductance. */
const AT_25C = /\s*(@|at)?\s*25\s*°?\s*C\b/i;

/** Splits "depth (ft)", "Temp [degF]", "Sal (psu)", "DO mg/L" or "depth_m" into a name and a unit. */
export function parseHeader(header: string): ParsedHeader {
  const h = header.trim();
  const bracket = /^(.*?)\s*[([{]\s*([^)\]}]*)\s*[)\]}]\s*$/.exec(h);
  if (bracket) return { name: bracket[1].trim(), unit: bracket[2].trim() };
  const spaced = /^(.*\S)\s+(\S*[/°%]\S*|m|ft|psu|ppt|degC|degF|C|F|dbar)$/i.exec(h);
  if (spaced) return { name: spaced[1].trim(), unit: spaced[2].trim() };
  const suffix = /^(.*?)_(m|ft|degc|degf|c|f|psu|ppt|mgl|kgm3|dbar)$/i.exec(h);
  if (suffix)
    return {
      name: suffix[1],
      unit: ({ mgl: 'mg/L', kgm3: 'kg/m3' } as Record<string, string>)[suffix[2].toLowerCase()] ?? suffix[2],
    };
  return { name: h, unit: '' };
}

/** The role of a parsed header, if it names a standard column. */
export function roleOf(h: ParsedHeader): Role | undefined {
  const key = h.name.replace(/[\s.-]+/g, '_');
  const role = ROLE_PATTERNS.find(([, re]) => re.test(key))?.[0];
  return role === 'conductivity' && AT_25C.test(h.unit) ? 'specific-conductance' : role;
}

/** The unit of a header without an "at 25 °C" remark, or the role's default unit when none is given. */
export function unitOf(h: ParsedHeader, role: Role): string {
  const u = h.unit.replace(AT_25C, '').trim();
  return u || ROLE_UNIT[role];
}

/**
 * The conversion of a column's values to SI, found once per column: every unit of a standard column is an
 * affine map (a scale, plus an offset for °F and °C), so two conversions give it. A unit that does not fit
 * the column is one issue on the header.
 */
export function columnConversion(h: ParsedHeader, role: Role, issues: ProfileIssue[]): (v: number) => number {
  try {
    const unit = unitOf(h, role);
    const offset = convertToSi(h.name, 0, unit, ROLE_UNIT[role]);
    const scale = convertToSi(h.name, 1, unit, ROLE_UNIT[role]) - offset;
    return (v) => scale * v + offset;
  } catch (e) {
    // the column is named by the issue; its message says why the unit does not fit
    issues.push({ row: 0, column: h.name, message: e instanceof InputError ? (e.detail ?? e.message) : String(e) });
    return () => NaN;
  }
}
