import { InputError } from '../core/errors';
import { resolveArgs, type RawArg } from '../calc/resolve';
import type { CalcMethod } from '../calc/types';
import { parseStandardUncertainty } from './parse';
import { propagateMonteCarloJcgm101, type PropagationOptions, type UncertaintyResult } from './propagate';

/**
 * The uncertainty band of a calc method from standard uncertainties as typed ("10%", "0.5 ft", "0.002"),
 * keyed by parameter name. The CLI (`--sigma`) and the site file (an estimate's `uncertainty`) both use it.
 */
export function bandsFromTyped(
  method: CalcMethod,
  raw: Record<string, RawArg | undefined>,
  typed: Readonly<Record<string, string>>,
  options: PropagationOptions = {},
): UncertaintyResult {
  const base = resolveArgs(method, raw);
  const inputs = Object.entries(typed).map(([name, text]) => {
    const spec = method.params.find((p) => p.name === name);
    const numeric = method.params
      .filter((p) => p.kind === 'number')
      .map((p) => p.name)
      .join(', ');
    if (!spec || spec.kind !== 'number')
      throw new InputError(
        `uncertainty of ${name}`,
        name,
        '',
        numeric,
        `${method.id} has no numeric parameter "${name}"; numeric parameters are ${numeric}`,
      );
    const nominal = base[name];
    if (typeof nominal !== 'number')
      throw new InputError(
        `uncertainty of ${name}`,
        name,
        spec.unit,
        'a parameter with a value',
        `give ${name} a value to vary`,
      );
    return { name, standardUncertainty: parseStandardUncertainty(name, text, spec.unit, nominal) };
  });
  return propagateMonteCarloJcgm101(method, raw, inputs, options);
}
