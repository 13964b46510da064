import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { ROOT } from './demo';
import { median, ms, type Measured } from './harness';

const RUNS = 15;

/**
 * Start-up of the CLI for a one-line calc against a bare `node -e 0`, as a small hyperfine-like loop: the two
 * commands alternate (so load on the machine touches both alike), after one untimed run that builds the bundle.
 */
export function benchCliStart(): Measured {
  const cli = [join(ROOT, 'bin', 'gprime.js'), 'calc', 'water-density', 'temperature=20'];
  const bare = ['-e', '0'];
  const time = (args: string[]) => {
    const t0 = performance.now();
    const r = spawnSync(process.execPath, args, { cwd: ROOT, encoding: 'utf8' });
    if (r.status !== 0) throw new Error(`${args.join(' ')} failed: ${r.stderr}`);
    return performance.now() - t0;
  };
  time(cli);
  const cliTimes: number[] = [],
    bareTimes: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    cliTimes.push(time(cli));
    bareTimes.push(time(bare));
  }
  const c = median(cliTimes),
    b = median(bareTimes);
  return {
    values: { cli_start_ratio: c / b },
    lines: [
      `${'CLI start: calc water-density temperature=20'.padEnd(44)} ${ms(c).padStart(10)}   node -e 0 ${ms(b)}   ratio ×${(c / b).toFixed(2)} (median of ${RUNS})`,
    ],
  };
}
