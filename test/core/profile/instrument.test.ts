import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseProfileCsv, profileFromTable, readCsvTable, splitCasts } from '../../../shared-core/profile';

const text = (name: string) => readFileSync(resolve(import.meta.dirname, '../../fixtures/profiles', name), 'utf8');
const codes = (ws: readonly { code: string }[]) => ws.map((w) => w.code);
const warning = (ws: readonly { code: string; message: string }[], code: string) =>
  ws.find((w) => w.code === code)?.message ?? '';

describe('an instrument export (invented CTD-style file: preamble, date/time, pressure, conductivity, gaps)', () => {
  const table = readCsvTable(text('instrument-ctd.csv'));
  const p = profileFromTable(table);

  it('skips the preamble and reports it, with the file lines', () => {
    expect(table.columns[2]).toBe('Pressure (dbar)');
    expect(warning(table.warnings, 'preamble-skipped')).toMatch(/Skipped 5 line\(s\).*line\(s\) 1–5/);
  });

  it('carries the date and time columns along as text', () => {
    expect(p.labels.map((l) => l.name)).toEqual(['Date', 'Time']);
    expect(p.labels[1].values[0]).toBe('09:12:03');
    expect(p.labels[1].values.length).toBe(p.depth.length);
  });

  it('depth from pressure by UNESCO 1983 at the default 45°, named in a note', () => {
    // TEOS-10 GSW (python3-gsw 3.6.16): -z_from_p(0.5, 45) = 0.49594 m, -z_from_p(10, 45) = 9.91860 m;
    // the standard-ocean formulas agree to 2 cm (test/check-values/water/depth-from-pressure-unesco1983.json)
    expect(p.depth[0]).toBeCloseTo(0.49594, 2);
    expect(p.depth[p.depth.length - 1]).toBeCloseTo(9.9186, 2);
    expect(warning(p.warnings, 'depth-from-pressure')).toMatch(/UNESCO 1983.*latitude 45°.*default/);
    expect(warning(p.warnings, 'depth-from-pressure-fresh')).toMatch(/about [23]\.\d % greater/);
  });

  it('salinity from conductivity by PSS-78', () => {
    // TEOS-10 GSW (python3-gsw 3.6.16): SP_from_C(0.511, 21.35, 0.5) = 0.266064, SP_from_C(0.480, 10.9, 10) = 0.321590
    expect(p.salinity[0]).toBeCloseTo(0.266064, 5);
    expect(p.salinity[p.salinity.length - 1]).toBeCloseTo(0.32159, 5);
    expect(codes(p.warnings)).toContain('salinity-from-conductivity');
    expect(p.extra.map((c) => c.name)).toContain('Conductivity');
  });

  it('skips rows with a NaN or flagged essential cell, naming them; never a blocked profile', () => {
    // data rows: 4 has temperature NaN, 8 conductivity −9999
    expect(warning(p.warnings, 'rows-skipped')).toMatch(
      /rows 4, 8:.*row 4: Temperature "NaN".*row 8: Conductivity "-9999"/,
    );
    expect(warning(p.warnings, 'rows-above-surface')).toMatch(/row 1:/);
    expect(warning(p.warnings, 'duplicate-depths')).toMatch(/row 11:/);
    expect(warning(p.warnings, 'rows-out-of-order')).toMatch(/rows 14–15: .*up-cast.*row 13/);
    expect(p.depth.length).toBe(9);
  });

  it('fills a blank cell of a carried column from its neighbours, with a warning', () => {
    const dox = p.extra.find((c) => c.name === 'DO')!;
    expect(warning(p.warnings, 'cells-filled')).toMatch(/"DO": row 5 /);
    const i = p.depth.findIndex((d, k) => k > 0 && p.labels[1].values[k] === '09:12:09');
    const f = (p.depth[i] - p.depth[i - 1]) / (p.depth[i + 1] - p.depth[i - 1]);
    expect(dox.values[i]).toBeCloseTo(8.5 + f * (8.1 - 8.5), 12);
  });

  it('uses a given latitude', () => {
    const q = parseProfileCsv(text('instrument-ctd.csv'), { latitude: 0 });
    expect(warning(q.warnings, 'depth-from-pressure')).toMatch(/latitude 0°\./);
    expect(q.depth[q.depth.length - 1]).toBeGreaterThan(p.depth[p.depth.length - 1]); // weaker gravity at the equator
  });
});

