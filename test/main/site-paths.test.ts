// Which files the services read and write, in both shells: regular *.gpsite files of bounded size only
// (a device or a pipe would block or never end), and a save through a link replaces the link's target.
import { lstatSync, mkdtempSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { atomicWriteFile } from '../../src-main/services/atomic-write';
import { checkSiteFileName, requireRegularFile } from '../../src-main/services/site-paths';

const tmp = () => mkdtempSync(join(tmpdir(), 'gprime-paths-'));

describe('site file names and kinds', () => {
  it('accepts *.gpsite names (any case) and refuses dot files and other names', () => {
    expect(() => checkSiteFileName('/s/Lake Ames.GPSITE')).not.toThrow();
    expect(() => checkSiteFileName('/s/.x.gpsite')).toThrow(/hidden files/);
    expect(() => checkSiteFileName('/s/x.json')).toThrow(/ends with \.gpsite/);
    expect(() => checkSiteFileName('/s/x.gpsite/')).not.toThrow(); // basename ignores a trailing slash
  });

  it('refuses devices (/dev/zero would never end), folders and missing files; a new file passes when allowed', () => {
    expect(() => requireRegularFile('/dev/zero')).toThrow(/a device/);
    expect(() => requireRegularFile('/dev/null')).toThrow(/a device/);
    expect(() => requireRegularFile(tmpdir())).toThrow(/a folder/);
    expect(() => requireRegularFile(join(tmp(), 'new.gpsite'))).toThrow(/ENOENT/);
    expect(() => requireRegularFile(join(tmp(), 'new.gpsite'), true)).not.toThrow();
  });
});

describe('atomic writes through links', () => {
  it("replace the link's target and keep the link", () => {
    const dir = tmp();
    writeFileSync(join(dir, 'target.gpsite'), 'old');
    symlinkSync(join(dir, 'target.gpsite'), join(dir, 'link.gpsite'));
    atomicWriteFile(join(dir, 'link.gpsite'), 'new');
    expect(lstatSync(join(dir, 'link.gpsite')).isSymbolicLink()).toBe(true);
    expect(readFileSync(join(dir, 'target.gpsite'), 'utf8')).toBe('new');
  });

  it('refuse a link to a missing file, leaving the link as it was', () => {
    const dir = tmp();
    symlinkSync(join(dir, 'gone.gpsite'), join(dir, 'link.gpsite'));
    expect(() => atomicWriteFile(join(dir, 'link.gpsite'), 'new')).toThrow(/link to a missing file/);
    expect(lstatSync(join(dir, 'link.gpsite')).isSymbolicLink()).toBe(true);
  });
});
