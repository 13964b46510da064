// Worker thread that writes one report (src-main/report/export-in-worker.ts starts it), so the process that asked
// for the export keeps answering while the PDF, charts and workbook are drawn. Plain JavaScript: it bundles the
// TypeScript report writer with esbuild when a source is newer (src-main/shell/bundle.js), then runs it.
import { pathToFileURL } from 'node:url';
import { parentPort, workerData } from 'node:worker_threads';
import { bundleIfStale } from '../shell/bundle.js';

const { text, name, options, version } = workerData;
try {
  const bundle = await bundleIfStale({
    entry: 'src-main/report/write-report.ts',
    outfile: 'dist/report/write-report.mjs',
  });
  const { exportSiteReport } = await import(pathToFileURL(bundle).href);
  parentPort.postMessage({ ok: true, files: await exportSiteReport(text, name, options, version) });
} catch (e) {
  // an Error loses its class across threads: keep what the caller maps to a contract error (errno code, path)
  const error = e instanceof Error ? e : new Error(String(e));
  parentPort.postMessage({
    ok: false,
    error: { name: error.name, message: error.message, code: e?.code, path: e?.path },
  });
}
