// The packaged app's Electron fuses. The Electron binary cannot be downloaded here, so no package is
// built: the configuration object goes through electron-builder's own fuse mapping (the code it runs
// before signing) and is read back by @electron/fuses' option indices — the fuse wire the binary gets.
// Expected settings: Electron's security tutorial (electronjs.org/docs/latest/tutorial/fuses, "Fuses").
import { createRequire } from 'node:module';
import { FuseV1Options } from '@electron/fuses';
import { describe, expect, it } from 'vitest';
import config from '../../electron.config';

const require = createRequire(import.meta.url);
const { PlatformPackager } = require('app-builder-lib');

describe('packaging', () => {
  it('flips the fuses: no RunAsNode, NODE_OPTIONS or --inspect; app code only from an integrity-checked asar; cookies encrypted', async () => {
    const wire = await PlatformPackager.prototype.generateFuseConfig.call({}, config.electronFuses);
    expect(wire[FuseV1Options.RunAsNode]).toBe(false);
    expect(wire[FuseV1Options.EnableNodeOptionsEnvironmentVariable]).toBe(false);
    expect(wire[FuseV1Options.EnableNodeCliInspectArguments]).toBe(false);
    expect(wire[FuseV1Options.OnlyLoadAppFromAsar]).toBe(true);
    expect(wire[FuseV1Options.EnableEmbeddedAsarIntegrityValidation]).toBe(true);
    expect(wire[FuseV1Options.EnableCookieEncryption]).toBe(true);
    expect(wire[FuseV1Options.GrantFileProtocolExtraPrivileges]).toBe(false); // the app is served from gprime://
  });

  it('packs the app into app.asar, which the asar fuses need', () => {
    expect(config.asar).toBe(true);
  });
});
