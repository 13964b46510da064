// `npm start` step: bundles the Electron main process (ESM) and the sandboxed preload (CommonJS) to dist/electron.
import { bundleIfStale } from '../shell/bundle.js';

await bundleIfStale({ entry: 'src-main/electron/main.ts', outfile: 'dist/electron/main.js' });
await bundleIfStale({
  entry: 'src-main/electron/preload.cts',
  outfile: 'dist/electron/preload.cjs',
  format: 'cjs',
  external: ['electron'],
});
