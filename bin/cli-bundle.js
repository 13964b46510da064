// Keeps dist/cli/gprime.mjs, the bundled CLI, in step with the TypeScript sources (see src-main/shell/bundle.js).
// Bundling makes a CLI start take a fraction of a second instead of ≈2.7 s through a TypeScript loader, mostly
// because mathjs is tree-shaken. Code splitting keeps the report writer and its libraries (pdf-lib, fontkit,
// canvas, chart.js, exceljs) in a chunk that only `gprime assess --out` loads.
import { bundleIfStale } from '../src-main/shell/bundle.js';

export const ensureCliBundle = () =>
  bundleIfStale({ entry: 'src-main/cli/gprime.ts', outfile: 'dist/cli/gprime.mjs', splitting: true });
