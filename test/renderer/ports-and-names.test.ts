// The ports an estimate card names, a port list read into table rows, and bay names wrapped instead of
// clipped. The port depths of the demo come from its own site file; the assessment is run here as the
// workspace's worker runs it.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { assessSite, loadSite } from '../../shared-core/site';
import { portRows, portsUsed } from '../../src-renderer/src/lib/ports-used';
import { wrappedName } from '../../src-renderer/src/lib/section-geometry';

const SITE = loadSite(
  readFileSync(join(import.meta.dirname, '..', '..', 'examples', 'quillmere-reservoir.gpsite'), 'utf8'),
);
const ASSESSED = assessSite(SITE, { gprimeVersion: 'test', siteHash: 'h' }, { bands: false });
const outcome = (id: string) => {
  const o = ASSESSED.estimates.find((e) => e.id === id);
  if (!o) throw new Error(`no estimate ${id}`);
  return o;
};

describe('ports an estimate uses', () => {
  it('names every port of the intake for a release split, each port of a list as one row', () => {
    expect(portsUsed(SITE, outcome('release-summer'), 'si')).toBe('ports: Upper port, Middle port, Lower port');
    const rows = portRows(String(outcome('release-summer').inputs.ports.value), SITE, outcome('release-summer'));
    expect(rows?.map((r) => r.name)).toEqual(['Upper port', 'Middle port', 'Lower port']);
    // the lower port is typed as 98 ft: 98 × 0.3048 m (NIST SP 811, 2008, Appendix B.8)
    expect(rows?.[2].depth).toBeCloseTo(98 * 0.3048, 9);
    expect(rows?.map((r) => r.capacity)).toEqual([12, 12, 15]);
  });

  it('names the port a single-port method runs at, in the display units', () => {
    // the withdrawal layer runs at the upper port, 5 m = 16.4 ft (5 / 0.3048 = 16.404)
    expect(portsUsed(SITE, outcome('layer-upper'), 'si')).toBe('port: Upper port at 5 m');
    expect(portsUsed(SITE, outcome('layer-upper'), 'us')).toBe('port: Upper port at 16.4 ft');
  });

  it('names an outfall’s single port for the jet, none for a required dilution (a mass balance)', () => {
    expect(portsUsed(SITE, outcome('plume-summer'), 'si')).toBe('single port at 20 m');
    expect(portsUsed(SITE, outcome('ammonia-dilution'), 'si')).toBe('');
    expect(portsUsed(SITE, outcome('wind-summer'), 'si')).toBe('');
  });

  it('reads no rows from text that is not a depth:capacity list', () => {
    expect(portRows('5:12,deep:3', SITE, outcome('release-summer'))).toBeUndefined();
  });
});

describe('bay names', () => {
  it('wrap at spaces into two lines and end in an ellipsis only when longer than both', () => {
    expect(wrappedName('Treatment works outfall', 16)).toEqual(['Treatment works', 'outfall']);
    expect(wrappedName('Brenn River inflow', 20)).toEqual(['Brenn River inflow']);
    const long = wrappedName('Northern treatment works deep outfall with diffuser', 16);
    expect(long).toHaveLength(2);
    expect(long[1].endsWith('…')).toBe(true);
    expect(long.every((l) => l.length <= 16)).toBe(true);
  });
});