describe('more instrument forms', () => {
  it('reads specific conductance at 25 °C as such', () => {
    const q = parseProfileCsv('depth (m),temp (C),SpCond (uS/cm)\n0,20,500\n5,12,520\n');
    expect(codes(q.warnings)).toContain('salinity-from-specific-conductance');
    // TEOS-10 GSW (python3-gsw 3.6.16): SP_from_C(0.5, 25, 0) = 0.240378
    expect(q.salinity[0]).toBeCloseTo(0.240378, 5);
    const same = parseProfileCsv('depth (m),temp (C),Conductivity (µS/cm @25C)\n0,20,500\n5,12,520\n');
    expect(same.salinity).toEqual(q.salinity);
  });

  it('merges a units line under the header', () => {
    const q = parseProfileCsv('depth,temperature\nft,degF\n0,68\n10,59\n');
    expect(q.depth[1]).toBeCloseTo(3.048, 10); // NIST SP 811: 1 ft = 0.3048 m exactly
    expect(q.temperature[0]).toBeCloseTo(20, 10);
  });

  it('reports spikes by row and keeps the values (Argo spike test, 6 °C above 500 m — from memory)', () => {
    const q = parseProfileCsv('depth (m),temperature (degC)\n0,20\n1,20\n2,29\n3,19.5\n4,19\n');
    expect(warning(q.warnings, 'spike')).toMatch(/temperature at row 3 /);
    expect(q.temperature[2]).toBe(29);
    const smooth = parseProfileCsv('depth (m),temperature (degC)\n0,20\n1,20\n2,24\n3,19.5\n4,19\n');
    expect(codes(smooth.warnings)).not.toContain('spike');
  });

  it('reads a cell "1,500" in a quoted CSV field only when the file shows its decimal mark', () => {
    const us = parseProfileCsv('depth (m),temperature (degC),flow\n0,20.5,"1,500"\n5,19.5,"2,000"\n');
    expect(us.extra[0].values).toEqual([1500, 2000]);
    const unclear = parseProfileCsv('depth (m),temperature (degC),flow\n0,20,"1,500"\n5,19,"2,000"\n');
    expect(unclear.labels.map((l) => l.name)).toEqual(['flow']); // not read as numbers: kept as text
  });
});

describe('a file holding several casts', () => {
  const casts = splitCasts(readCsvTable(text('multi-cast.csv')));

  it('splits by station and date, named from them, in file order', () => {
    expect(casts.map((c) => c.name)).toEqual(['A1, 2025-06-02', 'B2, 2025-06-02', 'A1, 2025-06-16']);
    expect(casts.map((c) => c.table.rows.length)).toEqual([3, 3, 3]);
  });

  it('each cast reads as a profile (decimal commas of a semicolon file)', () => {
    const b2 = profileFromTable(casts[1].table);
    expect(b2.depth).toEqual([0.5, 3, 6]);
    expect(b2.salinity[2]).toBe(32);
  });

  it('a file without station or date columns is one cast', () => {
    const one = splitCasts(readCsvTable('depth (m),temperature (degC)\n0,20\n5,19\n'));
    expect(one.length).toBe(1);
  });

  it('splits by the date of a date-time column', () => {
    const t = readCsvTable(
      'timestamp,depth (m),temperature (degC)\n2025-06-02T10:00,0,20\n2025-06-02T10:01,5,19\n2025-06-03T09:00,0,21\n2025-06-03T09:01,5,18\n',
    );
    expect(splitCasts(t).map((c) => c.name)).toEqual(['2025-06-02', '2025-06-03']);
  });
});
