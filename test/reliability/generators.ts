// Generated inputs for the reliability suite: site texts mutated from a valid document, hostile paths
// built from a workspace's traps, and payloads for every contract channel (mostly well-formed, so the
// handlers are reached, sometimes anything at all).
import fc from 'fast-check';
import { CHANNEL_NAMES } from '../../shared-core/ipc/contract';

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };

/** The paths of every leaf of a JSON value. */
function leafPaths(v: Json, at: (string | number)[] = []): (string | number)[][] {
  if (v === null || typeof v !== 'object') return [at];
  const keys: (string | number)[] = Array.isArray(v) ? v.map((_x, i) => i) : Object.keys(v);
  return keys.flatMap((k) => leafPaths((v as Record<string | number, Json>)[k], [...at, k]));
}

function withLeaf(text: string, path: (string | number)[], value: unknown): string {
  const doc = JSON.parse(text);
  let node = doc;
  for (const k of path.slice(0, -1)) node = node[k];
  node[path[path.length - 1]] = value;
  return JSON.stringify(doc, null, 2);
}

/** Site texts: spliced bytes, one leaf replaced by any JSON value, and a few whole texts. */
export function siteTexts(site: string, newer: string): fc.Arbitrary<string> {
  const leaves = leafPaths(JSON.parse(site));
  return fc.oneof(
    fc
      .tuple(fc.nat(site.length), fc.nat(40), fc.string({ maxLength: 8 }))
      .map(([i, k, s]) => site.slice(0, i) + s + site.slice(i + k)),
    fc.tuple(fc.constantFrom(...leaves), fc.jsonValue({ maxDepth: 2 })).map(([path, v]) => withLeaf(site, path, v)),
    fc.constantFrom(site, newer, '', '{}', 'null', '[]', '\uFEFF' + site, site.repeat(2)),
  );
}

/** Paths built from the workspace's entries, relative pieces, odd characters and over-long names. */
export function hostilePaths(entries: string[], ws: string): fc.Arbitrary<string> {
  const piece = fc.oneof(
    fc.constantFrom('..', '.', '', 'sub', 'reports', 'link-out-dir', 'link-out.gpsite', 'pipe.gpsite'),
    fc.constantFrom('dangling.gpsite', 'new.gpsite', '.hidden.gpsite', 'notes.txt', '%2e%2e', 'x\u0000y.gpsite'),
    fc.string({ unit: fc.constantFrom('a', '.', '/', '\\', ':', ' ', 'é', '\u0000'), maxLength: 6 }),
  );
  const relative = fc.array(piece, { minLength: 1, maxLength: 5 }).map((p) => p.join('/'));
  return fc.oneof(
    fc.constantFrom(...entries, '/', '/etc/passwd', '/dev/zero', '/proc/self/environ', 'x'.repeat(5000)),
    relative,
    relative.map((r) => `${ws}/${r}`),
    fc.tuple(fc.constantFrom(...entries), relative).map(([e, r]) => `${e}/${r}`),
  );
}

/** Names for Save as and open: fixed traps and short strings of characters that matter to file systems. */
const names = fc.oneof(
  fc.constantFrom('kept', 'newer.gpsite', 'link-out', 'dangling', 'pipe', '..', '.', '', 'CON', 'a/../../b'),
  fc.string({ unit: fc.constantFrom('k', '.', '/', '\\', ':', '*', '\u0000', ' '), maxLength: 5 }),
);

/** One request: a channel and its payload. report.export is left out (seconds a run, in a worker thread). */
export function channelRequests(texts: fc.Arbitrary<string>, paths: fc.Arbitrary<string>) {
  const wellFormed = fc.oneof(
    fc.record({ channel: fc.constant('site.open'), payload: fc.record({ name: names }, { requiredKeys: [] }) }),
    fc.record({ channel: fc.constant('site.read'), payload: fc.record({ path: paths }) }),
    fc.record({ channel: fc.constant('site.save'), payload: fc.record({ path: paths, text: texts }) }),
    fc.record({ channel: fc.constant('site.saveAs'), payload: fc.record({ text: texts, suggestedName: names }) }),
    fc.record({
      channel: fc.constant('recovery.write'),
      payload: fc.record({ text: texts, path: fc.option(paths, { nil: null }) }),
    }),
    fc.record({
      channel: fc.constantFrom('site.recent', 'recovery.check', 'recovery.clear', 'app.info'),
      payload: fc.constant({}),
    }),
    fc.record({ channel: fc.constant('clipboard.writeImage'), payload: fc.record({ pngBase64: fc.base64String() }) }),
  );
  const channels = CHANNEL_NAMES.filter((c) => c !== 'report.export');
  const anything = fc.record({
    channel: fc.oneof(fc.constantFrom(...channels, '__proto__', 'constructor', ''), fc.string({ maxLength: 12 })),
    payload: fc.anything({ maxDepth: 2 }),
  });
  return fc.oneof({ arbitrary: wellFormed, weight: 4 }, { arbitrary: anything, weight: 1 });
}
