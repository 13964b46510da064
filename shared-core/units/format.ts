/**
 * Number and unit text as people read it, the same in the workspace, the CLI and the report:
 * "997.5", "4.365×10⁻³", "m³/s", "°C". Pure and deterministic.
 */

const PRETTY_UNITS: Record<string, string> = {
  '1': '',
  degC: '°C',
  degF: '°F',
  deg: '°',
  'm3/s': 'm³/s',
  'kg/m3': 'kg/m³',
  'm/s2': 'm/s²',
  'm2/s': 'm²/s',
  m2: 'm²',
  m3: 'm³',
  '1/s2': 's⁻²',
  '1/s': 's⁻¹',
  'ft3/s': 'ft³/s',
  'ft2/s': 'ft²/s',
  'ft/s2': 'ft/s²',
  'lb/ft3': 'lb/ft³',
  ft2: 'ft²',
  ft3: 'ft³',
  'm4/s3': 'm⁴/s³',
  'm3/s3': 'm³/s³',
  'm4/s2': 'm⁴/s²',
};

/** A unit name as typeset ("m3/s" → "m³/s", "degC" → "°C", "1" → ""). */
export function prettyUnit(unit: string): string {
  if (unit in PRETTY_UNITS) return PRETTY_UNITS[unit];
  return unit.replace(/([a-zA-Z])2(?![\d.])/g, '$1²').replace(/([a-zA-Z])3(?![\d.])/g, '$1³');
}

const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

/**
 * A number rounded to `digits` significant figures for tables and captions: 997.5, 0.3936, 21341,
 * 4.365×10⁻³. Very large or small magnitudes use powers of ten.
 */
export function formatValue(x: number, digits = 4): string {
  if (Number.isNaN(x)) return 'not a number';
  if (!Number.isFinite(x)) return x > 0 ? '∞' : '−∞';
  if (x === 0) return '0';
  const a = Math.abs(x);
  const sign = x < 0 ? '−' : '';
  if (a >= 1e6 || a < 1e-3) {
    const [mantissa, exponent] = a.toExponential(digits - 1).split('e');
    const m = mantissa.includes('.') ? mantissa.replace(/\.?0+$/, '') : mantissa;
    const e = String(Number(exponent))
      .split('')
      .map((c) => SUPERSCRIPT[c] ?? c)
      .join('');
    return `${sign}${m}×10${e}`;
  }
  if (a >= 10 ** digits) return sign + String(Math.round(a));
  const fixed = Number(a.toPrecision(digits));
  return sign + String(fixed);
}

/** A value with its unit for running text ("15.44 m", "0.3 " → "0.3"). */
export function withUnit(value: number, unit: string, digits = 4): string {
  const u = prettyUnit(unit);
  return u ? `${formatValue(value, digits)} ${u}` : formatValue(value, digits);
}
