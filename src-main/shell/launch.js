#!/usr/bin/env node
// `npm run serve`: bundles the browser shell when its sources changed, then runs it with the given options.
import { pathToFileURL } from 'node:url';
import { bundleIfStale } from './bundle.js';

const bundle = await bundleIfStale({ entry: 'src-main/shell/serve.ts', outfile: 'dist/shell/serve.mjs' });
await import(pathToFileURL(bundle).href);
