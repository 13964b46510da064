// Temporary files of atomic saves: a save killed part-way leaves one beside its target (the target itself
// intact); the next start removes it, but never a temporary file of a save still running in another process.
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createChannelHandlers } from '../../src-main/services/channel-handlers';
import { removeStaleTemporaryFiles, temporaryPathFor } from '../../src-main/services/temp-files';
import { workspaceHost } from '../../src-main/shell/workspace-host';

const ROOT = resolve(import.meta.dirname, '..', '..');
const tmp = () => mkdtempSync(join(tmpdir(), 'gprime-temp-'));

/** Runs a save in a child process and kills it (SIGKILL) once its temporary file is on disk. */
function killSaveMidway(target: string): Promise<void> {
  return new Promise((done, fail) => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'test/main/fixtures/killed-save.ts', target], {
      cwd: ROOT,
    });
    let err = '';
    child.stderr.on('data', (c) => (err += c));
    child.stdout.on('data', (c) => String(c).includes('temporary file written') && child.kill('SIGKILL'));
    child.on('exit', (_code, signal) =>
      signal === 'SIGKILL' ? done() : fail(new Error(`the save was not killed: ${err}`)),
    );
  });
}

describe('temporary files left by a killed save', () => {
  it('are left beside an intact target by the kill and removed at the next start (data folder, workspace)', async () => {
    const dir = tmp();
    const data = join(dir, 'data');
    const ws = join(dir, 'sites');
    mkdirSync(data);
    mkdirSync(ws);
    for (const f of [join(data, 'recent.json'), join(ws, 'a.gpsite')]) {
      writeFileSync(f, '{"old": true}');
      await killSaveMidway(f);
    }
    const leftovers = (d: string) => readdirSync(d).filter((n) => n.endsWith('.tmp'));
    expect(leftovers(data)).toHaveLength(1);
    expect(leftovers(ws)).toHaveLength(1);
    expect(readFileSync(join(ws, 'a.gpsite'), 'utf8')).toBe('{"old": true}');

    createChannelHandlers({ host: workspaceHost(ws), dataDir: data, version: '0' });
    expect(leftovers(data)).toEqual([]);
    expect(leftovers(ws)).toEqual([]);
    expect(readFileSync(join(ws, 'a.gpsite'), 'utf8')).toBe('{"old": true}');
  }, 60_000);

  it("keep a running save's temporary file, other files and folders named alike", () => {
    const dir = tmp();
    const running = temporaryPathFor(join(dir, 'b.gpsite'), process.pid);
    const dead = temporaryPathFor(join(dir, 'b.gpsite'), 999_999_999);
    writeFileSync(running, 'x');
    writeFileSync(dead, 'x');
    writeFileSync(join(dir, 'notes.tmp'), 'x'); // not one of ours
    mkdirSync(temporaryPathFor(join(dir, 'c.gpsite'), 999_999_999)); // a folder is never removed
    expect(removeStaleTemporaryFiles(dir, (pid) => pid === process.pid)).toEqual([dead]);
    expect(existsSync(running)).toBe(true);
    expect(existsSync(join(dir, 'notes.tmp'))).toBe(true);
    expect(removeStaleTemporaryFiles(join(dir, 'missing'))).toEqual([]);
  });
});
