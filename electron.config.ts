/**
 * Packaging (electron-builder) and window settings for the desktop app.
 * Packaging downloads the Electron runtime, so it is not run in CI (see README "Desktop app"); the tests
 * check this configuration object instead (test/main/packaging.test.ts).
 */
import type { Configuration } from 'electron-builder';

export const windowSettings = {
  width: 1440,
  height: 900,
  minWidth: 960,
  minHeight: 600,
  title: 'gprime',
  backgroundColor: '#f6f5f1',
} as const;

/** Site files use our own extension. */
export const SITE_FILE_EXTENSION = 'gpsite';

/**
 * Electron fuses, flipped in the packaged binary (Electron's "Security" tutorial, item "Fuses"): the app
 * cannot be run as plain Node, takes no NODE_OPTIONS and no --inspect, loads its code only from the
 * app.asar whose integrity it checks, and encrypts its cookie store.
 */
export const ELECTRON_FUSES = {
  runAsNode: false,
  enableNodeOptionsEnvironmentVariable: false,
  enableNodeCliInspectArguments: false,
  onlyLoadAppFromAsar: true,
  enableEmbeddedAsarIntegrityValidation: true,
  enableCookieEncryption: true,
  grantFileProtocolExtraPrivileges: false,
} as const;

const config = {
  appId: 'org.gprime.desktop',
  // the app is packed into app.asar (its integrity hash is embedded in the binary for the fuse above)
  asar: true,
  electronFuses: ELECTRON_FUSES,
  productName: 'gprime',
  directories: { output: 'dist/packages', buildResources: 'build-resources' },
  files: ['dist/electron/**', 'dist/renderer/**', 'package.json'],
  extraResources: [
    { from: 'examples', to: 'examples' },
    { from: 'shared-core/site/site.schema.json', to: 'site.schema.json' },
  ],
  fileAssociations: [
    { ext: SITE_FILE_EXTENSION, name: 'gprime site', description: 'gprime site file', role: 'Editor' },
  ],
  linux: { target: ['AppImage', 'deb'], category: 'Science' },
  win: { target: ['nsis'] },
  mac: { target: ['dmg'], category: 'public.app-category.education' },
  nsis: { oneClick: false, allowToChangeInstallationDirectory: true },
} as const satisfies Configuration;

export default config;
