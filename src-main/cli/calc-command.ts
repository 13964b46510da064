import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { CALC_METHODS, findCalcMethod } from '../../shared-core/calc/registry';
import { runCalc, type RawArg } from '../../shared-core/calc/resolve';
import { InputError } from '../../shared-core/core/errors';
import { parseProfileCsv } from '../../shared-core/profile/csv';
import { describeMethods, formatCalcText } from './format';
import { UsageError, type CommandResult } from './errors';

/** Reads a CSV profile from disk for a 'profile' parameter. */
export function loadProfileFile(field: string, path: string) {
  let text: string;
  try {
    text = readFileSync(resolve(path), 'utf8');
  } catch (e) {
    throw new InputError(field, path, '', 'a readable CSV file', `cannot read "${path}": ${(e as NodeJS.ErrnoException).code ?? String(e)}`);
  }
  return parseProfileCsv(text);
}

/** `gprime calc <method> name=value … [--json]` and `gprime calc --list [--json]`. */
export function calcCommand(args: string[], json: boolean): CommandResult {
  if (args.includes('--list')) {
    const list = describeMethods(CALC_METHODS);
    if (json) return { stdout: JSON.stringify({ methods: list }, null, 2) };
    return { stdout: list.map((m) => `${m.id.padEnd(22)} ${m.title}\n${' '.repeat(23)}${m.parameters.map((p) => p.name + ('unit' in p && p.unit !== '1' ? ` [${p.unit}]` : '')).join(', ')}`).join('\n') };
  }
  const [id, ...pairs] = args;
  if (!id) throw new UsageError('gprime calc needs a method id; `gprime calc --list` shows them');
  const method = findCalcMethod(id);
  if (!method) throw new UsageError(`unknown method "${id}"; known methods: ${CALC_METHODS.map((m) => m.id).join(', ')}`);
  const raw: Record<string, RawArg> = {};
  for (const pair of pairs) {
    const eq = pair.indexOf('=');
    if (eq <= 0) throw new UsageError(`expected name=value, got "${pair}"`);
    const name = pair.slice(0, eq).trim();
    const value = pair.slice(eq + 1);
    const spec = method.params.find((p) => p.name === name);
    raw[name] = spec?.kind === 'profile' ? loadProfileFile(name, value) : value;
  }
  const out = runCalc(method, raw);
  if (json) return { stdout: JSON.stringify({ method: method.id, results: out.results, warnings: out.warnings, sources: out.sources }) };
  return { stdout: formatCalcText(method, out) };
}
