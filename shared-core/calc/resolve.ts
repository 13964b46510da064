import { ComputationError, InputError } from '../core/errors';
import { describeRange, requireInRange } from '../core/range';
import { parseQuantity } from '../units/units';
import { uniqueWarnings } from '../core/warning';
import type { Profile } from '../profile/profile';
import type { CalcArgs, CalcMethod, CalcOutput, ParamSpec } from './types';

/** Raw argument as typed (a string with an optional unit) or already a number in SI, or a loaded profile. */
export type RawArg = string | number | Profile;

/**
 * Turns raw arguments into validated SI arguments: parses units, applies defaults, checks ranges and
 * choices, and refuses unknown names. Throws InputError naming the parameter, its value, unit and range.
 */
export function resolveArgs(method: CalcMethod, raw: Record<string, RawArg | undefined>): CalcArgs {
  const known = new Set(method.params.map((p) => p.name));
  for (const name of Object.keys(raw)) {
    if (!known.has(name))
      throw new InputError(
        name,
        raw[name],
        '',
        [...known].join(', '),
        `${method.id} has no parameter "${name}"; its parameters are ${[...known].join(', ')}`,
      );
  }
  const out: CalcArgs = {};
  for (const spec of method.params) {
    const value = raw[spec.name];
    if (value === undefined || value === '') {
      const fallback = 'default' in spec ? spec.default : undefined;
      if (fallback === undefined && !spec.optional)
        throw new InputError(
          spec.name,
          '(missing)',
          unitOf(spec),
          allowedText(spec),
          `${spec.name} is required (${spec.description})`,
        );
      out[spec.name] = fallback;
      continue;
    }
    out[spec.name] = resolveOne(spec, value);
  }
  return out;
}

function unitOf(spec: ParamSpec): string {
  return spec.kind === 'number' ? spec.unit : '';
}

function allowedText(spec: ParamSpec): string {
  if (spec.kind === 'number') return describeRange(spec.range ?? {}, spec.unit);
  if (spec.kind === 'choice') return spec.choices.join(', ');
  if (spec.kind === 'profile') return 'a CSV profile file';
  return 'text';
}

function resolveOne(spec: ParamSpec, value: RawArg): CalcArgs[string] {
  switch (spec.kind) {
    case 'number': {
      const si =
        typeof value === 'number'
          ? value
          : typeof value === 'string'
            ? parseQuantity(spec.name, value, spec.unit)
            : NaN;
      return requireInRange(spec.name, si, spec.unit, spec.range ?? {});
    }
    case 'choice': {
      const v = String(value).trim().toLowerCase();
      if (!spec.choices.includes(v))
        throw new InputError(spec.name, value, '', spec.choices.join(', '), `choose one of ${spec.choices.join(', ')}`);
      return v;
    }
    case 'profile':
      if (typeof value !== 'object')
        throw new InputError(spec.name, value, '', 'a CSV profile file', 'a profile is required');
      return value;
    case 'text':
      return String(value);
  }
}

/**
 * Runs a method on raw arguments and guarantees that no NaN or Infinity leaves it: a non-finite result or
 * chart value is a ComputationError (an internal failure, not bad input).
 */
export function runCalc(method: CalcMethod, raw: Record<string, RawArg | undefined>): CalcOutput {
  const out = method.run(resolveArgs(method, raw));
  for (const [name, r] of Object.entries(out.results)) {
    if (typeof r.value === 'number' && !Number.isFinite(r.value)) {
      throw new ComputationError(`${method.id}: the result ${name} is not a finite number (${r.value})`);
    }
  }
  for (const s of out.series ?? []) {
    for (const axis of [s.x, ...s.y]) {
      if (axis.values.some((v) => !Number.isFinite(v)))
        throw new ComputationError(`${method.id}: the chart series “${s.title}” holds a non-finite ${axis.label}`);
    }
  }
  out.warnings = uniqueWarnings(out.warnings);
  out.sources = [...new Set(out.sources)];
  return out;
}

/** Shorthand for a numeric result. */
export function num(value: number, unit: string) {
  return { value, unit };
}

/** Shorthand for a text result. */
export function text(value: string) {
  return { value, unit: '' as const };
}
