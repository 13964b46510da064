// `npm run serve`: the workspace in a browser, for machines without Electron. Prints the address to open.
import { resolve } from 'node:path';
import { defaultDataDir } from '../services/data-dir';
import { GPRIME_VERSION } from '../services/site-file';
import { ensureRendererBuilt } from './renderer-build';
import { startShell } from './server';

const USAGE = `Usage: npm run serve -- [--port <n>] [--workspace <folder>] [--data-dir <folder>] [--no-build]
  --port        port on 127.0.0.1 (default: a free one at random)
  --workspace   folder of site files (default: ./sites, created when missing)
  --data-dir    recent files and the recovery file (default: $GPRIME_DATA_DIR or the per-user data folder)
  --no-build    serve dist/renderer as it is (default: rebuild it when missing or older than its sources)`;

function parseArgs(argv: string[]) {
  const opts = { port: 0, workspace: 'sites', dataDir: defaultDataDir(), build: true };
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    const value = () => {
      const v = argv[++i];
      if (v === undefined) throw new Error(`${a} needs a value`);
      return v;
    };
    if (a === '--port') {
      opts.port = Number(value());
      if (!Number.isInteger(opts.port) || opts.port < 0 || opts.port > 65535)
        throw new Error('--port takes a whole number 0–65535');
    } else if (a === '--workspace') opts.workspace = value();
    else if (a === '--data-dir') opts.dataDir = value();
    else if (a === '--no-build') opts.build = false;
    else if (a === '--help' || a === '-h') {
      process.stdout.write(USAGE + '\n');
      process.exit(0);
    } else throw new Error(`unknown option ${a}`);
  }
  return opts;
}

try {
  const root = resolve(import.meta.dirname, '..', '..');
  const opts = parseArgs(process.argv.slice(2));
  const rendererDir = resolve(root, 'dist', 'renderer');
  if (opts.build) await ensureRendererBuilt(root, rendererDir);
  const shell = await startShell({
    port: opts.port,
    workspace: resolve(opts.workspace),
    dataDir: resolve(opts.dataDir),
    rendererDir,
    version: GPRIME_VERSION,
  });
  process.stderr.write(
    `gprime: site files in ${resolve(opts.workspace)}; recovery in ${resolve(opts.dataDir)}; Ctrl+C stops\n`,
  );
  process.stdout.write(`gprime workspace: ${shell.url}\n`);
  const stop = () => void shell.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
} catch (e) {
  process.stderr.write(`gprime serve: ${e instanceof Error ? e.message : String(e)}\n${USAGE}\n`);
  process.exit(2);
}
