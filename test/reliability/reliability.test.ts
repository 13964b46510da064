// The reliability suite (issue "Reliability and security", figures to keep): generated inputs against the
// browser shell's HTTP server, the contract channels, the workspace's containment check and the site-file
// services, each counted as tried / accepted / refused cleanly / crashes / hangs / data changed. CI runs
// it at scale 1 (over 10⁴ inputs, in-process); GPRIME_RELIABILITY_SCALE=10 is the release run
// (test/reliability/README.md). Inputs come from a fixed seed, so a failure is reproducible.
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, sep } from 'node:path';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { SiteFileError } from '../../shared-core/site/load';
import { nodeWriteOps } from '../../src-main/services/atomic-write';
import { createChannelHandlers, dispatch } from '../../src-main/services/channel-handlers';
import { readSiteText, saveSiteText } from '../../src-main/services/file-store';
import { ServiceError } from '../../src-main/services/service-error';
import { startShell } from '../../src-main/shell/server';
import { workspaceHost } from '../../src-main/shell/workspace-host';
import { rawRequest } from '../shell/http-client';
import { encodeRequest, hostileRequest } from '../shell/request-arbitrary';
import { channelRequests, hostilePaths, siteTexts } from './generators';
import { hostileWorkspace } from './hostile-workspace';
import { Tally, withDeadline, type AreaRecorder } from './tally';

const SCALE = Number(process.env.GPRIME_RELIABILITY_SCALE ?? 1);
const SEED = Number(process.env.GPRIME_RELIABILITY_SEED ?? 16);
const SIZE = { requests: 1500, channels: 4000, paths: 3000, files: 2000 };
const DEADLINE_MS = 10_000; // an answer later than this is a hang (not a speed figure: bench measures speed)
const AREA_TIMEOUT_MS = 240_000 * SCALE;

const DEMO = readFileSync(join(import.meta.dirname, '../../examples/quillmere-reservoir.gpsite'), 'utf8');
const NEWER = DEMO.replace(/"version": \d+/, '"version": 99');
const CLEAN_CODES = new Set(['invalid-request', 'forbidden', 'not-found', 'site-file', 'io', 'unsupported', 'exists']);
const tally = new Tally();
const sample = <T>(arb: fc.Arbitrary<T>, n: number) => fc.sample(arb, { numRuns: n * SCALE, seed: SEED });

function noteChanges(rec: AreaRecorder, input: unknown, changed: string[]) {
  if (changed.length) rec.dataChanged(input, changed.join(', '));
}

afterAll(() => {
  const text = `${tally.table()}\n\nscale ${SCALE}, seed ${SEED}\n`;
  mkdirSync(join(import.meta.dirname, '..', '.artifacts'), { recursive: true });
  writeFileSync(join(import.meta.dirname, '..', '.artifacts', 'reliability.md'), text);
  console.log(`reliability suite\n${text}`);
  for (const a of tally.areas) if (a.examples.length) console.log(`${a.area}:\n  ${a.examples.join('\n  ')}`);
});

const expectClean = (rec: AreaRecorder) => {
  const c = rec.counts;
  expect({ crashes: c.crashes, hangs: c.hangs, dataChanged: c.dataChanged }, c.examples.join('\n')).toEqual({
    crashes: 0,
    hangs: 0,
    dataChanged: 0,
  });
  // not passing on refusals alone: a share of the inputs is taken
  expect(c.accepted, `${c.area}: accepted`).toBeGreaterThan(0);
};

