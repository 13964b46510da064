import { spawnSync } from 'node:child_process';
import { resolve } from 'node:path';

export const ROOT = resolve(import.meta.dirname, '..', '..');

export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
  /** stdout parsed as JSON (undefined when it is not JSON) */
  json: any;
}

/** Runs the real `gprime` launcher (bin/gprime.js) in a child process from the repository root. */
export function runGprime(args: string[], cwd = ROOT): CliRun {
  const r = spawnSync(process.execPath, [resolve(ROOT, 'bin/gprime.js'), ...args], {
    cwd,
    encoding: 'utf8',
    timeout: 60000,
  });
  let json: unknown;
  try {
    json = JSON.parse(r.stdout);
  } catch {
    json = undefined;
  }
  return { code: r.status ?? -1, stdout: r.stdout, stderr: r.stderr, json };
}
