import { InputError } from '../../shared-core/core/errors';
import { ProfileError } from '../../shared-core/profile/profile';
import { calcCommand } from './calc-command';
import { isBadInput, treatAsBadInput, UsageError, type CommandResult } from './errors';
import { sentenceIn } from '../../shared-core/units/sentence';
import { unitsAskedFor } from './shown';

treatAsBadInput(InputError, ProfileError);

const USAGE = `gprime — screening estimates for stratified flows and density currents

Usage:
  gprime calc <method> name=value … [--units si|us] [--json]
                                                run one estimate (values in SI or with units: depth=30ft);
                                                --units us shows results and messages in US customary units
  gprime calc <method> … --sigma name=u [--sigma …] [--samples N] [--seed N] [--coverage p]
                                                add an uncertainty band (u: one standard deviation,
                                                e.g. g_prime=0.002, depth=1ft, velocity=10%)
  gprime calc --list [--json]                   list every method, its parameters and results
  gprime assess <site file> [--units si|us] [--json]
                                                evaluate every estimate of a site file (summary in the
                                                site's units unless --units is given)
  gprime assess <site file> --out <folder> [--format pdf,png,svg,csv,xlsx] [--units si|us]
               [--issue-date YYYY-MM-DD]        write the calc package (a draft for checking unless
                                                an issue date is given)
  gprime help                                   this text

Exit codes: 0 success, 2 bad input, 1 internal error; assess: 3 when an estimate is in error or incomplete
(its output is still written in full).
Screening estimates only: local codes, the permitting authority and licensed engineering practice govern.`;

export type CommandHandler = (args: string[], json: boolean) => CommandResult | Promise<CommandResult>;

const COMMANDS: Record<string, CommandHandler> = {
  calc: calcCommand,
};

/** Registers a sub-command (later modules add `assess` and others). */
export function registerCommand(name: string, handler: CommandHandler): void {
  COMMANDS[name] = handler;
}

/** Runs the CLI on argv (without node and script) and returns the exit code. */
export async function main(argv: string[]): Promise<number> {
  const json = argv.includes('--json');
  const args = argv.filter((a) => a !== '--json');
  const [command, ...rest] = args;
  if (!command || command === 'help' || command === '--help' || command === '-h') {
    process.stdout.write(USAGE + '\n');
    return command ? 0 : 2;
  }
  const handler = COMMANDS[command];
  try {
    if (!handler) throw new UsageError(`unknown command "${command}"; try \`gprime help\``);
    const result = await handler(rest, json);
    process.stdout.write(result.stdout + '\n');
    if (result.stderr) process.stderr.write(`gprime: ${result.stderr}\n`);
    return result.exitCode ?? 0;
  } catch (e) {
    const bad = isBadInput(e);
    const message = sentenceIn(e instanceof Error ? e.message : String(e), unitsAskedFor(args));
    if (json) {
      const field = e instanceof InputError ? e.field : undefined;
      process.stdout.write(JSON.stringify({ error: { kind: bad ? 'input' : 'internal', field, message } }) + '\n');
    }
    process.stderr.write(`gprime: ${message}\n`);
    return bad ? 2 : 1;
  }
}
