import { ESLint } from 'eslint';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

// The layering of DEVELOPERS.md ("Layout") is enforced by eslint.config.js; these cases prove each rule bites.
const eslint = new ESLint({ cwd: resolve(import.meta.dirname, '..', '..') });

async function ruleIds(code: string, filePath: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath });
  return result.messages.map((m) => m.ruleId ?? m.message);
}

describe('import boundaries (eslint.config.js)', () => {
  it.each([
    ["import { readFileSync } from 'node:fs';", 'shared-core/water/x.ts'],
    ["import { readFileSync } from 'fs';", 'shared-core/water/x.ts'],
    ["import { app } from 'electron';", 'shared-core/water/x.ts'],
    ["import { x } from '../../src-main/cli/main';", 'shared-core/water/x.ts'],
    ["import { x } from '../../src-renderer/src/lib/format';", 'shared-core/water/x.ts'],
    ["import { readFileSync } from 'node:fs';", 'src-renderer/src/lib/x.ts'],
    ["import { ipcRenderer } from 'electron';", 'src-renderer/src/lib/x.ts'],
    ["import { x } from '../../../src-main/cli/main';", 'src-renderer/src/lib/x.ts'],
    ["import { buoyantJetTrajectory } from '../../../shared-core/jets/buoyant-jet';", 'src-renderer/src/lib/x.ts'],
    ["import { profileSeries } from '../../../shared-core/profile/calc';", 'src-renderer/src/lib/x.ts'],
  ])('refuses %s in %s', async (code, file) => {
    expect(await ruleIds(`${code}\nexport const y = x;\n`, file)).toContain('@typescript-eslint/no-restricted-imports');
  });

  it.each([
    ["import { assessSite } from '../../../shared-core/site';", 'src-renderer/src/lib/x.ts'],
    ["import type { Profile } from '../../../shared-core/profile/profile';", 'src-renderer/src/lib/x.ts'],
    ["import { z } from 'zod';", 'shared-core/water/x.ts'],
    ["import { readFileSync } from 'node:fs';", 'src-main/cli/x.ts'],
  ])('allows %s in %s', async (code, file) => {
    expect(await ruleIds(`${code}\nexport const y = 1;\n`, file)).not.toContain(
      '@typescript-eslint/no-restricted-imports',
    );
  });

  it.each([
    ['export const r = Math.random();', 'no-restricted-properties'],
    ['export const t = Date.now();', 'no-restricted-properties'],
    ['export const t = new Date();', 'no-restricted-syntax'],
    ["console.log('x');", 'no-console'],
    ['export const w = window.innerWidth;', 'no-restricted-globals'],
    ['export const e = process.env;', 'no-restricted-globals'],
  ])('shared-core refuses clock, randomness, console and host globals: %s', async (code, rule) => {
    expect(await ruleIds(code, 'shared-core/water/x.ts')).toContain(rule);
  });
});
