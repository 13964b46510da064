import { valueText } from './errors';
import { inRange, type Range } from './range';
import { outsideValidity, type Warning } from './warning';

/** A calibrated or validated input range of a published method; outside it the result gets a warning. */
export interface ValidityRange extends Range {
  unit: string;
  /** what the range is (e.g. "laboratory data of …") */
  note?: string;
}

/**
 * Runtime descriptor of one published method. Warnings, `gprime calc --list`
 * and the report's reference list read it, so the documentation cannot drift.
 */
export interface MethodInfo {
  id: string;
  title: string;
  /** full citation with equation or table */
  source: string;
  /** the equation in words or symbols, for the calc sheet */
  equation: string;
  validity: Record<string, ValidityRange>;
  /**
   * how the coefficients and the form were obtained, when not checked against the original publication
   * (e.g. "coefficient as quoted in …; not compared with the original"): printed in the report's
   * verification appendix, so that `source` stays a clean bibliographic reference
   */
  provenance?: string;
}

/** A scalar result: value in SI, unit, the method that made it and its warnings. */
export interface Scalar {
  value: number;
  unit: string;
  method: string;
  warnings: Warning[];
}

/** Warnings for every input outside the method's validity ranges. */
export function validityWarnings(info: MethodInfo, inputs: Record<string, number>): Warning[] {
  const out: Warning[] = [];
  for (const [name, range] of Object.entries(info.validity)) {
    const x = inputs[name];
    if (x === undefined || inRange(x, range)) continue;
    // four figures: a warning is read, not compared digit by digit with the range
    const lo = range.min === undefined ? undefined : valueText(range.min, range.unit, 4);
    const hi = range.max === undefined ? undefined : valueText(range.max, range.unit, 4);
    const span = lo && hi ? `the range ${lo} … ${hi}` : lo ? `the range from ${lo} up` : `the range up to ${hi}`;
    out.push(
      outsideValidity(
        'validity-range',
        `${name} = ${valueText(x, range.unit, 4)} is outside ${span} of ${info.title}` +
          (range.note ? ` (${range.note})` : '') +
          '; the result is an extrapolation.',
        name,
      ),
    );
  }
  return out;
}

/** Builds a Scalar for a method, adding its validity warnings. */
export function scalar(
  info: MethodInfo,
  value: number,
  unit: string,
  inputs: Record<string, number>,
  extra: Warning[] = [],
): Scalar {
  return { value, unit, method: info.id, warnings: [...validityWarnings(info, inputs), ...extra] };
}
