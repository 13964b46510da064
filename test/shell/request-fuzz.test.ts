// Fuzzing the browser shell's request paths and headers (fast-check) against a running server: whatever
// the path, method, token, Host, Origin, content type or extra headers, every request gets an HTTP answer
// other than 500, nothing hangs, the server keeps answering, and no file changes.
import { createHash } from 'node:crypto';
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startShell, type RunningShell } from '../../src-main/shell/server';
import { rawRequest } from './http-client';
import { encodeRequest, hostileRequest } from './request-arbitrary';

const DEMO = readFileSync(join(import.meta.dirname, '../../examples/quillmere-reservoir.gpsite'), 'utf8');
let shell: RunningShell;
let watched: string[];
const digest = () => watched.map((f) => createHash('sha256').update(readFileSync(f)).digest('hex'));

beforeAll(async () => {
  const root = mkdtempSync(join(tmpdir(), 'gprime-fuzz-'));
  mkdirSync(join(root, 'renderer'));
  writeFileSync(join(root, 'renderer', 'index.html'), '<!doctype html><title>gprime</title>');
  mkdirSync(join(root, 'sites'));
  watched = [join(root, 'outside.gpsite'), join(root, 'sites', 'kept.gpsite'), join(root, 'sites', 'notes.txt')];
  for (const f of watched) writeFileSync(f, DEMO);
  shell = await startShell({
    workspace: join(root, 'sites'),
    dataDir: join(root, 'data'),
    rendererDir: join(root, 'renderer'),
    version: '0',
  });
});
afterAll(() => shell.close());

describe('request fuzzing of the browser shell', () => {
  it('answers every generated request without a 500, a hang or a changed file, and keeps serving', async () => {
    const before = digest();
    const statuses = new Map<number | null, number>();
    await fc.assert(
      fc.asyncProperty(hostileRequest, async (r) => {
        const { head, body } = encodeRequest(r, shell.port, shell.token);
        const status = await rawRequest(shell.port, head, body);
        statuses.set(status, (statuses.get(status) ?? 0) + 1);
        expect(status, head.toString('latin1')).not.toBeNull();
        expect(status, head.toString('latin1')).not.toBe(500);
      }),
      { numRuns: Number(process.env.GPRIME_FUZZ_RUNS ?? 400) },
    );
    expect(digest()).toEqual(before);
    const alive = Buffer.from(
      `POST /api/app.info HTTP/1.1\r\nhost: 127.0.0.1:${shell.port}\r\nx-gprime-token: ${shell.token}\r\n` +
        'content-type: application/json\r\ncontent-length: 2\r\nconnection: close',
    );
    expect(await rawRequest(shell.port, alive, Buffer.from('{}'))).toBe(200);
    // the generator reached the refusals that matter (the counts vary with the seed; each is common)
    for (const s of [400, 403]) expect(statuses.get(s) ?? 0, `status ${s}`).toBeGreaterThan(0);
  });
});
