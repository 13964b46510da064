#!/usr/bin/env node
// Launcher: runs the TypeScript CLI through tsx's loader, so `npx gprime …` works after `npm install`.
import { register } from 'tsx/esm/api';
register();
await import('../src-main/cli/gprime.ts');