describe('reliability suite', () => {
  it(
    'HTTP requests to the browser shell',
    async () => {
      const hw = hostileWorkspace(DEMO, NEWER);
      const shell = await startShell({ workspace: hw.ws, dataDir: hw.dataDir, rendererDir: hw.outside, version: '0' });
      const rec = tally.area('shell HTTP requests');
      const api = sample(channelRequests(siteTexts(DEMO, NEWER), hostilePaths(hw.entries, hw.ws)), SIZE.requests / 2);
      const hostile = sample(hostileRequest, SIZE.requests / 2);
      try {
        for (const [i, r] of hostile.entries()) {
          const raw = encodeRequest(r, shell.port, shell.token);
          const wellFormed = api[i];
          const body = Buffer.from(JSON.stringify(wellFormed.payload) ?? '');
          const head = Buffer.from(
            `POST /api/${encodeURIComponent(wellFormed.channel)} HTTP/1.1\r\nhost: 127.0.0.1:${shell.port}\r\n` +
              `x-gprime-token: ${shell.token}\r\ncontent-type: application/json\r\ncontent-length: ${body.length}`,
          );
          for (const [input, h, b] of [
            [r, raw.head, raw.body],
            [wellFormed, head, body],
          ] as const) {
            const status = await rawRequest(shell.port, h, b, DEADLINE_MS).catch(() => 'hang' as const);
            if (status === 'hang') rec.record('hang', input);
            else if (status === null || status >= 500) rec.record('crash', input, `status ${status}`);
            else rec.record(status < 400 ? 'accepted' : 'refused', input);
            noteChanges(rec, input, hw.changed());
          }
        }
      } finally {
        await shell.close();
      }
      expectClean(rec);
    },
    AREA_TIMEOUT_MS,
  );

  it(
    'contract channels, in-process',
    async () => {
      const hw = hostileWorkspace(DEMO, NEWER);
      const handlers = createChannelHandlers({ host: workspaceHost(hw.ws), dataDir: hw.dataDir, version: '0' });
      const rec = tally.area('contract channels');
      for (const input of sample(
        channelRequests(siteTexts(DEMO, NEWER), hostilePaths(hw.entries, hw.ws)),
        SIZE.channels,
      )) {
        try {
          const reply = await withDeadline(dispatch(handlers, input.channel, input.payload), DEADLINE_MS);
          if (reply === 'hang') rec.record('hang', input);
          else if (reply.ok) rec.record('accepted', input);
          else if (CLEAN_CODES.has(reply.error.code)) rec.record('refused', input);
          else rec.record('crash', input, `${reply.error.code}: ${reply.error.message}`);
        } catch (e) {
          rec.record('crash', input, `threw ${String(e)}`);
        }
        noteChanges(rec, input, hw.changed());
      }
      expectClean(rec);
    },
    AREA_TIMEOUT_MS,
  );

  it(
    'workspace containment: every accepted path lies inside the workspace',
    async () => {
      const hw = hostileWorkspace(DEMO, NEWER);
      const host = workspaceHost(hw.ws);
      const rec = tally.area('workspace paths');
      const ops = fc.record({
        op: fc.constantFrom('file', 'dir', 'open', 'saveAs', 'export'),
        path: hostilePaths(hw.entries, hw.ws),
      });
      const ask = async ({ op, path }: { op: string; path: string }) =>
        op === 'file'
          ? host.allowFile(path, 'write')
          : op === 'dir'
            ? host.allowDir(path)
            : op === 'open'
              ? host.pickOpenPath({ name: path })
              : op === 'saveAs'
                ? host.pickSavePath(path)
                : host.pickExportDir(path);
      for (const input of sample(ops, SIZE.paths)) {
        try {
          const p = await ask(input);
          if (p === null) {
            rec.record('refused', input); // no name given: nothing to open
            continue;
          }
          const inside = p.startsWith(hw.ws + sep) || (input.op === 'dir' && p === hw.ws);
          rec.record(inside ? 'accepted' : 'crash', input, `answered ${p}`);
        } catch (e) {
          const clean = e instanceof ServiceError || typeof (e as NodeJS.ErrnoException).code === 'string';
          rec.record(clean ? 'refused' : 'crash', input, String(e));
        }
        noteChanges(rec, input, hw.changed());
      }
      expectClean(rec);
    },
    AREA_TIMEOUT_MS,
  );

  it(
    'site files: saving and reading generated documents',
    () => {
      const dir = mkdtempSync(join(tmpdir(), 'gprime-files-'));
      const target = join(dir, 'site.gpsite');
      const newer = join(dir, 'newer.gpsite');
      const probe = join(dir, 'probe.gpsite');
      writeFileSync(newer, NEWER);
      // no flush to disk: durability is not under test here, and 10⁴ flushes would only measure the disk
      const ops = { ...nodeWriteOps, fsyncSync: () => {} };
      const rec = tally.area('site files');
      const inputs = fc.record({
        op: fc.constantFrom('save', 'save-over-newer', 'read'),
        text: siteTexts(DEMO, NEWER),
      });
      for (const input of sample(inputs, SIZE.files)) {
        writeFileSync(target, DEMO);
        const file = input.op === 'save' ? target : input.op === 'read' ? probe : newer;
        const before = input.op === 'read' ? input.text : readFileSync(file, 'utf8');
        if (input.op === 'read') writeFileSync(probe, input.text);
        let expected = before;
        try {
          if (input.op === 'read') readSiteText(probe);
          else expected = saveSiteText(file, input.text, ops).text;
          rec.record('accepted', input);
        } catch (e) {
          const clean = e instanceof SiteFileError || e instanceof ServiceError;
          rec.record(clean ? 'refused' : 'crash', input, String(e));
        }
        const changed = [
          ...(readFileSync(file, 'utf8') === expected ? [] : [file]),
          ...readdirSync(dir).filter((n) => n.endsWith('.tmp')),
        ];
        noteChanges(rec, input, changed);
      }
      expect(readFileSync(newer, 'utf8')).toBe(NEWER);
      expectClean(rec);
    },
    AREA_TIMEOUT_MS,
  );

  it('tried at least 10⁴ generated inputs', () => {
    expect(tally.total).toBeGreaterThanOrEqual(10_000 * SCALE);
  });
});
