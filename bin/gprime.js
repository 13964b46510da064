#!/usr/bin/env node
// The `gprime` command: runs the bundled TypeScript CLI, rebuilding the bundle when a source changed.
import { pathToFileURL } from 'node:url';
import { ensureCliBundle } from './cli-bundle.js';

await import(pathToFileURL(await ensureCliBundle()).href);
